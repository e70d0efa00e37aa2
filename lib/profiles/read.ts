// Read side of profiles for the console: lists, one profile with its versions, one version, a diff.
import { findProfile, findVersion, getDefaultProfileRef, listProfileSummaries, listVersions, type ProfileSummary } from "@/db/queries/profiles";
import { authorise, InvalidInputError, NotFoundError } from "./access";
import type { ProfileContext } from "./context";
import { diffJson, type LimitChange } from "./diff";
import { allTemplates, templateBySlug, type Limits } from "./limits";
import { parseProfileRef } from "./slug";

export interface TemplateSummary {
  slug: string;
  version: number;
  name: string;
}

export async function listProfiles(ctx: ProfileContext): Promise<{ templates: TemplateSummary[]; profiles: ProfileSummary[]; defaultRef: string }> {
  authorise(ctx.actor, "profiles:read");
  const [profiles, defaultRef] = await Promise.all([
    listProfileSummaries(ctx.db, ctx.actor.organisationId),
    getDefaultProfileRef(ctx.db, ctx.actor.organisationId),
  ]);
  const templates = allTemplates().map(({ slug, version, name }) => ({ slug, version, name }));
  return { templates, profiles, defaultRef };
}

export async function getProfileDetail(ctx: ProfileContext, slug: string) {
  authorise(ctx.actor, "profiles:read");
  const profile = await findProfile(ctx.db, ctx.actor.organisationId, slug);
  if (!profile) throw new NotFoundError(`Profile ${slug}`);
  const [versions, defaultRef] = await Promise.all([listVersions(ctx.db, profile.id), getDefaultProfileRef(ctx.db, ctx.actor.organisationId)]);
  return {
    id: profile.id,
    slug: profile.slug,
    name: profile.name,
    basedOn: profile.basedOn,
    draft: profile.draft as Limits | null,
    draftUpdatedAt: profile.draftUpdatedAt,
    versions,
    defaultRef,
  };
}

/** One side of a diff: a published version number, the open draft, or the template the profile came from. */
export type VersionSide = number | "draft" | "template";

export function parseVersionSide(raw: string): VersionSide {
  if (raw === "draft" || raw === "template") return raw;
  const n = Number(raw);
  if (!Number.isInteger(n) || n < 1) throw new InvalidInputError([{ path: "version", message: `"${raw}" is not a version number, "draft" or "template"` }]);
  return n;
}

export async function loadLimits(ctx: ProfileContext, slug: string, side: VersionSide): Promise<Limits> {
  authorise(ctx.actor, "profiles:read");
  const template = templateBySlug(slug);
  const profile = await findProfile(ctx.db, ctx.actor.organisationId, slug);
  if (!profile) {
    // Templates are read-only profiles with one version: diffing a template against itself is allowed.
    if (template && (side === "template" || side === template.version)) return template.limits;
    throw new NotFoundError(`Profile ${slug}`);
  }
  if (side === "draft") {
    if (profile.draft === null) throw new NotFoundError(`Draft of ${slug}`);
    return profile.draft as Limits;
  }
  if (side === "template") {
    const base = profile.basedOn ? templateBySlug(parseProfileRef(profile.basedOn).slug) : undefined;
    if (!base) throw new NotFoundError(`Template of ${slug}`);
    return base.limits;
  }
  const row = await findVersion(ctx.db, profile.id, side);
  if (!row) throw new NotFoundError(`Version ${side} of ${slug}`);
  return row.limits as Limits;
}

export async function diffVersions(ctx: ProfileContext, slug: string, from: VersionSide, to: VersionSide): Promise<LimitChange[]> {
  const [a, b] = await Promise.all([loadLimits(ctx, slug, from), loadLimits(ctx, slug, to)]);
  return diffJson(a, b);
}
