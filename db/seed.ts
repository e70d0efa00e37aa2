// Demo data for an invented scenario: Northmere Fibre, a regional operator, and Calder Splice & Test,
// the contractor that builds and repairs its plant. Idempotent: running it again changes nothing.
import bcrypt from "bcryptjs";
import { and, eq, sql } from "drizzle-orm";
import { closeDb, getDb, type Database } from "./index";
import { memberships, organisations, users, type Role } from "./schema";
import { seedDemoApi } from "./seed-demo-gradings";
import { seedDemoProfiles } from "./seed-demo-profiles";

export const DEMO_PASSWORD = "glassgrade-demo";

export const DEMO_ORGS = [
  { slug: "northmere", name: "Northmere Fibre" },
  { slug: "calder", name: "Calder Splice & Test" },
] as const;

export const DEMO_USERS: { email: string; name: string; org: string; role: Role }[] = [
  { email: "admin@northmere.example", name: "Ines Okafor", org: "northmere", role: "admin" },
  { email: "engineer@northmere.example", name: "Tomas Lindqvist", org: "northmere", role: "engineer" },
  { email: "auditor@northmere.example", name: "Priya Raman", org: "northmere", role: "auditor" },
  { email: "developer@northmere.example", name: "Owen Marsh", org: "northmere", role: "developer" },
  { email: "admin@calder.example", name: "Rhona Calder", org: "calder", role: "admin" },
];

export async function seedOrganisationsAndUsers(db: Database) {
  const orgIds: Record<string, string> = {};
  for (const o of DEMO_ORGS) {
    await db.insert(organisations).values(o).onConflictDoNothing({ target: organisations.slug });
    const [row] = await db.select({ id: organisations.id }).from(organisations).where(eq(organisations.slug, o.slug));
    orgIds[o.slug] = row.id;
  }
  // bcrypt cost 10 keeps the seed quick while still being a slow hash; real users get cost 12 (lib/auth).
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, 10);
  for (const u of DEMO_USERS) {
    let [existing] = await db.select({ id: users.id }).from(users).where(sql`lower(${users.email}) = ${u.email.toLowerCase()}`);
    if (!existing) {
      [existing] = await db.insert(users).values({ email: u.email, name: u.name, passwordHash }).returning({ id: users.id });
    }
    const orgId = orgIds[u.org];
    const [m] = await db.select().from(memberships).where(and(eq(memberships.organisationId, orgId), eq(memberships.userId, existing.id)));
    if (!m) await db.insert(memberships).values({ organisationId: orgId, userId: existing.id, role: u.role });
  }
  return orgIds;
}

export async function seed(db: Database) {
  const orgIds = await seedOrganisationsAndUsers(db);
  // Demo sandbox key and ~80 back-dated gradings for Northmere (db/seed-demo-gradings.ts).
  const api = await seedDemoApi(db, orgIds.northmere);
  // A published organisation profile with two versions (db/seed-demo-profiles.ts).
  await seedDemoProfiles(db, orgIds.northmere);
  return { orgIds, api };
}

if (process.argv[1] && /db[\\/]seed\.ts$/.test(process.argv[1])) {
  seed(getDb())
    .then((result) => {
      console.log("[seed] demo data ready");
      console.log(`[seed] Northmere demo sandbox API key (demo only): ${result.api.sandboxKey}`);
      console.log(`[seed] Northmere has ${result.api.gradings} stored verdicts (${result.api.created} added now)`);
    })
    .catch((err) => {
      console.error("[seed] failed:", err);
      process.exitCode = 1;
    })
    .finally(() => closeDb());
}
