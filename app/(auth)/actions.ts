"use server";
import { runAction } from "@/lib/auth/action-result";
import { requestPasswordReset, resetPassword } from "@/lib/auth/password-reset";
import { acceptInvitation } from "@/lib/members/invitations";

// Actions for people who are not signed in; each one is protected by its one-time token instead.
export async function requestResetAction(input: unknown) {
  return runAction(() => requestPasswordReset(input));
}

export async function resetPasswordAction(input: unknown) {
  return runAction(() => resetPassword(input));
}

export async function acceptInvitationAction(input: unknown) {
  return runAction(async () => {
    const r = await acceptInvitation(input);
    return { email: r.email };
  });
}
