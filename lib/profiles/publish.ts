// Publishing freezes the draft as the next immutable version. The row lock on the profile serialises two
// engineers publishing at once; the unique (profile, version) index is the last line of defence.
import { recordAudit } from "@/db/queries/audit-events";
import { findProfile, latestVersion, insertVersion, writeDraft } from "@/db/queries/profiles";
import { authorise, ConflictError, InvalidInputError, NotFoundError } from "./access";
import type { ProfileContext } from "./context";
import { diffJson } from "./diff";
import { validateLimits } from "./limits";
import { ChangeNoteSchema } from "./slug";

export async function publishDraft(ctx: ProfileContext, slug: string, input: { note: string }): Promise<{ slug: string; version: number }> {
  authorise(ctx.actor, "profiles:edit");
  const note = ChangeNoteSchema.safeParse(input.note);
  if (!note.success) throw new InvalidInputError([{ path: "note", message: note.error.issues[0].message }]);
  return ctx.db.transaction(async (tx) => {
    const profile = await findProfile(tx, ctx.actor.organisationId, slug, { lock: true });
    if (!profile) throw new NotFoundError(`Profile ${slug}`);
    if (profile.draft === null) throw new ConflictError("There is no draft to publish");
    const latest = await latestVersion(tx, profile.id);
    const version = (latest?.version ?? 0) + 1;
    const valid = validateLimits({ slug, version, name: profile.name, limits: profile.draft });
    if (latest && diffJson(latest.limits, valid.limits).length === 0) {
      throw new ConflictError(`The draft is identical to version ${latest.version}; nothing to publish`);
    }
    const row = await insertVersion(tx, {
      organisationId: ctx.actor.organisationId,
      profileId: profile.id,
      version,
      limits: valid.limits as object,
      note: note.data,
      publishedByUserId: ctx.actor.userId,
    });
    await writeDraft(tx, profile.id, null);
    await recordAudit(tx, {
      organisationId: ctx.actor.organisationId,
      actorUserId: ctx.actor.userId,
      action: "profile.published",
      entity: "profile_version",
      entityId: row.id,
      after: { slug, version, note: note.data },
      requestId: ctx.requestId,
    });
    return { slug, version };
  });
}
