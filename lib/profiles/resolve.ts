// Turns "slug" or "slug@version" into the profile the engine grades under: a built-in template, or one
// of the organisation's published versions (latest when no version is given). Templates are checked
// first and cost no query: an organisation profile may not take a template's slug (lib/profiles/drafts).
import type { Database } from "@/db";
import { findPublishedVersion } from "@/db/queries/verdict-profile-lookup";
import { findTemplate } from "@/lib/grading";
import { ProfileSchema, type Profile } from "@/lib/grading/schema";

export type ResolvedProfile =
  | { ok: true; profile: Profile; kind: "template" | "organisation" }
  | { ok: false; reason: string };

export function splitProfileRef(ref: string): { slug: string; version?: number } | null {
  const m = /^([a-z0-9](?:[a-z0-9-]*[a-z0-9])?)(?:@([1-9][0-9]{0,8}))?$/.exec(ref.trim());
  if (!m) return null;
  return m[2] ? { slug: m[1], version: Number(m[2]) } : { slug: m[1] };
}

// Published versions never change (a trigger refuses UPDATE), so their parsed form can be kept forever.
const parsedVersions = new Map<string, Profile>();
const MAX_CACHED = 500;

function parseStored(versionId: string, raw: { slug: string; name: string; version: number; limits: unknown }): Profile {
  const hit = parsedVersions.get(versionId);
  if (hit) return hit;
  const profile = ProfileSchema.parse({ slug: raw.slug, version: raw.version, name: raw.name, limits: raw.limits });
  if (parsedVersions.size >= MAX_CACHED) parsedVersions.clear();
  parsedVersions.set(versionId, profile);
  return profile;
}

export async function resolveProfile(db: Database, organisationId: string, ref: string): Promise<ResolvedProfile> {
  const parts = splitProfileRef(ref);
  if (!parts) return { ok: false, reason: `"${ref}" is not a profile reference (slug or slug@version)` };
  const template = findTemplate(parts.slug) as Profile | undefined;
  if (template) {
    if (parts.version !== undefined && parts.version !== template.version) {
      return { ok: false, reason: `Template ${parts.slug} is at version ${template.version}; version ${parts.version} does not exist` };
    }
    return { ok: true, profile: template, kind: "template" };
  }
  const own = await findPublishedVersion(db, organisationId, parts.slug, parts.version);
  if (own) return { ok: true, profile: parseStored(own.versionId, own), kind: "organisation" };
  return {
    ok: false,
    reason:
      parts.version === undefined
        ? `No template or published profile is called ${parts.slug}`
        : `Version ${parts.version} of profile ${parts.slug} does not exist`,
  };
}
