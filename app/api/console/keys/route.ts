// GET /api/console/keys — the API keys the signed-in member manages (never their hashes).
import { withConsoleSession } from "@/lib/auth/console-route";
import { listKeys } from "@/lib/keys/manage";

export const dynamic = "force-dynamic";
export const GET = withConsoleSession(async ({ member }) => Response.json(await listKeys({ actor: member })));
