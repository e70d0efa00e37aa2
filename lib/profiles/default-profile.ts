// The organisation's default profile is what the API grades under when a call names none.
import { recordAudit } from "@/db/queries/audit-events";
import { findProfile, findVersion, getDefaultProfileRef, latestVersion, writeDefaultProfileRef } from "@/db/queries/profiles";
import { authorise, InvalidInputError } from "./access";
import type { ProfileContext } from "./context";
import { templateBySlug } from "./limits";
import { parseProfileRef } from "./slug";

/** `ref` is "slug" (always the latest published version) or "slug@version" (pinned). */
export async function setDefaultProfile(ctx: ProfileContext, ref: string): Promise<{ ref: string }> {
  authorise(ctx.actor, "profiles:edit");
  const { slug, version } = parseProfileRef(ref.trim());
  const bad = (message: string) => new InvalidInputError([{ path: "ref", message }]);
  if (Number.isNaN(version)) throw bad("The version after @ must be a positive whole number");

  return ctx.db.transaction(async (tx) => {
    const profile = await findProfile(tx, ctx.actor.organisationId, slug);
    if (profile) {
      const exists = version === undefined ? await latestVersion(tx, profile.id) : await findVersion(tx, profile.id, version);
      if (!exists) throw bad(version === undefined ? "Publish a version of this profile first" : `Version ${version} of ${slug} does not exist`);
    } else {
      const template = templateBySlug(slug);
      if (!template) throw bad(`No template or profile is called ${slug}`);
      if (version !== undefined && version !== template.version) throw bad(`Template ${slug} is at version ${template.version}`);
    }
    const normalised = version === undefined ? slug : `${slug}@${version}`;
    const before = await getDefaultProfileRef(tx, ctx.actor.organisationId);
    await writeDefaultProfileRef(tx, ctx.actor.organisationId, normalised);
    await recordAudit(tx, {
      organisationId: ctx.actor.organisationId,
      actorUserId: ctx.actor.userId,
      action: "organisation.default_profile_set",
      entity: "organisation",
      entityId: ctx.actor.organisationId,
      before: { defaultProfile: before },
      after: { defaultProfile: normalised },
      requestId: ctx.requestId,
    });
    return { ref: normalised };
  });
}
