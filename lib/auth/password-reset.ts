import { and, eq, gt, isNull } from "drizzle-orm";
import { getDb } from "@/db";
import { passwordResets, users } from "@/db/schema";
import { appBaseUrl } from "@/lib/mail/config";
import { sendMail } from "@/lib/mail/send";
import { passwordResetMail } from "@/lib/mail/templates";
import { NotFoundError } from "./errors";
import { findUserByEmail } from "./memberships";
import { hashPassword } from "./password";
import { resetPasswordSchema, resetRequestSchema } from "./reset-schemas";
import { hashToken, newToken } from "./tokens";

export const RESET_MINUTES = 60;

export { resetPasswordSchema, resetRequestSchema, type ResetPasswordInput } from "./reset-schemas";

/**
 * Mails a reset link when the address belongs to an account. Answers the same either way, so the form
 * cannot be used to find out who has an account.
 */
export async function requestPasswordReset(input: unknown): Promise<void> {
  const { email } = resetRequestSchema.parse(input);
  const user = await findUserByEmail(email);
  if (!user || !user.passwordHash) return;
  const { token, hash } = newToken();
  const expiresAt = new Date(Date.now() + RESET_MINUTES * 60 * 1000);
  await getDb().insert(passwordResets).values({ userId: user.id, tokenHash: hash, expiresAt });
  const mail = passwordResetMail({ name: user.name, link: `${appBaseUrl()}/reset-password/${token}`, expiresAt });
  try {
    await sendMail({ to: user.email, ...mail });
  } catch (err) {
    console.error("[mail] password reset not sent:", (err as Error).message);
  }
}

export async function isResetTokenValid(token: string): Promise<boolean> {
  const [row] = await getDb()
    .select({ id: passwordResets.id })
    .from(passwordResets)
    .where(and(eq(passwordResets.tokenHash, hashToken(token)), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, new Date())));
  return !!row;
}

/** Sets the new password and spends the token (and every other open reset of the same user). */
export async function resetPassword(input: unknown): Promise<void> {
  const { token, password } = resetPasswordSchema.parse(input);
  const passwordHash = await hashPassword(password);
  await getDb().transaction(async (tx) => {
    const [row] = await tx
      .update(passwordResets)
      .set({ usedAt: new Date() })
      .where(and(eq(passwordResets.tokenHash, hashToken(token)), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, new Date())))
      .returning({ userId: passwordResets.userId });
    if (!row) throw new NotFoundError("This reset link is used or expired. Ask for a new one.");
    await tx.update(users).set({ passwordHash }).where(eq(users.id, row.userId));
    await tx.update(passwordResets).set({ usedAt: new Date() }).where(and(eq(passwordResets.userId, row.userId), isNull(passwordResets.usedAt)));
  });
}
