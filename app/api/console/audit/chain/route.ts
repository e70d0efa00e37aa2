// POST /api/console/audit/chain — verify the organisation's verdict chain, streamed as NDJSON.
import { getDb } from "@/db";
import { withConsoleSession } from "@/lib/auth/console-route";
import { verifyChain } from "@/lib/audit/chain";
import { ndjsonResponse } from "@/lib/profiles/ndjson";

export const dynamic = "force-dynamic";
export const POST = withConsoleSession(async ({ member, req }) => ndjsonResponse(verifyChain({ db: getDb(), actor: member }), req.signal));
