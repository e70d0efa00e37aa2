// GET /api/v1/health: app version and database status; 503 problem+json when the database is down.
import { getDb } from "@/db";
import { checkHealth } from "@/lib/health";
import { problemResponse } from "@/lib/api/problem";
import { APP_VERSION } from "@/lib/version";

export const dynamic = "force-dynamic";

export async function GET(req: Request) {
  const requestId = req.headers.get("x-request-id") ?? crypto.randomUUID();
  const report = await checkHealth(getDb(), APP_VERSION);
  if (report.database.status === "down") {
    return problemResponse("database_unavailable", "The database did not answer; verdicts cannot be stored right now.", {
      instance: new URL(req.url).pathname,
      requestId,
    });
  }
  return Response.json(report, { headers: { "x-request-id": requestId, "cache-control": "no-store" } });
}
