import { z } from "zod";

// Shared by the sign-in form and the credentials provider.
export const signInSchema = z.object({
  email: z.email("Enter an e-mail address.").max(320),
  password: z.string().min(1, "Enter your password.").max(200),
});
export type SignInInput = z.infer<typeof signInSchema>;
