// GET /api/console/call-log — one page of the filtered, sorted call log.
import { withConsoleSession } from "@/lib/auth/console-route";
import { listCalls } from "@/lib/calllog/query";
import { parseCallLogQuery } from "@/lib/calllog/schemas";

export const dynamic = "force-dynamic";
export const GET = withConsoleSession(async ({ member, url }) => Response.json(await listCalls({ actor: member }, parseCallLogQuery(url.searchParams))));
