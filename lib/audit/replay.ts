// Replay: re-grade a stored test with the exact stored profile version and compare digests. A match means
// the verdict is reproduced byte for byte; otherwise the stored and replayed results are compared field by field.
import { sql } from "drizzle-orm";
import { countVerdicts, streamVerdicts, type StreamedVerdict } from "@/db/queries/verdict-stream";
import { ENGINE_VERSION, grade } from "@/lib/grading";
import { verdictDigest } from "@/lib/verdicts/digest";
import { authorise, InvalidInputError, NotFoundError } from "@/lib/profiles/access";
import type { ProfileContext } from "@/lib/profiles/context";
import { diffJson, type LimitChange } from "@/lib/profiles/diff";
import { StoredProfileCache } from "./stored-profiles";

export interface ReplayOutcome {
  verdictId: string;
  seq: number;
  linkRef: string;
  status: "reproduced" | "changed" | "unavailable";
  storedDigest: string;
  replayedDigest?: string;
  storedEngineVersion: string;
  engineVersion: string;
  profile: string;
  /** Field-by-field differences between the stored and the replayed result, when they differ. */
  differences: LimitChange[];
  /** Why a replay could not run (e.g. the profile version is gone). */
  problem?: string;
}

async function replayRow(row: StreamedVerdict, profiles: StoredProfileCache): Promise<ReplayOutcome> {
  const base = {
    verdictId: row.id,
    seq: row.seq,
    linkRef: row.linkRef,
    storedDigest: row.digest,
    storedEngineVersion: row.engineVersion,
    engineVersion: ENGINE_VERSION,
    profile: `${row.profileSlug}@${row.profileVersion}`,
  };
  const profile = await profiles.get(row.profileSlug, row.profileVersion);
  if (!profile) return { ...base, status: "unavailable", differences: [], problem: `Profile ${base.profile} is no longer available` };
  let replayed: ReturnType<typeof grade>;
  try {
    replayed = grade(row.input as Parameters<typeof grade>[0], profile);
  } catch (err) {
    return { ...base, status: "unavailable", differences: [], problem: `The engine refused the stored test: ${(err as Error).message}` };
  }
  const replayedDigest = verdictDigest(replayed);
  // Reproduced means the replay matches the stored digest and the stored result still hashes to it; a
  // result rewritten behind the digest's back is reported with its differences, not waved through.
  const storedIntact = verdictDigest(row.result) === row.digest;
  if (replayedDigest === row.digest && storedIntact) return { ...base, status: "reproduced", replayedDigest, differences: [] };
  return {
    ...base,
    status: "changed",
    replayedDigest,
    differences: diffJson(row.result, replayed),
    ...(storedIntact ? {} : { problem: "The stored result no longer hashes to its stored digest" }),
  };
}

export async function replayOne(ctx: ProfileContext, verdictId: string): Promise<ReplayOutcome> {
  authorise(ctx.actor, "verdicts:replay");
  if (!/^[0-9a-f-]{36}$/i.test(verdictId)) throw new NotFoundError("Verdict");
  const res = await ctx.db.execute<{ seq: string }>(
    sql`select seq from verdicts where id = ${verdictId} and organisation_id = ${ctx.actor.organisationId}`,
  );
  if (res.rows.length === 0) throw new NotFoundError("Verdict");
  const seq = Number(res.rows[0].seq);
  // Reuse the streaming query so one replay and a bulk replay read rows the same way.
  const stream = streamVerdicts(ctx.db, { organisationId: ctx.actor.organisationId, order: "chain", withTest: true, withResult: true, limit: 1, batchSize: 1, afterSeq: seq - 1 });
  for await (const [row] of stream) return replayRow(row, new StoredProfileCache(ctx.db, ctx.actor.organisationId));
  throw new NotFoundError("Verdict");
}

export const CHANGED_REPLAYS_CAP = 200;

export interface BulkReplaySummary {
  total: number;
  reproduced: number;
  changed: number;
  unavailable: number;
  /** The first few outcomes that did not reproduce, with their differences. */
  notReproduced: ReplayOutcome[];
  notReproducedTruncated: boolean;
}

export type BulkReplayEvent = { type: "progress"; done: number; total: number } | { type: "result"; summary: BulkReplaySummary };

export async function* replayRange(
  ctx: ProfileContext,
  range: { from?: Date; to?: Date; batchSize?: number },
  signal?: AbortSignal,
): AsyncGenerator<BulkReplayEvent> {
  authorise(ctx.actor, "verdicts:replay");
  if (range.from && range.to && range.from >= range.to) throw new InvalidInputError([{ path: "to", message: "The end must come after the start" }]);
  const opts = { organisationId: ctx.actor.organisationId, from: range.from, to: range.to, order: "chain" as const, withTest: true, withResult: true, batchSize: range.batchSize ?? 1000 };
  const total = await countVerdicts(ctx.db, opts);
  const profiles = new StoredProfileCache(ctx.db, ctx.actor.organisationId);
  const summary: BulkReplaySummary = { total, reproduced: 0, changed: 0, unavailable: 0, notReproduced: [], notReproducedTruncated: false };
  let done = 0;
  yield { type: "progress", done, total };
  for await (const batch of streamVerdicts(ctx.db, opts)) {
    if (signal?.aborted) return;
    for (const row of batch) {
      const outcome = await replayRow(row, profiles);
      summary[outcome.status]++;
      if (outcome.status !== "reproduced") {
        if (summary.notReproduced.length < CHANGED_REPLAYS_CAP) summary.notReproduced.push(outcome);
        else summary.notReproducedTruncated = true;
      }
    }
    done += batch.length;
    yield { type: "progress", done, total };
  }
  summary.total = done;
  yield { type: "result", summary };
}
