// Read-only profile views for API keys (the console's richer views live in lib/profiles/read).
import type { z } from "zod";
import type { Database } from "@/db";
import { findProfile, findVersion, getDefaultProfileRef, listProfileSummaries, listVersions } from "@/db/queries/profiles";
import { findTemplate, templates } from "@/lib/grading";
import type { Profile } from "@/lib/grading/schema";
import type { ProfileDetailSchema, ProfileListSchema, ProfileVersionSchema } from "./schemas/profiles";
import { splitProfileRef } from "@/lib/profiles/resolve";

function allTemplates(): Profile[] {
  return (Object.values(templates) as Profile[]).slice().sort((a, b) => a.slug.localeCompare(b.slug));
}

function isDefault(defaultRef: string, slug: string): boolean {
  return splitProfileRef(defaultRef)?.slug === slug;
}

export async function listProfilesForKey(db: Database, organisationId: string): Promise<z.input<typeof ProfileListSchema>> {
  const [own, defaultRef] = await Promise.all([listProfileSummaries(db, organisationId), getDefaultProfileRef(db, organisationId)]);
  const ownSlugs = new Set(own.map((p) => p.slug));
  return {
    defaultProfile: defaultRef,
    data: [
      ...own.map((p) => ({ slug: p.slug, name: p.name, kind: "organisation" as const, latestVersion: p.latestVersion, isDefault: isDefault(defaultRef, p.slug) })),
      ...allTemplates()
        .filter((t) => !ownSlugs.has(t.slug))
        .map((t) => ({ slug: t.slug, name: t.name, kind: "template" as const, latestVersion: t.version, isDefault: isDefault(defaultRef, t.slug) })),
    ],
  };
}

export async function getProfileForKey(db: Database, organisationId: string, slug: string): Promise<z.input<typeof ProfileDetailSchema> | null> {
  const own = await findProfile(db, organisationId, slug);
  if (own) {
    const versions = await listVersions(db, own.id);
    return {
      slug: own.slug,
      name: own.name,
      kind: "organisation",
      basedOn: own.basedOn,
      versions: versions.map((v) => ({ version: v.version, publishedAt: v.publishedAt.toISOString(), note: v.note })),
    };
  }
  const t = findTemplate(slug) as Profile | undefined;
  if (!t) return null;
  return { slug: t.slug, name: t.name, kind: "template", basedOn: null, versions: [{ version: t.version, publishedAt: null, note: t.description ?? "" }] };
}

export async function getProfileVersionForKey(
  db: Database,
  organisationId: string,
  slug: string,
  version: number,
): Promise<z.input<typeof ProfileVersionSchema> | null> {
  const own = await findProfile(db, organisationId, slug);
  if (own) {
    const v = await findVersion(db, own.id, version);
    if (!v) return null;
    return {
      slug: own.slug,
      name: own.name,
      kind: "organisation",
      version: v.version,
      publishedAt: v.publishedAt.toISOString(),
      note: v.note,
      limits: v.limits as Profile["limits"],
    };
  }
  const t = findTemplate(slug) as Profile | undefined;
  if (!t || t.version !== version) return null;
  return { slug: t.slug, name: t.name, kind: "template", version: t.version, publishedAt: null, note: t.description ?? "", limits: t.limits };
}
