// Verdict chain storage and reads. Every query is scoped by organisation.
import { and, desc, eq, gte, lt, type SQL } from "drizzle-orm";
import type { Database } from "@/db";
import type { Pool } from "pg";
import { tests, verdicts, type StoredVerdict } from "@/db/schema";

export interface ChainItem {
  verdictId: string;
  testId: string;
  linkRef: string;
  input: unknown;
  verdict: "pass" | "marginal" | "fail";
  headroomDb: number | null;
  profileSlug: string;
  profileVersion: number;
  engineVersion: string;
  reasonCodes: string[];
  result: unknown;
  digest: string;
  createdAt: Date;
}

// One statement appends the items to the organisation's chain: the upsert on verdict_chain_heads takes
// the organisation's row lock (concurrent appends queue there and then see the committed head), and
// the tests and verdicts are inserted from one JSON parameter, so 1 or 1,000 items cost one round trip.
// One JSON document is the cheapest way to ship a large batch: pg's array parameters cost several times
// more to encode and to parse. The first append of an organisation starts the head from any verdicts
// already stored.
export const APPEND_SQL = `
WITH head AS (
  INSERT INTO verdict_chain_heads AS h (organisation_id, seq, digest, prev_digest)
  VALUES (
    $1::uuid,
    (SELECT coalesce(max(seq), 0) FROM verdicts WHERE organisation_id = $1::uuid) + $2::int,
    $3::text,
    (SELECT digest FROM verdicts WHERE organisation_id = $1::uuid ORDER BY seq DESC LIMIT 1)
  )
  ON CONFLICT (organisation_id) DO UPDATE
    SET seq = h.seq + $2::int, prev_digest = h.digest, digest = EXCLUDED.digest
  RETURNING h.seq - $2::int AS base, h.prev_digest AS prev
),
items AS MATERIALIZED (
  SELECT * FROM jsonb_to_recordset($4::jsonb) AS x(
    ord int, verdict_id uuid, test_id uuid, link_ref text, input jsonb, verdict text, headroom_db real,
    profile_slug text, profile_version int, engine_version text, reason_codes jsonb, result jsonb, digest text,
    prev text, created_at timestamptz)
),
new_tests AS (
  INSERT INTO tests (id, organisation_id, link_ref, input, created_at)
  SELECT i.test_id, $1::uuid, i.link_ref, i.input, i.created_at FROM items i
  RETURNING id
)
INSERT INTO verdicts (id, organisation_id, seq, test_id, link_ref, verdict, headroom_db, profile_slug, profile_version,
                      engine_version, reason_codes, result, digest, prev_digest, api_key_id, user_id, created_at)
SELECT i.verdict_id, $1::uuid, head.base + i.ord, i.test_id, i.link_ref, i.verdict::verdict_value, i.headroom_db,
       i.profile_slug, i.profile_version, i.engine_version, ARRAY(SELECT jsonb_array_elements_text(i.reason_codes)),
       i.result, i.digest, CASE WHEN i.ord = 1 THEN head.prev ELSE i.prev END, $5::uuid, $6::uuid, i.created_at
FROM head, items i
RETURNING id, seq, prev_digest`;

export async function appendToChain(
  pool: Pool,
  organisationId: string,
  items: ChainItem[],
  by: { apiKeyId: string | null; userId: string | null },
): Promise<Map<string, { seq: number; prevDigest: string | null }>> {
  const payload = JSON.stringify(
    items.map((i, k) => ({
      ord: k + 1,
      verdict_id: i.verdictId,
      test_id: i.testId,
      link_ref: i.linkRef,
      input: i.input,
      verdict: i.verdict,
      headroom_db: i.headroomDb,
      profile_slug: i.profileSlug,
      profile_version: i.profileVersion,
      engine_version: i.engineVersion,
      reason_codes: i.reasonCodes,
      result: i.result,
      digest: i.digest,
      // Within one append, each item's predecessor is the item before it.
      prev: k === 0 ? null : items[k - 1].digest,
      created_at: i.createdAt.toISOString(),
    })),
  );
  // Named, so each connection parses and plans this statement once.
  const res = await pool.query<{ id: string; seq: string; prev_digest: string | null }>({ name: "gg_append_chain", text: APPEND_SQL, values: [
    organisationId,
    items.length,
    items[items.length - 1].digest,
    payload,
    by.apiKeyId,
    by.userId,
  ] });
  return new Map(res.rows.map((r) => [r.id, { seq: Number(r.seq), prevDigest: r.prev_digest }]));
}

export async function findVerdict(db: Database, organisationId: string, id: string): Promise<StoredVerdict | null> {
  const [row] = await db
    .select()
    .from(verdicts)
    .where(and(eq(verdicts.organisationId, organisationId), eq(verdicts.id, id)))
    .limit(1);
  return row ?? null;
}

export async function findVerdictWithInput(
  db: Database,
  organisationId: string,
  id: string,
): Promise<{ verdict: StoredVerdict; input: unknown } | null> {
  const [row] = await db
    .select({ verdict: verdicts, input: tests.input })
    .from(verdicts)
    .innerJoin(tests, eq(tests.id, verdicts.testId))
    .where(and(eq(verdicts.organisationId, organisationId), eq(verdicts.id, id)))
    .limit(1);
  return row ?? null;
}

export interface VerdictFilter {
  verdict?: "pass" | "marginal" | "fail";
  profileSlug?: string;
  profileVersion?: number;
  linkRef?: string;
  from?: Date;
  to?: Date;
  /** Only rows strictly older in the chain than this seq (the cursor). */
  beforeSeq?: number;
}

/** Newest first by chain position: new verdicts get higher seq, so pages already read never shift. */
export async function listVerdicts(db: Database, organisationId: string, f: VerdictFilter, limit: number): Promise<StoredVerdict[]> {
  const cond: SQL[] = [eq(verdicts.organisationId, organisationId)];
  if (f.verdict) cond.push(eq(verdicts.verdict, f.verdict));
  if (f.profileSlug) cond.push(eq(verdicts.profileSlug, f.profileSlug));
  if (f.profileVersion !== undefined) cond.push(eq(verdicts.profileVersion, f.profileVersion));
  if (f.linkRef) cond.push(eq(verdicts.linkRef, f.linkRef));
  if (f.from) cond.push(gte(verdicts.createdAt, f.from));
  if (f.to) cond.push(lt(verdicts.createdAt, f.to));
  if (f.beforeSeq !== undefined) cond.push(lt(verdicts.seq, f.beforeSeq));
  return db
    .select()
    .from(verdicts)
    .where(and(...cond))
    .orderBy(desc(verdicts.seq))
    .limit(limit);
}
