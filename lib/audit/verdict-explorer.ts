// Searching and opening stored verdicts in the console.
import { z } from "zod";
import { explorerFacets, findVerdictDetail, searchVerdicts, type ExplorerRow } from "@/db/queries/verdict-explorer";
import type { GradingResult, LinkTest } from "@/lib/grading/schema";
import { authorise, NotFoundError } from "@/lib/profiles/access";
import type { ProfileContext } from "@/lib/profiles/context";

const instant = z.iso.datetime({ offset: true, message: "Use an ISO 8601 time" });

export const ExplorerQuerySchema = z.object({
  verdict: z.enum(["pass", "marginal", "fail"]).optional(),
  profile: z.string().regex(/^[a-z0-9-]+(@[1-9][0-9]*)?$/, "Use slug or slug@version").optional(),
  linkRef: z.string().trim().min(1).max(200).optional(),
  reasonCode: z.string().trim().min(1).max(80).optional(),
  from: instant.optional(),
  to: instant.optional(),
  cursor: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});
export type ExplorerQuery = z.infer<typeof ExplorerQuerySchema>;

export function parseExplorerQuery(params: URLSearchParams): ExplorerQuery {
  // Empty form fields arrive as "": they mean "no filter".
  const raw = Object.fromEntries([...params.entries()].filter(([, v]) => v !== ""));
  return ExplorerQuerySchema.parse(raw);
}

export async function explore(ctx: ProfileContext, q: ExplorerQuery): Promise<{ rows: ExplorerRow[]; nextCursor: number | null }> {
  authorise(ctx.actor, "verdicts:read");
  const [slug, version] = q.profile ? q.profile.split("@") : [];
  const rows = await searchVerdicts(
    ctx.db,
    ctx.actor.organisationId,
    {
      verdict: q.verdict,
      profileSlug: slug,
      profileVersion: version ? Number(version) : undefined,
      linkRef: q.linkRef,
      reasonCode: q.reasonCode,
      from: q.from ? new Date(q.from) : undefined,
      to: q.to ? new Date(q.to) : undefined,
      beforeSeq: q.cursor,
    },
    q.limit + 1,
  );
  const page = rows.slice(0, q.limit);
  return { rows: page, nextCursor: rows.length > q.limit ? page[page.length - 1].seq : null };
}

export async function facets(ctx: ProfileContext) {
  authorise(ctx.actor, "verdicts:read");
  return explorerFacets(ctx.db, ctx.actor.organisationId);
}

export interface VerdictDetail {
  id: string;
  seq: number;
  linkRef: string;
  verdict: "pass" | "marginal" | "fail";
  profile: { slug: string; version: number };
  engineVersion: string;
  digest: string;
  prevDigest: string | null;
  createdAt: string;
  viaApiKey: boolean;
  result: GradingResult;
  test: LinkTest;
}

export async function verdictDetail(ctx: ProfileContext, id: string): Promise<VerdictDetail> {
  authorise(ctx.actor, "verdicts:read");
  if (!/^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(id)) throw new NotFoundError("Verdict");
  const row = await findVerdictDetail(ctx.db, ctx.actor.organisationId, id);
  if (!row) throw new NotFoundError("Verdict");
  return {
    id: row.id,
    seq: Number(row.seq),
    linkRef: row.linkRef,
    verdict: row.verdict as VerdictDetail["verdict"],
    profile: { slug: row.profileSlug, version: row.profileVersion },
    engineVersion: row.engineVersion,
    digest: row.digest,
    prevDigest: row.prevDigest,
    createdAt: new Date(row.createdAt).toISOString(),
    viaApiKey: row.apiKeyId !== null,
    result: row.result as GradingResult,
    test: row.input as LinkTest,
  };
}
