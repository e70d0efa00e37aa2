import { and, eq, gt, isNull, sql } from "drizzle-orm";
import { getDb } from "@/db";
import { invitations, memberships, organisations, users } from "@/db/schema";
import { assertCan, type ActorContext } from "@/lib/auth/context";
import { InputError, NotFoundError } from "@/lib/auth/errors";
import { hashPassword } from "@/lib/auth/password";
import { hashToken, newToken } from "@/lib/auth/tokens";
import { appBaseUrl } from "@/lib/mail/config";
import { sendMail } from "@/lib/mail/send";
import { invitationMail } from "@/lib/mail/templates";
import { recordAudit } from "@/db/queries/audit-events";
import { acceptInvitationSchema, inviteSchema, joinWithAccountSchema, revokeInvitationSchema } from "./schemas";

export const INVITATION_DAYS = 7;

export interface InvitationSent {
  invitationId: string;
  email: string;
  /** False when the relay refused the message; the invitation stays and can be sent again. */
  mailed: boolean;
}

export async function inviteMember({ actor }: ActorContext, input: unknown): Promise<InvitationSent> {
  assertCan(actor, "members:manage");
  const { email, role } = inviteSchema.parse(input);
  const db = getDb();
  const [already] = await db
    .select({ userId: users.id })
    .from(users)
    .innerJoin(memberships, and(eq(memberships.userId, users.id), eq(memberships.organisationId, actor.organisationId)))
    .where(sql`lower(${users.email}) = ${email}`);
  if (already) throw new InputError("That person is already a member of this organisation.", "email");

  const { token, hash } = newToken();
  const expiresAt = new Date(Date.now() + INVITATION_DAYS * 24 * 3600 * 1000);
  const invitationId = await db.transaction(async (tx) => {
    // A new invitation replaces any open one for the same address, so only the latest link works.
    await tx
      .update(invitations)
      .set({ revokedAt: new Date() })
      .where(and(eq(invitations.organisationId, actor.organisationId), sql`lower(${invitations.email}) = ${email}`, isNull(invitations.acceptedAt), isNull(invitations.revokedAt)));
    const [row] = await tx
      .insert(invitations)
      .values({ organisationId: actor.organisationId, email, role, tokenHash: hash, invitedByUserId: actor.userId, expiresAt })
      .returning({ id: invitations.id });
    await recordAudit(tx, { organisationId: actor.organisationId, actorUserId: actor.userId, action: "invitation.created", entity: "invitation", entityId: row.id, after: { email, role } });
    return row.id;
  });

  const mail = invitationMail({ organisationName: actor.organisationName, inviterName: actor.name, role, link: `${appBaseUrl()}/invite/${token}`, expiresAt });
  let mailed = true;
  try {
    await sendMail({ to: email, ...mail });
  } catch (err) {
    console.error("[mail] invitation not sent:", (err as Error).message);
    mailed = false;
  }
  return { invitationId, email, mailed };
}

export async function revokeInvitation({ actor }: ActorContext, input: unknown): Promise<void> {
  assertCan(actor, "members:manage");
  const { invitationId } = revokeInvitationSchema.parse(input);
  await getDb().transaction(async (tx) => {
    const res = await tx
      .update(invitations)
      .set({ revokedAt: new Date() })
      .where(and(eq(invitations.id, invitationId), eq(invitations.organisationId, actor.organisationId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)))
      .returning({ id: invitations.id, email: invitations.email });
    if (!res.length) throw new NotFoundError("No open invitation with that id.");
    await recordAudit(tx, { organisationId: actor.organisationId, actorUserId: actor.userId, action: "invitation.revoked", entity: "invitation", entityId: invitationId, before: { email: res[0].email } });
  });
}

export interface InvitationPreview {
  email: string;
  role: string;
  organisationName: string;
  /** True when an account with this e-mail exists: joining then needs no new password. */
  hasAccount: boolean;
}

async function openInvitation(token: string) {
  const [row] = await getDb()
    .select({ inv: invitations, organisationName: organisations.name })
    .from(invitations)
    .innerJoin(organisations, eq(organisations.id, invitations.organisationId))
    .where(and(eq(invitations.tokenHash, hashToken(token)), isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, new Date())));
  return row ?? null;
}

/** What the accept page shows, or null for a used, revoked, expired or unknown link. */
export async function previewInvitation(token: string): Promise<InvitationPreview | null> {
  const row = await openInvitation(token);
  if (!row) return null;
  const [u] = await getDb().select({ id: users.id, hash: users.passwordHash }).from(users).where(sql`lower(${users.email}) = ${row.inv.email.toLowerCase()}`);
  return { email: row.inv.email, role: row.inv.role, organisationName: row.organisationName, hasAccount: !!u?.hash };
}

/**
 * Accepts an invitation. A new person sets their name and password; someone who already has an account
 * simply joins (their password is never changed through an invitation link).
 */
export async function acceptInvitation(input: unknown): Promise<{ userId: string; organisationId: string; email: string }> {
  const token = joinWithAccountSchema.parse(input).token;
  const row = await openInvitation(token);
  if (!row) throw new NotFoundError("This invitation link is used, revoked or expired. Ask for a new one.");
  const inv = row.inv;
  const db = getDb();
  const [existing] = await db.select().from(users).where(sql`lower(${users.email}) = ${inv.email.toLowerCase()}`);
  let details: { name: string; passwordHash: string } | null = null;
  if (!existing?.passwordHash) {
    const parsed = acceptInvitationSchema.parse(input);
    details = { name: parsed.name, passwordHash: await hashPassword(parsed.password) };
  }
  return db.transaction(async (tx) => {
    // Mark used first and check the row count, so two simultaneous accepts cannot both succeed.
    const used = await tx
      .update(invitations)
      .set({ acceptedAt: new Date() })
      .where(and(eq(invitations.id, inv.id), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)))
      .returning({ id: invitations.id });
    if (!used.length) throw new NotFoundError("This invitation link was just used.");
    let userId = existing?.id;
    if (!userId) {
      const [u] = await tx.insert(users).values({ email: inv.email, name: details!.name, passwordHash: details!.passwordHash }).returning({ id: users.id });
      userId = u.id;
    } else if (details) {
      await tx.update(users).set({ name: details.name, passwordHash: details.passwordHash }).where(eq(users.id, userId));
    }
    await tx.insert(memberships).values({ organisationId: inv.organisationId, userId, role: inv.role }).onConflictDoNothing();
    await recordAudit(tx, { organisationId: inv.organisationId, actorUserId: userId, action: "invitation.accepted", entity: "membership", entityId: userId, after: { role: inv.role, email: inv.email } });
    return { userId, organisationId: inv.organisationId, email: inv.email };
  });
}
