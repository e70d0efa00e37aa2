// GET /api/console/verdicts — filtered, cursor-paginated verdicts for the console table (SWR).
import { getDb } from "@/db";
import { withConsoleSession } from "@/lib/auth/console-route";
import { explore, facets, parseExplorerQuery } from "@/lib/audit/verdict-explorer";

export const dynamic = "force-dynamic";
export const GET = withConsoleSession(async ({ member, url }) => {
  const ctx = { db: getDb(), actor: member };
  const q = parseExplorerQuery(url.searchParams);
  const [page, menus] = await Promise.all([explore(ctx, q), url.searchParams.get("facets") === "1" ? facets(ctx) : undefined]);
  return Response.json({
    data: page.rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() })),
    nextCursor: page.nextCursor,
    ...(menus ? { facets: menus } : {}),
  });
});
