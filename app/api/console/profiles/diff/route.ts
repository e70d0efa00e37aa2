// GET /api/console/profiles/diff?slug=&from=&to= — limit-by-limit changes between two versions
// (a number, "draft" or "template").
import { z } from "zod";
import { getDb } from "@/db";
import { withConsoleSession } from "@/lib/auth/console-route";
import { diffVersions, parseVersionSide } from "@/lib/profiles/read";

const Query = z.object({ slug: z.string().min(1).max(80), from: z.string().min(1), to: z.string().min(1) });

export const dynamic = "force-dynamic";
export const GET = withConsoleSession(async ({ member, url }) => {
  const q = Query.parse(Object.fromEntries(url.searchParams));
  const changes = await diffVersions({ db: getDb(), actor: member }, q.slug, parseVersionSide(q.from), parseVersionSide(q.to));
  return Response.json({ slug: q.slug, from: q.from, to: q.to, changes });
});
