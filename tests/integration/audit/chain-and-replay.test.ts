import { createHash } from "node:crypto";
import canonicalize from "canonicalize";
import { sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, getDb } from "@/db";
import { ForbiddenError } from "@/lib/auth/errors";
import { verifyChainReport } from "@/lib/audit/chain";
import { replayOne, replayRange, type BulkReplaySummary } from "@/lib/audit/replay";
import { orgWithRoles, storeHistory, type OrgWithRoles } from "../../helpers/profile-fixtures";

// Changes a stored verdict the way an attacker with database access would: past the immutability trigger.
async function tamper(statement: ReturnType<typeof sql>) {
  const db = getDb();
  await db.transaction(async (tx) => {
    await tx.execute(sql`alter table verdicts disable trigger verdicts_immutable`);
    await tx.execute(statement);
    await tx.execute(sql`alter table verdicts enable trigger verdicts_immutable`);
  });
}

async function verdictAt(orgId: string, seq: number) {
  const res = await getDb().execute<{ id: string; digest: string; result: unknown }>(sql`select id, digest, result from verdicts where organisation_id = ${orgId} and seq = ${seq}`);
  return res.rows[0];
}

async function bulk(o: OrgWithRoles, range: { from?: Date; to?: Date; batchSize?: number } = {}): Promise<BulkReplaySummary> {
  let summary: BulkReplaySummary | undefined;
  for await (const ev of replayRange(o.ctx("auditor"), range)) if (ev.type === "result") summary = ev.summary;
  return summary!;
}

describe("audit chain and replay", () => {
  const fresh = async (n = 60) => {
    const o = await orgWithRoles();
    await storeHistory(o.org.id, n, { seed: 21 });
    return o;
  };
  let o: OrgWithRoles;
  beforeAll(async () => {
    o = await fresh(250);
  });
  afterAll(async () => {
    await closeDb();
  });

  it("stores digests that an independent RFC 8785 implementation reproduces (canonicalize, the RFC's reference code)", async () => {
    const row = await verdictAt(o.org.id, 5);
    const independent = createHash("sha256").update(canonicalize(row.result)!).digest("hex");
    expect(row.digest).toBe(independent);
  });

  it("reproduces every stored verdict, one at a time and in bulk with progress", async () => {
    const one = await replayOne(o.ctx("auditor"), (await verdictAt(o.org.id, 17)).id);
    expect(one.status).toBe("reproduced");
    expect(one.differences).toEqual([]);
    const progress: number[] = [];
    let summary: BulkReplaySummary | undefined;
    for await (const ev of replayRange(o.ctx("engineer"), { batchSize: 40 })) {
      if (ev.type === "progress") progress.push(ev.done);
      else summary = ev.summary;
    }
    expect(summary).toMatchObject({ total: 250, reproduced: 250, changed: 0, unavailable: 0, notReproduced: [] });
    expect(progress[0]).toBe(0);
    expect(progress.at(-1)).toBe(250);
  });

  it("reports an intact chain with its head", async () => {
    const report = await verifyChainReport(o.ctx("auditor"));
    expect(report).toMatchObject({ checked: 250, intact: true, headSeq: 250 });
    expect(report.headDigest).toBe((await verdictAt(o.org.id, 250)).digest);
  });

  it("lets admins, engineers and auditors replay, but not developers", async () => {
    await expect(replayRange(o.ctx("developer"), {}).next()).rejects.toBeInstanceOf(ForbiddenError);
    await expect(replayOne(o.ctx("developer"), (await verdictAt(o.org.id, 1)).id)).rejects.toBeInstanceOf(ForbiddenError);
    await expect(verifyChainReport(o.ctx("developer"))).rejects.toBeInstanceOf(ForbiddenError);
    const other = await orgWithRoles();
    await expect(replayOne(other.ctx("auditor"), (await verdictAt(o.org.id, 1)).id)).rejects.toThrow(/not found/);
  });

  it("names the verdict whose verdict column was changed from fail to pass", async () => {
    const t = await fresh();
    const res = await getDb().execute<{ seq: string; id: string }>(sql`select seq, id from verdicts where organisation_id = ${t.org.id} and verdict = 'fail' order by seq limit 1`);
    const { seq, id } = res.rows[0];
    await tamper(sql`update verdicts set verdict = 'pass' where id = ${id}`);
    const report = await verifyChainReport(t.ctx("auditor"));
    expect(report.intact).toBe(false);
    expect(report.firstBroken).toMatchObject({ seq: Number(seq), verdictId: id, problem: "column_mismatch" });
    expect(report.firstBroken!.detail).toMatch(/verdict column says pass, stored result says fail/);
  });

  it("names the verdict whose stored result was rewritten, and replay shows the difference field by field", async () => {
    const t = await fresh();
    const target = await verdictAt(t.org.id, 23);
    await tamper(sql`update verdicts set result = jsonb_set(result, '{wavelengths,0,measuredDb}', '0.01'::jsonb) where id = ${target.id}`);
    const report = await verifyChainReport(t.ctx("auditor"));
    expect(report.firstBroken).toMatchObject({ seq: 23, verdictId: target.id, problem: "digest_mismatch" });

    const one = await replayOne(t.ctx("auditor"), target.id);
    expect(one.status).toBe("changed");
    expect(one.differences).toEqual([expect.objectContaining({ path: "wavelengths[1310 nm].measuredDb", kind: "changed", before: 0.01 })]);
    const summary = await bulk(t);
    expect(summary).toMatchObject({ total: 60, reproduced: 59, changed: 1 });
    expect(summary.notReproduced.map((n) => n.seq)).toEqual([23]);
  });

  it("names a verdict whose link to its predecessor was rewritten, and a deleted verdict", async () => {
    const t = await fresh();
    const target = await verdictAt(t.org.id, 31);
    await tamper(sql`update verdicts set prev_digest = ${"0".repeat(64)} where id = ${target.id}`);
    expect((await verifyChainReport(t.ctx("auditor"))).firstBroken).toMatchObject({ seq: 31, problem: "prev_digest_mismatch" });

    const u = await fresh();
    await getDb().execute(sql`delete from verdicts where organisation_id = ${u.org.id} and seq = 40`);
    const report = await verifyChainReport(u.ctx("auditor"));
    expect(report.firstBroken).toMatchObject({ seq: 41, problem: "seq_gap" });
    expect(report.firstBroken!.detail).toMatch(/seq 40 is missing/);
  });
});
