import { and, asc, eq, sql } from "drizzle-orm";
import { getDb } from "@/db";
import { memberships, organisations, users } from "@/db/schema";
import type { Member } from "./context";

/** Every organisation the user belongs to, oldest membership first. */
export async function listMembershipsOf(userId: string): Promise<Member[]> {
  const rows = await getDb()
    .select({
      userId: users.id,
      email: users.email,
      name: users.name,
      organisationId: organisations.id,
      organisationName: organisations.name,
      role: memberships.role,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .innerJoin(organisations, eq(organisations.id, memberships.organisationId))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(memberships.createdAt), asc(organisations.name));
  return rows;
}

/** The membership to act in: the preferred organisation when the user still belongs to it, else the first. */
export async function resolveMember(userId: string, preferredOrganisationId?: string | null): Promise<Member | null> {
  const all = await listMembershipsOf(userId);
  return all.find((m) => m.organisationId === preferredOrganisationId) ?? all[0] ?? null;
}

export async function findUserByEmail(email: string) {
  const [row] = await getDb()
    .select()
    .from(users)
    .where(sql`lower(${users.email}) = ${email.trim().toLowerCase()}`);
  return row ?? null;
}

export async function isMember(userId: string, organisationId: string): Promise<boolean> {
  const [row] = await getDb()
    .select({ userId: memberships.userId })
    .from(memberships)
    .where(and(eq(memberships.userId, userId), eq(memberships.organisationId, organisationId)));
  return !!row;
}
