// Profile versions as the grading API needs them: one query from (organisation, slug[, version]) to the
// published limits. Scoped by organisation, so another organisation's profile reads as absent.
import { and, desc, eq } from "drizzle-orm";
import type { Database } from "@/db";
import { profiles, profileVersions } from "@/db/schema";

export interface PublishedVersion {
  versionId: string;
  slug: string;
  name: string;
  version: number;
  limits: unknown;
}

export async function findPublishedVersion(
  db: Database,
  organisationId: string,
  slug: string,
  version?: number,
): Promise<PublishedVersion | null> {
  const cond = [eq(profiles.organisationId, organisationId), eq(profiles.slug, slug)];
  if (version !== undefined) cond.push(eq(profileVersions.version, version));
  const [row] = await db
    .select({
      versionId: profileVersions.id,
      slug: profiles.slug,
      name: profiles.name,
      version: profileVersions.version,
      limits: profileVersions.limits,
    })
    .from(profiles)
    .innerJoin(profileVersions, eq(profileVersions.profileId, profiles.id))
    .where(and(...cond))
    .orderBy(desc(profileVersions.version))
    .limit(1);
  return row ?? null;
}
