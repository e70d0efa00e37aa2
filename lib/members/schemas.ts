import { z } from "zod";
import { passwordSchema } from "@/lib/auth/password-schema";

export const roleSchema = z.enum(["admin", "engineer", "auditor", "developer"]);

// One schema per shape: the forms validate with these and the server actions parse with them again.
export const inviteSchema = z.object({
  email: z.email("Enter an e-mail address.").max(320).transform((s) => s.trim().toLowerCase()),
  role: roleSchema,
});
export type InviteInput = z.input<typeof inviteSchema>;

export const changeRoleSchema = z.object({ userId: z.uuid(), role: roleSchema });
export const removeMemberSchema = z.object({ userId: z.uuid() });
export const revokeInvitationSchema = z.object({ invitationId: z.uuid() });

export const acceptInvitationSchema = z.object({
  token: z.string().min(20).max(200),
  name: z.string().trim().min(1, "Enter your name.").max(120),
  password: passwordSchema,
});
export type AcceptInvitationInput = z.input<typeof acceptInvitationSchema>;

/** For an invitation to someone who already has an account: no name or password to set. */
export const joinWithAccountSchema = z.object({ token: z.string().min(20).max(200) });
