import { z } from "zod";
import { passwordSchema } from "./password-schema";

// Shared by the reset forms and lib/auth/password-reset.ts.
export const resetRequestSchema = z.object({ email: z.email("Enter an e-mail address.").max(320) });
export const resetPasswordSchema = z
  .object({ token: z.string().min(20).max(200), password: passwordSchema, confirm: z.string() })
  .refine((v) => v.password === v.confirm, { message: "The two passwords differ.", path: ["confirm"] });
export type ResetPasswordInput = z.input<typeof resetPasswordSchema>;
