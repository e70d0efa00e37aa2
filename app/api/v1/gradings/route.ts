// POST /api/v1/gradings: grade one link test, store it in the chain, answer 201 with the verdict.
import { profileForRequest } from "@/lib/api/profile-for-request";
import { json } from "@/lib/api/respond";
import { GradingRequestSchema } from "@/lib/api/schemas/gradings";
import { VerdictResourceSchema } from "@/lib/api/schemas/verdicts";
import { withApiKey } from "@/lib/api/with-api-key";
import { gradeAndStore } from "@/lib/verdicts/grade";
import { toVerdictResource } from "@/lib/verdicts/present";
import { refuseOtherMethods } from "@/lib/api/other-methods";

export const dynamic = "force-dynamic";

export const POST = withApiKey(
  async (ctx) => {
    const input = ctx.body(GradingRequestSchema);
    const profile = await profileForRequest(ctx.db, ctx.organisationId, input.profile, ctx.key.defaultProfile);
    const [row] = await gradeAndStore({ db: ctx.db, organisationId: ctx.organisationId, apiKeyId: ctx.key.id, now: ctx.now }, profile, [
      { test: input.test },
    ]);
    ctx.record.verdictId = row.id;
    return json(VerdictResourceSchema, toVerdictResource(row), { status: 201, headers: { Location: `/api/v1/verdicts/${row.id}` } });
  },
  { route: "/api/v1/gradings", scope: "grade" },
);

export const { GET, PUT, PATCH, DELETE } = refuseOtherMethods("/api/v1/gradings", ["POST"]);
