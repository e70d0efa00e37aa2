import { and, desc, eq, gte, inArray, sql } from "drizzle-orm";
import { getDb } from "@/db";
import { callLog, verdicts } from "@/db/schema";
import { assertCan, type ActorContext } from "@/lib/auth/context";
import { visibleTo } from "@/lib/calllog/query";
import { can } from "@/lib/auth/roles";
import { fillDays, lastDays } from "./days";

export const VERDICT_KEYS = ["pass", "marginal", "fail"] as const;
export const STATUS_KEYS = ["2xx", "4xx", "5xx"] as const;

export interface Overview {
  days: number;
  verdictsPerDay: { day: string; pass: number; marginal: number; fail: number }[];
  totals: { pass: number; marginal: number; fail: number };
  topReasons: { code: string; n: number }[];
  recentFailures: { id: string; linkRef: string; verdict: "marginal" | "fail"; reasonCodes: string[]; profile: string; createdAt: string }[];
  callsPerDay: { day: string; "2xx": number; "4xx": number; "5xx": number }[];
  /** True when the call figures cover only the member's own keys and calls. */
  callsOwnOnly: boolean;
}

const dayOf = (col: typeof verdicts.createdAt | typeof callLog.createdAt) => sql<string>`to_char(${col} at time zone 'UTC', 'YYYY-MM-DD')`;

export async function getOverview({ actor }: ActorContext, opts: { days?: number; now?: Date } = {}): Promise<Overview> {
  assertCan(actor, "overview:read");
  const days = Math.min(Math.max(opts.days ?? 30, 7), 90);
  const range = lastDays(days, opts.now);
  const since = new Date(`${range[0]}T00:00:00Z`);
  const db = getDb();
  const inOrg = and(eq(verdicts.organisationId, actor.organisationId), gte(verdicts.createdAt, since));

  const vRows = await db
    .select({ day: dayOf(verdicts.createdAt), key: verdicts.verdict, n: sql<number>`count(*)::int` })
    .from(verdicts)
    .where(inOrg)
    .groupBy(sql`1`, verdicts.verdict);
  const verdictsPerDay = fillDays(range, VERDICT_KEYS, vRows);
  const totals = { pass: 0, marginal: 0, fail: 0 };
  for (const d of verdictsPerDay) for (const k of VERDICT_KEYS) totals[k] += d[k];

  // The findings that made links marginal or fail (informational reasons left out), counted once per
  // verdict. Severity lives in the stored result, the engine's own output.
  const reasonRows = await db.execute<{ code: string; n: number }>(sql`
    select code, count(*)::int as n from (
      select distinct ${verdicts.id} as id, r->>'code' as code
      from ${verdicts}, jsonb_array_elements(coalesce(${verdicts.result}->'reasons', '[]'::jsonb)) as r
      where ${verdicts.organisationId} = ${actor.organisationId} and ${verdicts.createdAt} >= ${since}
        and r->>'severity' in ('marginal', 'fail')
    ) findings
    group by code order by n desc, code asc limit 8`);

  const failures = await db
    .select({ id: verdicts.id, linkRef: verdicts.linkRef, verdict: verdicts.verdict, reasonCodes: verdicts.reasonCodes, slug: verdicts.profileSlug, version: verdicts.profileVersion, createdAt: verdicts.createdAt })
    .from(verdicts)
    .where(and(eq(verdicts.organisationId, actor.organisationId), inArray(verdicts.verdict, ["fail", "marginal"])))
    .orderBy(desc(verdicts.createdAt))
    .limit(8);

  const cRows = await db
    .select({
      day: dayOf(callLog.createdAt),
      key: sql<"2xx" | "4xx" | "5xx">`case when ${callLog.status} >= 500 then '5xx' when ${callLog.status} >= 400 then '4xx' else '2xx' end`,
      n: sql<number>`count(*)::int`,
    })
    .from(callLog)
    .where(and(visibleTo(actor), gte(callLog.createdAt, since)))
    .groupBy(sql`1`, sql`2`);

  return {
    days,
    verdictsPerDay,
    totals,
    topReasons: reasonRows.rows.map((r) => ({ code: r.code, n: Number(r.n) })),
    recentFailures: failures.map((f) => ({
      id: f.id,
      linkRef: f.linkRef,
      verdict: f.verdict as "marginal" | "fail",
      reasonCodes: f.reasonCodes,
      profile: `${f.slug}@${f.version}`,
      createdAt: f.createdAt.toISOString(),
    })),
    callsPerDay: fillDays(range, STATUS_KEYS, cRows),
    callsOwnOnly: !can(actor.role, "calllog:read-all"),
  };
}
