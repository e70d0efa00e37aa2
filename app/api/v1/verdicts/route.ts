// GET /api/v1/verdicts: newest first, filtered, cursor-paginated.
import { ApiError } from "@/lib/api/problem";
import { validate } from "@/lib/api/read-body";
import { json } from "@/lib/api/respond";
import { VerdictListQuerySchema, VerdictListSchema } from "@/lib/api/schemas/verdicts";
import { withApiKey } from "@/lib/api/with-api-key";
import { BadCursorError, listVerdictPage } from "@/lib/verdicts/read";
import { refuseOtherMethods } from "@/lib/api/other-methods";

export const dynamic = "force-dynamic";

export const GET = withApiKey(
  async (ctx) => {
    const query = validate(VerdictListQuerySchema, Object.fromEntries(ctx.url.searchParams));
    try {
      return json(VerdictListSchema, await listVerdictPage(ctx.db, ctx.organisationId, query));
    } catch (err) {
      if (err instanceof BadCursorError) {
        throw new ApiError("validation_failed", "The cursor is not valid.", { errors: [{ pointer: "/cursor", message: err.message }] });
      }
      throw err;
    }
  },
  { route: "/api/v1/verdicts", scope: "verdicts:read" },
);

export const { POST, PUT, PATCH, DELETE } = refuseOtherMethods("/api/v1/verdicts", ["GET"]);
