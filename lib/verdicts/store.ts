// Appends graded tests to the organisation's tamper-evident chain. Grading and digests happen before, in
// memory; storing is one statement (db/queries/verdicts.ts appendToChain) that advances the chain head
// and writes every test and verdict, each verdict carrying the next seq and the digest before it.
import { randomUUID } from "node:crypto";
import { getPool, type Database } from "@/db";
import type { StoredVerdict } from "@/db/schema";
import { appendToChain, type ChainItem } from "@/db/queries/verdicts";
import { verdictDigest } from "./digest";
import type { GradingResult, LinkTest } from "@/lib/grading/schema";

export interface GradedItem {
  test: LinkTest;
  result: GradingResult;
  /** Defaults to the call's time; the demo seed back-dates its history. */
  createdAt?: Date;
}

export interface StoreContext {
  /** Kept for callers' symmetry; the append runs on the process pool as one autocommitted statement. */
  db?: Database;
  organisationId: string;
  apiKeyId?: string | null;
  userId?: string | null;
  now?: Date;
}

export async function storeGradings(ctx: StoreContext, items: GradedItem[]): Promise<StoredVerdict[]> {
  if (items.length === 0) return [];
  const now = ctx.now ?? new Date();
  const chainItems: ChainItem[] = items.map((it) => ({
    verdictId: randomUUID(),
    testId: randomUUID(),
    linkRef: it.test.link.ref,
    input: it.test,
    verdict: it.result.verdict,
    headroomDb: it.result.headroomDb,
    profileSlug: it.result.profile.slug,
    profileVersion: it.result.profile.version,
    engineVersion: it.result.engineVersion,
    reasonCodes: [...new Set(it.result.reasons.map((r) => r.code))],
    result: it.result,
    digest: verdictDigest(it.result),
    createdAt: it.createdAt ?? now,
  }));
  const by = { apiKeyId: ctx.apiKeyId ?? null, userId: ctx.userId ?? null };
  const placed = await appendToChain(getPool(), ctx.organisationId, chainItems, by);
  return chainItems.map((c) => {
    const p = placed.get(c.verdictId);
    if (!p) throw new Error("chain append did not return every verdict");
    return {
      id: c.verdictId,
      organisationId: ctx.organisationId,
      seq: p.seq,
      testId: c.testId,
      linkRef: c.linkRef,
      verdict: c.verdict,
      headroomDb: c.headroomDb,
      profileSlug: c.profileSlug,
      profileVersion: c.profileVersion,
      engineVersion: c.engineVersion,
      reasonCodes: c.reasonCodes,
      result: c.result,
      digest: c.digest,
      prevDigest: p.prevDigest,
      apiKeyId: by.apiKeyId,
      userId: by.userId,
      createdAt: c.createdAt,
    };
  });
}
