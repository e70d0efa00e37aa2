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
// the tests and verdicts are inserted from arrays, so 1 or 1,000 items cost one round trip. The first
// append of an organisation starts the head from any verdicts already stored.
const APPEND_SQL = `
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
new_tests AS (
  INSERT INTO tests (id, organisation_id, link_ref, input, created_at)
  SELECT u.id, $1::uuid, u.link_ref, u.input, u.created_at
  FROM unnest($4::uuid[], $5::text[], $6::jsonb[], $7::timestamptz[]) AS u(id, link_ref, input, created_at)
  RETURNING id
)
INSERT INTO verdicts (id, organisation_id, seq, test_id, link_ref, verdict, headroom_db, profile_slug, profile_version,
                      engine_version, reason_codes, result, digest, prev_digest, api_key_id, user_id, created_at)
SELECT v.id, $1::uuid, head.base + v.ord, v.test_id, v.link_ref, v.verdict::verdict_value, v.headroom::real, v.profile_slug,
       v.profile_version, v.engine_version, ARRAY(SELECT jsonb_array_elements_text(v.codes)), v.result, v.digest,
       CASE WHEN v.ord = 1 THEN head.prev ELSE v.prev END, $8::uuid, $9::uuid, v.created_at
FROM head,
     unnest($10::uuid[], $4::uuid[], $5::text[], $11::text[], $12::float8[], $13::text[], $14::int[], $15::text[],
            $16::jsonb[], $17::jsonb[], $18::text[], $19::text[], $7::timestamptz[])
       WITH ORDINALITY AS v(id, test_id, link_ref, verdict, headroom, profile_slug, profile_version, engine_version,
                            codes, result, digest, prev, created_at, ord)
RETURNING id, seq, prev_digest`;

export async function appendToChain(
  pool: Pool,
  organisationId: string,
  items: ChainItem[],
  by: { apiKeyId: string | null; userId: string | null },
): Promise<Map<string, { seq: number; prevDigest: string | null }>> {
  const res = await pool.query<{ id: string; seq: string; prev_digest: string | null }>(APPEND_SQL, [
    organisationId,
    items.length,
    items[items.length - 1].digest,
    items.map((i) => i.testId),
    items.map((i) => i.linkRef),
    items.map((i) => JSON.stringify(i.input)),
    items.map((i) => i.createdAt.toISOString()),
    by.apiKeyId,
    by.userId,
    items.map((i) => i.verdictId),
    items.map((i) => i.verdict),
    items.map((i) => i.headroomDb),
    items.map((i) => i.profileSlug),
    items.map((i) => i.profileVersion),
    items.map((i) => i.engineVersion),
    items.map((i) => JSON.stringify(i.reasonCodes)),
    items.map((i) => JSON.stringify(i.result)),
    items.map((i) => i.digest),
    // Within one append, each item's predecessor is the item before it.
    items.map((_, k) => (k === 0 ? null : items[k - 1].digest)),
  ]);
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
