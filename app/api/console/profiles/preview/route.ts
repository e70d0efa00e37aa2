// POST /api/console/profiles/preview — impact preview of a draft, streamed as NDJSON progress + result.
import { getDb } from "@/db";
import { withConsoleSession } from "@/lib/auth/console-route";
import { draftProfileFor, previewImpact, relatedProfileSlugs } from "@/lib/profiles/impact-preview";
import { ndjsonResponse } from "@/lib/profiles/ndjson";
import { authorise, InvalidInputError } from "@/lib/profiles/access";
import { PreviewRequestSchema, toDates } from "@/lib/profiles/requests";

export const dynamic = "force-dynamic";
export const POST = withConsoleSession(async ({ member, req }) => {
  const body = PreviewRequestSchema.parse(await req.json().catch(() => ({})));
  const ctx = { db: getDb(), actor: member };
  authorise(member, "profiles:edit");
  // Limits issues come relative to the limits object; the body nests it under "limits".
  const profile = await draftProfileFor(ctx, body.slug, body.limits).catch((err: unknown) => {
    throw err instanceof InvalidInputError ? err.within("limits") : err;
  });
  const profileSlugs = body.scope === "related" ? await relatedProfileSlugs(ctx, body.slug) : undefined;
  return ndjsonResponse(previewImpact(ctx, profile, { limit: body.limit, profileSlugs, ...toDates(body) }, req.signal), req.signal);
});
