import { and, asc, count, desc, eq, gt, isNull, sql } from "drizzle-orm";
import { getDb } from "@/db";
import { invitations, memberships, users, type Role } from "@/db/schema";
import { assertCan, type ActorContext } from "@/lib/auth/context";
import { InputError, NotFoundError } from "@/lib/auth/errors";
import { recordAudit } from "@/db/queries/audit-events";
import { changeRoleSchema, removeMemberSchema } from "./schemas";

export interface MemberRow {
  userId: string;
  email: string;
  name: string;
  role: Role;
  joinedAt: string;
}

export interface PendingInvitation {
  id: string;
  email: string;
  role: Role;
  expiresAt: string;
  createdAt: string;
}

export async function listMembers({ actor }: ActorContext): Promise<MemberRow[]> {
  assertCan(actor, "members:manage");
  const rows = await getDb()
    .select({ userId: users.id, email: users.email, name: users.name, role: memberships.role, joinedAt: memberships.createdAt })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.organisationId, actor.organisationId))
    .orderBy(asc(users.name));
  return rows.map((r) => ({ ...r, joinedAt: r.joinedAt.toISOString() }));
}

export async function listPendingInvitations({ actor }: ActorContext): Promise<PendingInvitation[]> {
  assertCan(actor, "members:manage");
  const rows = await getDb()
    .select({ id: invitations.id, email: invitations.email, role: invitations.role, expiresAt: invitations.expiresAt, createdAt: invitations.createdAt })
    .from(invitations)
    .where(and(eq(invitations.organisationId, actor.organisationId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, new Date())))
    .orderBy(desc(invitations.createdAt));
  return rows.map((r) => ({ ...r, expiresAt: r.expiresAt.toISOString(), createdAt: r.createdAt.toISOString() }));
}

async function adminCount(tx: Parameters<Parameters<ReturnType<typeof getDb>["transaction"]>[0]>[0], organisationId: string) {
  // Lock the organisation's admin rows so two concurrent demotions cannot both see "one other admin left".
  const rows = await tx.execute(sql`select user_id from memberships where organisation_id = ${organisationId} and role = 'admin' for update`);
  return rows.rows.length;
}

export async function changeMemberRole({ actor }: ActorContext, input: unknown): Promise<MemberRow> {
  assertCan(actor, "members:manage");
  const { userId, role } = changeRoleSchema.parse(input);
  return getDb().transaction(async (tx) => {
    const [current] = await tx
      .select()
      .from(memberships)
      .where(and(eq(memberships.organisationId, actor.organisationId), eq(memberships.userId, userId)));
    if (!current) throw new NotFoundError("No such member in this organisation.");
    if (current.role === "admin" && role !== "admin" && (await adminCount(tx, actor.organisationId)) <= 1) {
      throw new InputError("An organisation needs at least one administrator. Make someone else admin first.", "role");
    }
    await tx.update(memberships).set({ role }).where(and(eq(memberships.organisationId, actor.organisationId), eq(memberships.userId, userId)));
    await recordAudit(tx, { organisationId: actor.organisationId, actorUserId: actor.userId, action: "member.role_changed", entity: "membership", entityId: userId, before: { role: current.role }, after: { role } });
    const [u] = await tx.select().from(users).where(eq(users.id, userId));
    return { userId, email: u.email, name: u.name, role, joinedAt: current.createdAt.toISOString() };
  });
}

export async function removeMember({ actor }: ActorContext, input: unknown): Promise<void> {
  assertCan(actor, "members:manage");
  const { userId } = removeMemberSchema.parse(input);
  await getDb().transaction(async (tx) => {
    const [current] = await tx
      .select()
      .from(memberships)
      .where(and(eq(memberships.organisationId, actor.organisationId), eq(memberships.userId, userId)));
    if (!current) throw new NotFoundError("No such member in this organisation.");
    if (current.role === "admin" && (await adminCount(tx, actor.organisationId)) <= 1) {
      throw new InputError("The last administrator cannot be removed.", "userId");
    }
    await tx.delete(memberships).where(and(eq(memberships.organisationId, actor.organisationId), eq(memberships.userId, userId)));
    await recordAudit(tx, { organisationId: actor.organisationId, actorUserId: actor.userId, action: "member.removed", entity: "membership", entityId: userId, before: { role: current.role } });
  });
}

export async function memberCount(organisationId: string): Promise<number> {
  const [r] = await getDb().select({ n: count() }).from(memberships).where(eq(memberships.organisationId, organisationId));
  return r.n;
}
