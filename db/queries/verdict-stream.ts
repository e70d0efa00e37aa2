// Walks an organisation's stored verdicts (newest first or in chain order) in keyset-paginated batches,
// so previews, bulk replays, chain checks and exports over hundreds of thousands of rows use flat memory.
// The next batch is requested before the caller works on the current one, so PostgreSQL and the
// JavaScript thread overlap.
import { sql, type SQL } from "drizzle-orm";
import type { Database } from "../index";

export interface VerdictStreamOptions {
  organisationId: string;
  from?: Date;
  to?: Date;
  /** Stop after this many rows; undefined = all of them. */
  limit?: number;
  batchSize?: number;
  /** "newest" walks seq downwards (impact preview: the last N), "chain" walks it upwards (audit). */
  order: "newest" | "chain";
  /** Include the submitted test input (a join on tests). */
  withTest?: boolean;
  /** Include the stored result JSON. */
  withResult?: boolean;
  /** Start after this seq (exclusive), in the walking direction. */
  afterSeq?: number;
}

export interface StreamedVerdict {
  id: string;
  seq: number;
  testId: string;
  linkRef: string;
  verdict: "pass" | "marginal" | "fail";
  headroomDb: number | null;
  profileSlug: string;
  profileVersion: number;
  engineVersion: string;
  digest: string;
  prevDigest: string | null;
  createdAt: Date;
  result?: unknown;
  input?: unknown;
  testCreatedAt?: Date;
}

function rangeFilter(o: VerdictStreamOptions): SQL {
  const parts: SQL[] = [sql`v.organisation_id = ${o.organisationId}`];
  if (o.from) parts.push(sql`v.created_at >= ${o.from.toISOString()}`);
  if (o.to) parts.push(sql`v.created_at < ${o.to.toISOString()}`);
  return sql.join(parts, sql` and `);
}

export async function countVerdicts(db: Database, o: VerdictStreamOptions): Promise<number> {
  const res = await db.execute<{ n: string }>(sql`select count(*)::bigint as n from verdicts v where ${rangeFilter(o)}`);
  const n = Number(res.rows[0]?.n ?? 0);
  return o.limit === undefined ? n : Math.min(n, o.limit);
}

async function fetchBatch(db: Database, o: VerdictStreamOptions, after: number | null, size: number): Promise<StreamedVerdict[]> {
  const cursor = after === null ? sql`true` : o.order === "newest" ? sql`v.seq < ${after}` : sql`v.seq > ${after}`;
  const order = o.order === "newest" ? sql`v.seq desc` : sql`v.seq asc`;
  const res = await db.execute(sql`
    select v.id, v.seq, v.test_id as "testId", v.link_ref as "linkRef", v.verdict, v.headroom_db as "headroomDb",
           v.profile_slug as "profileSlug", v.profile_version as "profileVersion", v.engine_version as "engineVersion",
           v.digest, v.prev_digest as "prevDigest", v.created_at as "createdAt"
           ${o.withResult ? sql`, v.result` : sql``}
           ${o.withTest ? sql`, t.input, t.created_at as "testCreatedAt"` : sql``}
    from verdicts v ${o.withTest ? sql`join tests t on t.id = v.test_id` : sql``}
    where ${rangeFilter(o)} and ${cursor}
    order by ${order}
    limit ${size}`);
  return (res.rows as unknown as StreamedVerdict[]).map((r) => ({
    ...r,
    seq: Number(r.seq),
    createdAt: new Date(r.createdAt),
    testCreatedAt: r.testCreatedAt ? new Date(r.testCreatedAt) : undefined,
  }));
}

/** Keyset pagination over seq with one batch always in flight ahead of the consumer. */
async function* keysetBatches<T extends { seq: number }>(
  fetch: (after: number | null, size: number) => Promise<T[]>,
  o: { limit?: number; batchSize?: number; afterSeq?: number },
): AsyncGenerator<T[]> {
  const batchSize = o.batchSize ?? 1000;
  let remaining = o.limit ?? Number.POSITIVE_INFINITY;
  let next = fetch(o.afterSeq ?? null, Math.min(batchSize, remaining));
  // A consumer that stops early never awaits the prefetch; keep its failure from going unhandled.
  next.catch(() => undefined);
  while (remaining > 0) {
    const rows = await next;
    if (rows.length === 0) return;
    remaining -= rows.length;
    const done = rows.length < batchSize || remaining <= 0;
    if (!done) {
      next = fetch(rows[rows.length - 1].seq, Math.min(batchSize, remaining));
      next.catch(() => undefined);
    }
    yield rows;
    if (done) return;
  }
}

export function streamVerdicts(db: Database, o: VerdictStreamOptions): AsyncGenerator<StreamedVerdict[]> {
  return keysetBatches((after, size) => fetchBatch(db, o, after, size), o);
}

/** Only what an impact preview reads: a lean row keeps the per-row decoding cost down. */
export interface PreviewRow {
  id: string;
  seq: number;
  linkRef: string;
  verdict: "pass" | "marginal" | "fail";
  headroomDb: number | null;
  profileSlug: string;
  profileVersion: number;
  input: unknown;
}

export function streamPreviewRows(db: Database, o: Omit<VerdictStreamOptions, "order" | "withTest" | "withResult">): AsyncGenerator<PreviewRow[]> {
  const f = { ...o, order: "newest" as const };
  return keysetBatches(async (after, size) => {
    const res = await db.execute(sql`
      select v.seq, v.id, v.link_ref as "linkRef", v.verdict, v.headroom_db as "headroomDb",
             v.profile_slug as "profileSlug", v.profile_version as "profileVersion", t.input
      from verdicts v join tests t on t.id = v.test_id
      where ${rangeFilter(f)} and ${after === null ? sql`true` : sql`v.seq < ${after}`}
      order by v.seq desc
      limit ${size}`);
    const rows = res.rows as unknown as PreviewRow[];
    for (const r of rows) r.seq = Number(r.seq);
    return rows;
  }, o);
}
