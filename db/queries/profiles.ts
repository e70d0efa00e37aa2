// Queries for organisation limit profiles and their published versions. Every query is scoped by
// organisation id; a profile of another organisation reads as absent.
import { and, desc, eq, sql } from "drizzle-orm";
import type { Database } from "../index";
import { organisations, profiles, profileVersions, type Profile, type ProfileVersion } from "../schema";

export type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];
export type Queryable = Database | Tx;

export interface ProfileSummary {
  id: string;
  slug: string;
  name: string;
  basedOn: string | null;
  hasDraft: boolean;
  draftUpdatedAt: Date | null;
  latestVersion: number | null;
  latestPublishedAt: Date | null;
}

export async function listProfileSummaries(db: Queryable, organisationId: string): Promise<ProfileSummary[]> {
  const rows = await db
    .select({
      id: profiles.id,
      slug: profiles.slug,
      name: profiles.name,
      basedOn: profiles.basedOn,
      hasDraft: sql<boolean>`${profiles.draft} is not null`,
      draftUpdatedAt: profiles.draftUpdatedAt,
      latestVersion: sql<number | null>`max(${profileVersions.version})`,
      latestPublishedAt: sql<string | null>`max(${profileVersions.publishedAt})`,
    })
    .from(profiles)
    .leftJoin(profileVersions, eq(profileVersions.profileId, profiles.id))
    .where(eq(profiles.organisationId, organisationId))
    .groupBy(profiles.id)
    .orderBy(profiles.slug);
  return rows.map((r) => ({
    ...r,
    latestVersion: r.latestVersion === null ? null : Number(r.latestVersion),
    latestPublishedAt: r.latestPublishedAt ? new Date(r.latestPublishedAt) : null,
  }));
}

export async function findProfile(db: Queryable, organisationId: string, slug: string, opts: { lock?: boolean } = {}): Promise<Profile | undefined> {
  const q = db.select().from(profiles).where(and(eq(profiles.organisationId, organisationId), eq(profiles.slug, slug)));
  const [row] = opts.lock ? await q.for("update") : await q;
  return row;
}

export async function listVersions(db: Queryable, profileId: string): Promise<Omit<ProfileVersion, "limits">[]> {
  return db
    .select({
      id: profileVersions.id,
      organisationId: profileVersions.organisationId,
      profileId: profileVersions.profileId,
      version: profileVersions.version,
      note: profileVersions.note,
      publishedByUserId: profileVersions.publishedByUserId,
      publishedAt: profileVersions.publishedAt,
    })
    .from(profileVersions)
    .where(eq(profileVersions.profileId, profileId))
    .orderBy(desc(profileVersions.version));
}

export async function findVersion(db: Queryable, profileId: string, version: number): Promise<ProfileVersion | undefined> {
  const [row] = await db
    .select()
    .from(profileVersions)
    .where(and(eq(profileVersions.profileId, profileId), eq(profileVersions.version, version)));
  return row;
}

export async function latestVersion(db: Queryable, profileId: string): Promise<ProfileVersion | undefined> {
  const [row] = await db
    .select()
    .from(profileVersions)
    .where(eq(profileVersions.profileId, profileId))
    .orderBy(desc(profileVersions.version))
    .limit(1);
  return row;
}

export async function insertProfile(db: Queryable, values: typeof profiles.$inferInsert): Promise<Profile> {
  const [row] = await db.insert(profiles).values(values).returning();
  return row;
}

export async function writeDraft(db: Queryable, profileId: string, draft: unknown | null): Promise<void> {
  await db
    .update(profiles)
    .set({ draft: draft as object | null, draftUpdatedAt: draft === null ? null : new Date() })
    .where(eq(profiles.id, profileId));
}

export async function insertVersion(db: Queryable, values: typeof profileVersions.$inferInsert): Promise<ProfileVersion> {
  const [row] = await db.insert(profileVersions).values(values).returning();
  return row;
}

export async function getDefaultProfileRef(db: Queryable, organisationId: string): Promise<string> {
  const [row] = await db.select({ ref: organisations.defaultProfile }).from(organisations).where(eq(organisations.id, organisationId));
  return row?.ref ?? "";
}

export async function writeDefaultProfileRef(db: Queryable, organisationId: string, ref: string): Promise<void> {
  await db.update(organisations).set({ defaultProfile: ref }).where(eq(organisations.id, organisationId));
}

