// An organisation with one member of each role and a history of graded, stored tests: what the profile,
// preview, replay and audit suites start from.
import { getDb } from "@/db";
import type { Role } from "@/db/schema";
import { findTemplate } from "@/lib/grading";
import type { LinkTest, Profile } from "@/lib/grading/schema";
import type { Actor } from "@/lib/profiles/access";
import type { ProfileContext } from "@/lib/profiles/context";
import { gradeAndStore } from "@/lib/verdicts/grade";
import { createOrganisation, createUser, type TestOrganisation } from "./factories";
import { syntheticLinkTests } from "./synthetic-links";

export const OSP_TEMPLATE = "tia-568-3-d-singlemode-osp";

export interface OrgWithRoles {
  org: TestOrganisation;
  actors: Record<Role, Actor>;
  ctx: (role: Role) => ProfileContext;
}

export async function orgWithRoles(): Promise<OrgWithRoles> {
  const org = await createOrganisation();
  const actors = {} as Record<Role, Actor>;
  for (const role of ["admin", "engineer", "auditor", "developer"] as const) {
    const u = await createUser(org, role);
    actors[role] = { userId: u.id, organisationId: org.id, role };
  }
  return { org, actors, ctx: (role) => ({ db: getDb(), actor: actors[role] }) };
}

export function ospTemplate(): Profile {
  const t = findTemplate(OSP_TEMPLATE);
  if (!t) throw new Error(`template ${OSP_TEMPLATE} is missing`);
  return t;
}

/**
 * Grades `count` synthetic tests under `profile` and stores them, one per minute ending at `end`, so
 * time-range filters have something to cut. Returns the tests in storage (chain) order.
 */
export async function storeHistory(
  organisationId: string,
  count: number,
  opts: { profile?: Profile; seed?: number; end?: Date; chunk?: number } = {},
): Promise<LinkTest[]> {
  const profile = opts.profile ?? ospTemplate();
  const tests = syntheticLinkTests(count, opts.seed ?? 7);
  const end = (opts.end ?? new Date()).getTime();
  const chunk = opts.chunk ?? 500;
  for (let i = 0; i < tests.length; i += chunk) {
    const items = tests.slice(i, i + chunk).map((test, j) => ({ test, createdAt: new Date(end - (count - (i + j)) * 60_000) }));
    await gradeAndStore({ db: getDb(), organisationId }, profile, items);
  }
  return tests;
}
