// Helpers for console integration tests: a member context for a factory user, and reading the fake mailbox.
import { desc, sql } from "drizzle-orm";
import { getDb } from "@/db";
import { devMailbox, type Role } from "@/db/schema";
import type { Member } from "@/lib/auth/context";
import { createOrganisation, createUser, type TestOrganisation } from "../../helpers/factories";

export const ALL_ROLES: Role[] = ["admin", "engineer", "auditor", "developer"];

export function memberOf(org: TestOrganisation, user: { id: string; email: string; name: string; role: Role }): Member {
  return { userId: user.id, email: user.email, name: user.name, organisationId: org.id, organisationName: org.name, role: user.role };
}

/** A fresh organisation with one member of each role. */
export async function orgWithEveryRole(): Promise<{ org: TestOrganisation; members: Record<Role, Member> }> {
  const org = await createOrganisation();
  const members = {} as Record<Role, Member>;
  for (const role of ALL_ROLES) members[role] = memberOf(org, await createUser(org, role));
  return { org, members };
}

/** Waits for the fake SMTP receiver to store a message to `to`. */
export async function waitForMail(to: string, timeoutMs = 10_000) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const [m] = await getDb()
      .select()
      .from(devMailbox)
      .where(sql`lower(${devMailbox.to}) = ${to.toLowerCase()}`)
      .orderBy(desc(devMailbox.id))
      .limit(1);
    if (m) return m;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail to ${to} within ${timeoutMs} ms`);
}
