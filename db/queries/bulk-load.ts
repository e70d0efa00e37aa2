// Loads many already-graded tests into an organisation's chain with one statement per table and batch
// (each batch travels as a single JSON parameter). For benchmarks and large fixtures, where the ORM's
// per-value parameter building would dominate; the API stores through lib/verdicts/store.ts.
import { randomUUID } from "node:crypto";
import { sql } from "drizzle-orm";
import type { Database } from "../index";

export interface BulkGraded {
  linkRef: string;
  input: unknown;
  result: { verdict: string; headroomDb: number | null; engineVersion: string; profile: { slug: string; version: number }; reasons: { code: string }[] };
  digest: string;
  createdAt: Date;
}

export async function bulkAppendGraded(db: Database, organisationId: string, items: BulkGraded[]): Promise<void> {
  await db.transaction(async (tx) => {
    await tx.execute(sql`select pg_advisory_xact_lock(hashtextextended(${"verdict-chain:" + organisationId}, 0))`);
    const head = await tx.execute<{ seq: string; digest: string }>(sql`select seq, digest from verdicts where organisation_id = ${organisationId} order by seq desc limit 1`);
    let seq = Number(head.rows[0]?.seq ?? 0);
    let prev: string | null = head.rows[0]?.digest ?? null;
    const testRows = [];
    const verdictRows = [];
    for (const it of items) {
      const testId = randomUUID();
      seq += 1;
      testRows.push({ id: testId, link_ref: it.linkRef, input: it.input, created_at: it.createdAt.toISOString() });
      verdictRows.push({
        id: randomUUID(), seq, test_id: testId, link_ref: it.linkRef, verdict: it.result.verdict, headroom_db: it.result.headroomDb,
        profile_slug: it.result.profile.slug, profile_version: it.result.profile.version, engine_version: it.result.engineVersion,
        reason_codes: [...new Set(it.result.reasons.map((r) => r.code))], result: it.result, digest: it.digest, prev_digest: prev,
        created_at: it.createdAt.toISOString(),
      });
      prev = it.digest;
    }
    await tx.execute(sql`
      insert into tests (id, organisation_id, link_ref, input, created_at)
      select r.id, ${organisationId}, r.link_ref, r.input, r.created_at
      from jsonb_to_recordset(${JSON.stringify(testRows)}::jsonb) as r(id uuid, link_ref text, input jsonb, created_at timestamptz)`);
    await tx.execute(sql`
      insert into verdicts (id, organisation_id, seq, test_id, link_ref, verdict, headroom_db, profile_slug, profile_version, engine_version, reason_codes, result, digest, prev_digest, created_at)
      select r.id, ${organisationId}, r.seq, r.test_id, r.link_ref, r.verdict::verdict_value, r.headroom_db, r.profile_slug, r.profile_version, r.engine_version,
             array(select jsonb_array_elements_text(r.reason_codes)), r.result, r.digest, r.prev_digest, r.created_at
      from jsonb_to_recordset(${JSON.stringify(verdictRows)}::jsonb) as r(id uuid, seq bigint, test_id uuid, link_ref text, verdict text, headroom_db real,
           profile_slug text, profile_version int, engine_version text, reason_codes jsonb, result jsonb, digest text, prev_digest text, created_at timestamptz)`);
  });
}
