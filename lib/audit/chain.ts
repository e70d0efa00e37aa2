// Verifies an organisation's audit chain: walking verdicts in seq order, each stored result must hash to
// its stored digest, each row must point at the previous row's digest, the seq must have no gaps, and the
// columns the console filters on must agree with the result they were copied from. The first row that
// fails any of these is named.
import { streamVerdicts, type StreamedVerdict } from "@/db/queries/verdict-stream";
import { verdictDigest } from "@/lib/verdicts/digest";
import { authorise } from "@/lib/profiles/access";
import type { ProfileContext } from "@/lib/profiles/context";

export interface BrokenLink {
  seq: number;
  verdictId: string;
  linkRef: string;
  problem: "digest_mismatch" | "prev_digest_mismatch" | "seq_gap" | "column_mismatch";
  detail: string;
}

export interface ChainReport {
  checked: number;
  intact: boolean;
  firstBroken?: BrokenLink;
  headSeq?: number;
  headDigest?: string;
}

export type ChainEvent = { type: "progress"; done: number } | { type: "result"; report: ChainReport };

interface StoredResult {
  verdict?: string;
  headroomDb?: number;
  engineVersion?: string;
  profile?: { slug?: string; version?: number };
}

function columnMismatch(row: StreamedVerdict): string | undefined {
  const r = (row.result ?? {}) as StoredResult;
  if (r.verdict !== row.verdict) return `verdict column says ${row.verdict}, stored result says ${r.verdict}`;
  if (r.engineVersion !== undefined && r.engineVersion !== row.engineVersion) return `engine version column says ${row.engineVersion}, stored result says ${r.engineVersion}`;
  if (r.profile?.slug !== undefined && r.profile.slug !== row.profileSlug) return `profile column says ${row.profileSlug}, stored result says ${r.profile.slug}`;
  if (r.profile?.version !== undefined && r.profile.version !== row.profileVersion) return `profile version column says ${row.profileVersion}, stored result says ${r.profile.version}`;
  // headroom_db is a float4 copy of the result's float8; compare at float4 precision.
  if (typeof r.headroomDb === "number" && row.headroomDb !== null && Math.fround(r.headroomDb) !== Math.fround(row.headroomDb)) {
    return `headroom column says ${row.headroomDb}, stored result says ${r.headroomDb}`;
  }
  return undefined;
}

export function checkLink(row: StreamedVerdict, previous: { seq: number; digest: string } | null): BrokenLink | undefined {
  const at = { seq: row.seq, verdictId: row.id, linkRef: row.linkRef };
  // The chain starts at seq 1; a missing head means verdicts were deleted.
  if (!previous && row.seq !== 1) {
    return { ...at, problem: "seq_gap", detail: `the chain starts at seq ${row.seq}: seq 1${row.seq > 2 ? `–${row.seq - 1}` : ""} is missing` };
  }
  if (previous && row.seq !== previous.seq + 1) {
    return { ...at, problem: "seq_gap", detail: `seq ${previous.seq + 1}${row.seq - previous.seq > 2 ? `–${row.seq - 1}` : ""} is missing before this verdict` };
  }
  const expectedPrev = previous?.digest ?? null;
  if ((row.prevDigest ?? null) !== expectedPrev) {
    return { ...at, problem: "prev_digest_mismatch", detail: `points at ${row.prevDigest ?? "nothing"} but the previous verdict's digest is ${expectedPrev ?? "nothing"}` };
  }
  const recomputed = verdictDigest(row.result);
  if (recomputed !== row.digest) {
    return { ...at, problem: "digest_mismatch", detail: `the stored result hashes to ${recomputed}, not to the stored digest ${row.digest}` };
  }
  const mismatch = columnMismatch(row);
  if (mismatch) return { ...at, problem: "column_mismatch", detail: mismatch };
  return undefined;
}

export async function* verifyChain(ctx: ProfileContext, opts: { batchSize?: number } = {}): AsyncGenerator<ChainEvent> {
  authorise(ctx.actor, "verdicts:replay");
  let previous: { seq: number; digest: string } | null = null;
  let checked = 0;
  for await (const batch of streamVerdicts(ctx.db, { organisationId: ctx.actor.organisationId, order: "chain", withResult: true, batchSize: opts.batchSize ?? 2000 })) {
    for (const row of batch) {
      const broken = checkLink(row, previous);
      checked++;
      if (broken) {
        yield { type: "result", report: { checked, intact: false, firstBroken: broken } };
        return;
      }
      previous = { seq: row.seq, digest: row.digest };
    }
    yield { type: "progress", done: checked };
  }
  yield { type: "result", report: { checked, intact: true, headSeq: previous?.seq, headDigest: previous?.digest } };
}

/** Runs the whole check and returns only the report. */
export async function verifyChainReport(ctx: ProfileContext): Promise<ChainReport> {
  let report: ChainReport = { checked: 0, intact: true };
  for await (const ev of verifyChain(ctx)) if (ev.type === "result") report = ev.report;
  return report;
}
