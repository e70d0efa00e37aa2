// GET /api/v1/health: app version and database status; 503 problem+json when the database is down.
import { checkHealth } from "@/lib/health";
import { withPublic } from "@/lib/api/with-api-key";
import { ApiError } from "@/lib/api/problem";
import { APP_VERSION } from "@/lib/version";
import { refuseOtherMethods } from "@/lib/api/other-methods";

export const dynamic = "force-dynamic";

export const GET = withPublic(
  async ({ db }) => {
    const report = await checkHealth(db, APP_VERSION);
    if (report.database.status === "down") {
      throw new ApiError("database_unavailable", "The database did not answer; verdicts cannot be stored right now.");
    }
    return Response.json(report, { headers: { "cache-control": "no-store" } });
  },
  { route: "/api/v1/health" },
);

export const { POST, PUT, PATCH, DELETE } = refuseOtherMethods("/api/v1/health", ["GET"]);
