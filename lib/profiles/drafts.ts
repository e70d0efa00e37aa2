// Organisation profiles start as a draft cloned from a template; a draft is edited freely until it is
// published (lib/profiles/publish.ts). Published versions are never edited: a new draft starts from one.
import { recordAudit } from "@/db/queries/audit-events";
import {
  findProfile,
  insertProfile,
  latestVersion,
  writeDraft,
} from "@/db/queries/profiles";
import { authorise, ConflictError, InvalidInputError, NotFoundError } from "./access";
import type { ProfileContext } from "./context";
import { templateBySlug, validateLimits, type Limits } from "./limits";
import { ProfileNameSchema, ProfileSlugSchema } from "./slug";

function fieldCheck<T>(schema: { safeParse(v: unknown): { success: true; data: T } | { success: false; error: { issues: { message: string }[] } } }, value: unknown, path: string): T {
  const r = schema.safeParse(value);
  if (!r.success) throw new InvalidInputError([{ path, message: r.error.issues[0]?.message ?? "Invalid" }]);
  return r.data;
}

export async function cloneTemplate(
  ctx: ProfileContext,
  input: { templateSlug: string; slug: string; name: string },
): Promise<{ slug: string }> {
  authorise(ctx.actor, "profiles:edit");
  const slug = fieldCheck(ProfileSlugSchema, input.slug, "slug");
  const name = fieldCheck(ProfileNameSchema, input.name, "name");
  const template = templateBySlug(input.templateSlug);
  if (!template) throw new NotFoundError(`Template ${input.templateSlug}`);
  // A profile may not shadow a template: `slug@version` must mean one thing only.
  if (templateBySlug(slug)) throw new InvalidInputError([{ path: "slug", message: "A built-in template already uses this slug" }]);

  return ctx.db.transaction(async (tx) => {
    if (await findProfile(tx, ctx.actor.organisationId, slug)) {
      throw new InvalidInputError([{ path: "slug", message: "Your organisation already has a profile with this slug" }]);
    }
    const row = await insertProfile(tx, {
      organisationId: ctx.actor.organisationId,
      slug,
      name,
      basedOn: `${template.slug}@${template.version}`,
      draft: structuredClone(template.limits) as object,
      draftUpdatedAt: new Date(),
    });
    await recordAudit(tx, {
      organisationId: ctx.actor.organisationId,
      actorUserId: ctx.actor.userId,
      action: "profile.cloned",
      entity: "profile",
      entityId: row.id,
      after: { slug, name, basedOn: row.basedOn },
      requestId: ctx.requestId,
    });
    return { slug };
  });
}

/** Starts a draft from the latest published version (or returns the open draft unchanged). */
export async function openDraft(ctx: ProfileContext, slug: string): Promise<Limits> {
  authorise(ctx.actor, "profiles:edit");
  return ctx.db.transaction(async (tx) => {
    const profile = await findProfile(tx, ctx.actor.organisationId, slug, { lock: true });
    if (!profile) throw new NotFoundError(`Profile ${slug}`);
    if (profile.draft !== null) return profile.draft as Limits;
    const latest = await latestVersion(tx, profile.id);
    if (!latest) throw new ConflictError("The profile has neither a draft nor a published version");
    await writeDraft(tx, profile.id, latest.limits);
    return latest.limits as Limits;
  });
}

export async function saveDraft(ctx: ProfileContext, slug: string, limits: unknown): Promise<Limits> {
  authorise(ctx.actor, "profiles:edit");
  return ctx.db.transaction(async (tx) => {
    const profile = await findProfile(tx, ctx.actor.organisationId, slug, { lock: true });
    if (!profile) throw new NotFoundError(`Profile ${slug}`);
    const latest = await latestVersion(tx, profile.id);
    const valid = validateLimits({ slug, version: (latest?.version ?? 0) + 1, name: profile.name, limits });
    await writeDraft(tx, profile.id, valid.limits);
    await recordAudit(tx, {
      organisationId: ctx.actor.organisationId,
      actorUserId: ctx.actor.userId,
      action: "profile.draft_saved",
      entity: "profile",
      entityId: profile.id,
      before: (profile.draft ?? null) as object | null,
      after: valid.limits as object,
      requestId: ctx.requestId,
    });
    return valid.limits;
  });
}

export async function discardDraft(ctx: ProfileContext, slug: string): Promise<void> {
  authorise(ctx.actor, "profiles:edit");
  await ctx.db.transaction(async (tx) => {
    const profile = await findProfile(tx, ctx.actor.organisationId, slug, { lock: true });
    if (!profile) throw new NotFoundError(`Profile ${slug}`);
    if (!(await latestVersion(tx, profile.id))) {
      throw new ConflictError("A profile that was never published keeps its draft; there is nothing to go back to");
    }
    await writeDraft(tx, profile.id, null);
    await recordAudit(tx, {
      organisationId: ctx.actor.organisationId,
      actorUserId: ctx.actor.userId,
      action: "profile.draft_discarded",
      entity: "profile",
      entityId: profile.id,
      before: profile.draft as object | null,
      requestId: ctx.requestId,
    });
  });
}
