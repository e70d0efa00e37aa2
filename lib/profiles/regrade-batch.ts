// Re-grades stored tests under a draft and condenses the outcome to what an impact preview keeps:
// transition counts and the first changed links. The same code runs on the request's thread for small
// previews and on grading threads (impact-worker.ts) for large ones, so both give the same answer.
import type { Database } from "@/db";
import { streamPreviewRows, type PreviewRow, type PreviewStreamOptions } from "@/db/queries/verdict-stream";
import { grade } from "@/lib/grading";
import type { Profile } from "@/lib/grading/schema";
import { unpackTestInput } from "@/lib/verdicts/packed-input";

export const VERDICTS = ["pass", "marginal", "fail"] as const;
export type VerdictValue = (typeof VERDICTS)[number];

export interface ChangedLink {
  verdictId: string;
  seq: number;
  linkRef: string;
  before: VerdictValue;
  after: VerdictValue;
  headroomBefore: number | null;
  headroomAfter: number | null;
  storedProfile: string;
  reasonCodes: string[];
}

export interface BatchOutcome {
  rows: number;
  graded: number;
  failedToGrade: number;
  /** Counts by before x after, row-major in VERDICTS order (pass->pass, pass->marginal, ...). */
  transitions: number[];
  changed: number;
  /** The first changed links, newest first, at most the `keepChanged` asked for. */
  changedLinks: ChangedLink[];
}

const VERDICT_INDEX: Record<VerdictValue, number> = { pass: 0, marginal: 1, fail: 2 };
/** Rows graded between chances for the event loop to read the socket. */
const SLICE = 100;

function emptyOutcome(): BatchOutcome {
  return { rows: 0, graded: 0, failedToGrade: 0, transitions: [0, 0, 0, 0, 0, 0, 0, 0, 0], changed: 0, changedLinks: [] };
}

/** Grades `rows` into `out`, adding changed links while fewer than `keepChanged` are held. */
function regradeRows(rows: PreviewRow[], profile: Profile, keepChanged: number, out: BatchOutcome = emptyOutcome()): BatchOutcome {
  for (const row of rows) {
    out.rows++;
    let result: ReturnType<typeof grade>;
    let linkRef: string;
    try {
      const test = unpackTestInput(row.packed);
      linkRef = test.link.ref;
      result = grade(test, profile);
    } catch {
      // A stored test the draft cannot grade (e.g. a wavelength it no longer lists) is counted, not fatal.
      out.failedToGrade++;
      continue;
    }
    out.graded++;
    const after = result.verdict as VerdictValue;
    out.transitions[VERDICT_INDEX[row.verdict] * 3 + VERDICT_INDEX[after]]++;
    if (row.verdict === after) continue;
    out.changed++;
    if (out.changedLinks.length < keepChanged) {
      out.changedLinks.push({
        verdictId: row.verdictId,
        seq: row.seq,
        linkRef,
        before: row.verdict,
        after,
        headroomBefore: row.headroomDb,
        headroomAfter: result.headroomDb,
        storedProfile: `${row.profileSlug}@${row.profileVersion}`,
        reasonCodes: [...new Set(result.reasons.filter((r) => r.severity !== "info").map((r) => r.code))],
      });
    }
  }
  return out;
}

/**
 * Streams one range of stored tests from PostgreSQL and yields one outcome per batch. Changed links are
 * kept up to `keepChanged` over the whole range.
 */
export async function* regradeRange(db: Database, opts: PreviewStreamOptions, profile: Profile, keepChanged: number): AsyncGenerator<BatchOutcome> {
  let kept = 0;
  for await (const batch of streamPreviewRows(db, opts)) {
    const out = emptyOutcome();
    for (let i = 0; i < batch.length; i += SLICE) {
      // The next batch is arriving on the socket meanwhile; a loop that never yields would stall
      // PostgreSQL once the socket buffer is full.
      if (i > 0) await new Promise<void>((r) => setImmediate(r));
      regradeRows(batch.slice(i, i + SLICE), profile, keepChanged - kept, out);
    }
    kept += out.changedLinks.length;
    yield out;
  }
}
