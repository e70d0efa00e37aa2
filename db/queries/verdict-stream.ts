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
  /** Only verdicts graded under one of these profile slugs (any version). */
  profileSlugs?: string[];
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
  if (o.profileSlugs) {
    parts.push(o.profileSlugs.length ? sql`v.profile_slug in (${sql.join(o.profileSlugs.map((s) => sql`${s}`), sql`, `)})` : sql`false`);
  }
  return sql.join(parts, sql` and `);
}

/** Rows of `table` (verdicts or preview_inputs, one row per verdict in both) that a walk over `o` will see. */
async function countRows(db: Database, table: SQL, o: VerdictStreamOptions): Promise<number> {
  const res = await db.execute<{ n: string }>(sql`select count(*)::bigint as n from ${table} v where ${rangeFilter(o)}`);
  const n = Number(res.rows[0]?.n ?? 0);
  return o.limit === undefined ? n : Math.min(n, o.limit);
}

export function countVerdicts(db: Database, o: VerdictStreamOptions): Promise<number> {
  return countRows(db, sql`verdicts`, o);
}

// The page of verdicts is cut first (an index range scan on (organisation_id, seq)) and only then joined
// to tests: written as one join, PostgreSQL plans a parallel scan over the whole range for every batch,
// which was several times slower on 200,000 stored tests.
async function fetchBatch(db: Database, o: VerdictStreamOptions, after: number | null, size: number): Promise<StreamedVerdict[]> {
  const cursor = after === null ? sql`true` : o.order === "newest" ? sql`v.seq < ${after}` : sql`v.seq > ${after}`;
  const order = o.order === "newest" ? sql`seq desc` : sql`seq asc`;
  const res = await db.execute(sql`
    with page as materialized (
      select v.id, v.seq, v.test_id, v.link_ref, v.verdict, v.headroom_db, v.profile_slug, v.profile_version,
             v.engine_version, v.digest, v.prev_digest, v.created_at ${o.withResult ? sql`, v.result` : sql``}
      from verdicts v
      where ${rangeFilter(o)} and ${cursor}
      order by v.${order}
      limit ${size})
    select p.id, p.seq, p.test_id as "testId", p.link_ref as "linkRef", p.verdict, p.headroom_db as "headroomDb",
           p.profile_slug as "profileSlug", p.profile_version as "profileVersion", p.engine_version as "engineVersion",
           p.digest, p.prev_digest as "prevDigest", p.created_at as "createdAt"
           ${o.withResult ? sql`, p.result` : sql``}
           ${o.withTest ? sql`, t.input, t.created_at as "testCreatedAt"` : sql``}
    from page p ${o.withTest ? sql`join tests t on t.id = p.test_id` : sql``}
    order by p.${order}`);
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

/**
 * Only what an impact preview reads, from preview_inputs: the verdict as stored and the compact copy of
 * its test's input (decoded by lib/verdicts/packed-input.ts). No join to tests and no jsonb to convert,
 * which made reading, not grading, most of a large preview's time.
 */
export interface PreviewRow {
  verdictId: string;
  seq: number;
  verdict: "pass" | "marginal" | "fail";
  headroomDb: number | null;
  profileSlug: string;
  profileVersion: number;
  packed: string;
}

export type PreviewStreamOptions = Omit<VerdictStreamOptions, "order" | "withTest" | "withResult">;

export function countPreviewRows(db: Database, o: PreviewStreamOptions): Promise<number> {
  return countRows(db, sql`preview_inputs`, { ...o, order: "newest" });
}

export function streamPreviewRows(db: Database, o: PreviewStreamOptions): AsyncGenerator<PreviewRow[]> {
  const f = { ...o, order: "newest" as const };
  return keysetBatches(async (after, size) => {
    const res = await db.execute(sql`
      select v.seq, v.verdict_id as "verdictId", v.verdict, v.headroom_db as "headroomDb", v.profile_slug as "profileSlug",
             v.profile_version as "profileVersion", v.packed
      from preview_inputs v
      where ${rangeFilter(f)} and ${after === null ? sql`true` : sql`v.seq < ${after}`}
      order by v.seq desc
      limit ${size}`);
    const rows = res.rows as unknown as PreviewRow[];
    for (const r of rows) r.seq = Number(r.seq);
    return rows;
  }, o);
}

/**
 * Splits the newest `total` stored tests that match `o` into `parts` contiguous ranges of nearly equal
 * size, newest range first, each as stream options (start after a seq, take so many), so that separate
 * threads can each stream one range.
 */
export async function splitPreviewRange(db: Database, o: PreviewStreamOptions, total: number, parts: number): Promise<PreviewStreamOptions[]> {
  const f = { ...o, order: "newest" as const };
  const seqAt = async (offset: number) => {
    const res = await db.execute<{ seq: string }>(sql`
      select v.seq from preview_inputs v where ${rangeFilter(f)} order by v.seq desc offset ${offset} limit 1`);
    return res.rows[0] ? Number(res.rows[0].seq) : null;
  };
  const top = await seqAt(0);
  if (top === null || total === 0) return [];
  const n = Math.max(1, Math.min(parts, total));
  const starts = Array.from({ length: n + 1 }, (_, i) => Math.floor((total * i) / n));
  const ranges: PreviewStreamOptions[] = [];
  for (let i = 0; i < n; i++) {
    // Pinning the first range below the current top keeps tests stored during the preview out of it.
    const after = i === 0 ? top + 1 : await seqAt(starts[i] - 1);
    if (after === null) break;
    ranges.push({ ...o, afterSeq: after, limit: starts[i + 1] - starts[i] });
  }
  return ranges;
}
