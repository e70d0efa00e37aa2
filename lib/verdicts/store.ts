// Appends graded tests to the organisation's tamper-evident chain. Grading happens before, in memory;
// here one transaction takes the organisation's chain lock, reads the head, and writes every test and
// verdict with multi-row inserts, each verdict carrying seq + 1 and the digest of the one before it.
import { randomUUID } from "node:crypto";
import type { Database } from "@/db";
import type { StoredVerdict } from "@/db/schema";
import { chainHead, insertTestsAndVerdicts, lockChain } from "@/db/queries/verdicts";
import { resultDigest } from "@/lib/grading";
import type { GradingResult, LinkTest } from "@/lib/grading/schema";

export interface GradedItem {
  test: LinkTest;
  result: GradingResult;
  /** Defaults to the transaction's time; the demo seed back-dates its history. */
  createdAt?: Date;
}

export interface StoreContext {
  db: Database;
  organisationId: string;
  apiKeyId?: string | null;
  userId?: string | null;
  now?: Date;
}

export async function storeGradings(ctx: StoreContext, items: GradedItem[]): Promise<StoredVerdict[]> {
  if (items.length === 0) return [];
  const now = ctx.now ?? new Date();
  // Digests are computed outside the lock: the lock should cover only what must be serial.
  const prepared = items.map((it) => ({
    ...it,
    testId: randomUUID(),
    verdictId: randomUUID(),
    digest: resultDigest(it.result),
    createdAt: it.createdAt ?? now,
  }));
  return ctx.db.transaction(async (tx) => {
    await lockChain(tx, ctx.organisationId);
    const head = await chainHead(tx, ctx.organisationId);
    let seq = head?.seq ?? 0;
    let prev: string | null = head?.digest ?? null;
    const verdictRows: StoredVerdict[] = prepared.map((p) => {
      seq += 1;
      const row: StoredVerdict = {
        id: p.verdictId,
        organisationId: ctx.organisationId,
        seq,
        testId: p.testId,
        linkRef: p.test.link.ref,
        verdict: p.result.verdict,
        headroomDb: p.result.headroomDb,
        profileSlug: p.result.profile.slug,
        profileVersion: p.result.profile.version,
        engineVersion: p.result.engineVersion,
        reasonCodes: [...new Set(p.result.reasons.map((r) => r.code))],
        result: p.result,
        digest: p.digest,
        prevDigest: prev,
        apiKeyId: ctx.apiKeyId ?? null,
        userId: ctx.userId ?? null,
        createdAt: p.createdAt,
      };
      prev = p.digest;
      return row;
    });
    await insertTestsAndVerdicts(
      tx,
      prepared.map((p) => ({ id: p.testId, organisationId: ctx.organisationId, linkRef: p.test.link.ref, input: p.test, createdAt: p.createdAt })),
      verdictRows,
    );
    return verdictRows;
  });
}
