// GET /api/console/call-log/facets — routes and keys present in the visible log, for the filter menus.
import { withConsoleSession } from "@/lib/auth/console-route";
import { callLogFacets } from "@/lib/calllog/query";

export const dynamic = "force-dynamic";
export const GET = withConsoleSession(async ({ member }) => Response.json(await callLogFacets({ actor: member })));
