// POST /api/v1/verdicts/{id}/replay: re-grade the stored test and compare digests; writes nothing.
import { ApiError } from "@/lib/api/problem";
import { json } from "@/lib/api/respond";
import { ReplayRequestSchema, ReplayResultSchema } from "@/lib/api/schemas/verdicts";
import { withApiKey } from "@/lib/api/with-api-key";
import { replayVerdict } from "@/lib/verdicts/replay";
import { refuseOtherMethods } from "@/lib/api/other-methods";

export const dynamic = "force-dynamic";

export const POST = withApiKey<{ id: string }>(
  async (ctx, { id }) => {
    // The body is optional: no body replays under the stored profile version only.
    const input = ctx.bodyText.trim() === "" ? {} : ctx.body(ReplayRequestSchema);
    const r = await replayVerdict(ctx.db, ctx.organisationId, id, input.profile);
    if (!r.ok) {
      if (r.code === "not_found") throw new ApiError("not_found", r.detail);
      if (r.code === "comparison_profile") {
        throw new ApiError("validation_failed", "The comparison profile cannot be used.", { errors: [{ pointer: "/profile", message: r.detail }] });
      }
      throw new ApiError("conflict", r.detail);
    }
    ctx.record.verdictId = r.result.verdictId;
    return json(ReplayResultSchema, r.result);
  },
  { route: "/api/v1/verdicts/{id}/replay", scope: "verdicts:read" },
);

export const { GET, PUT, PATCH, DELETE } = refuseOtherMethods("/api/v1/verdicts/{id}/replay", ["POST"]);
