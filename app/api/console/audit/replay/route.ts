// POST /api/console/audit/replay — bulk replay of a time range, streamed as NDJSON progress + summary.
import { getDb } from "@/db";
import { withConsoleSession } from "@/lib/auth/console-route";
import { replayRange } from "@/lib/audit/replay";
import { ndjsonResponse } from "@/lib/profiles/ndjson";
import { TimeRangeSchema, toDates } from "@/lib/profiles/requests";

export const dynamic = "force-dynamic";
export const POST = withConsoleSession(async ({ member, req }) => {
  const range = TimeRangeSchema.parse(await req.json().catch(() => ({})));
  return ndjsonResponse(replayRange({ db: getDb(), actor: member }, toDates(range), req.signal), req.signal);
});
