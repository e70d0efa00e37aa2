// GET /api/v1/verdicts/{id}: one stored verdict of the key's organisation.
import { ApiError } from "@/lib/api/problem";
import { json } from "@/lib/api/respond";
import { VerdictResourceSchema } from "@/lib/api/schemas/verdicts";
import { withApiKey } from "@/lib/api/with-api-key";
import { getVerdict } from "@/lib/verdicts/read";
import { refuseOtherMethods } from "@/lib/api/other-methods";

export const dynamic = "force-dynamic";

export const GET = withApiKey<{ id: string }>(
  async (ctx, { id }) => {
    const v = await getVerdict(ctx.db, ctx.organisationId, id);
    if (!v) throw new ApiError("not_found", `No verdict ${id} in your organisation.`);
    ctx.record.verdictId = v.id;
    return json(VerdictResourceSchema, v);
  },
  { route: "/api/v1/verdicts/{id}", scope: "verdicts:read" },
);

export const { POST, PUT, PATCH, DELETE } = refuseOtherMethods("/api/v1/verdicts/{id}", ["GET"]);
