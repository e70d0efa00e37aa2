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

export async function countVerdicts(db: Database, o: VerdictStreamOptions): Promise<number> {
  const res = await db.execute<{ n: string }>(sql`select count(*)::bigint as n from verdicts v where ${rangeFilter(o)}`);
  const n = Number(res.rows[0]?.n ?? 0);
  return o.limit === undefined ? n : Math.min(n, o.limit);
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
      with page as materialized (
        select v.seq, v.id, v.test_id, v.link_ref, v.verdict, v.headroom_db, v.profile_slug, v.profile_version
        from verdicts v
        where ${rangeFilter(f)} and ${after === null ? sql`true` : sql`v.seq < ${after}`}
        order by v.seq desc
        limit ${size})
      select p.seq, p.id, p.link_ref as "linkRef", p.verdict, p.headroom_db as "headroomDb",
             p.profile_slug as "profileSlug", p.profile_version as "profileVersion", t.input
      from page p join tests t on t.id = p.test_id
      order by p.seq desc`);
    const rows = res.rows as unknown as PreviewRow[];
    for (const r of rows) r.seq = Number(r.seq);
    return rows;
  }, o);
}
