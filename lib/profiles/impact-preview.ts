// Impact preview: re-grade stored tests under a draft and count how verdicts would move. Tests stream
// from the database in batches (db/queries/verdict-stream.ts); only counters and a capped list of changed
// links are kept, so memory stays flat from a thousand tests to every test the organisation has. Large
// previews split the range across grading threads (preview-threads.ts) with the same answer.
import { countPreviewRows, splitPreviewRange } from "@/db/queries/verdict-stream";
import { findProfile, latestVersion } from "@/db/queries/profiles";
import { authorise, ConflictError, InvalidInputError, NotFoundError } from "./access";
import type { ProfileContext } from "./context";
import { validateLimits, type EngineProfile } from "./limits";
import { gradeRangesOnThreads, defaultThreadCount } from "./preview-threads";
import { regradeRange, VERDICTS, type BatchOutcome, type ChangedLink, type VerdictValue } from "./regrade-batch";

export type { ChangedLink, VerdictValue };

export type TransitionMatrix = Record<VerdictValue, Record<VerdictValue, number>>;

export const DEFAULT_PREVIEW_LIMIT = 1000;
export const CHANGED_LINKS_CAP = 500;
/**
 * From this many tests on, grading moves to worker threads; below it their start-up costs more than it
 * saves. GLASSGRADE_PREVIEW_THREADS_FROM overrides it (the end-to-end tests set 1 so that the built app's
 * bundled grading thread is exercised).
 */
export function threadedFrom(): number {
  const fromEnv = Number(process.env.GLASSGRADE_PREVIEW_THREADS_FROM);
  return Number.isInteger(fromEnv) && fromEnv > 0 ? fromEnv : 20_000;
}

export interface PreviewRequest {
  /** How many of the newest tests to re-grade: DEFAULT_PREVIEW_LIMIT when absent, or "all". */
  limit?: number | "all";
  /**
   * Which stored tests to compare: only those graded under these profile slugs (the profile and the
   * template it came from, so like is compared with like), or every stored test when absent.
   */
  profileSlugs?: string[];
  from?: Date;
  to?: Date;
  batchSize?: number;
  /**
   * Grading threads: 0 grades on the request's thread; absent picks one per core for previews of
   * threadedFrom() tests or more and none below.
   */
  threads?: number;
}

export interface PreviewSummary {
  total: number;
  graded: number;
  unchanged: number;
  changed: number;
  /** Stored tests the engine refused under the draft (e.g. a wavelength the draft no longer lists). */
  failedToGrade: number;
  matrix: TransitionMatrix;
  changedLinks: ChangedLink[];
  changedLinksTruncated: boolean;
  profile: { slug: string; version: number };
}

export type PreviewEvent = { type: "progress"; done: number; total: number } | { type: "result"; summary: PreviewSummary };

function emptyMatrix(): TransitionMatrix {
  return { pass: { pass: 0, marginal: 0, fail: 0 }, marginal: { pass: 0, marginal: 0, fail: 0 }, fail: { pass: 0, marginal: 0, fail: 0 } };
}

/** The slugs whose stored verdicts a preview of `slug` compares with by default: its own and its template's. */
export async function relatedProfileSlugs(ctx: ProfileContext, slug: string): Promise<string[]> {
  const profile = await findProfile(ctx.db, ctx.actor.organisationId, slug);
  if (!profile) throw new NotFoundError(`Profile ${slug}`);
  const base = profile.basedOn ? profile.basedOn.split("@")[0] : undefined;
  return base && base !== slug ? [slug, base] : [slug];
}

/** Resolves what the preview grades under: the open draft, or given limits not yet saved. */
export async function draftProfileFor(ctx: ProfileContext, slug: string, limits?: unknown): Promise<EngineProfile> {
  const profile = await findProfile(ctx.db, ctx.actor.organisationId, slug);
  if (!profile) throw new NotFoundError(`Profile ${slug}`);
  const candidate = limits ?? profile.draft;
  if (candidate === null || candidate === undefined) throw new ConflictError("Open a draft before previewing its impact");
  const latest = await latestVersion(ctx.db, profile.id);
  return validateLimits({ slug, version: (latest?.version ?? 0) + 1, name: profile.name, limits: candidate });
}

export function checkPreviewRequest(req: PreviewRequest): void {
  if (req.limit !== undefined && req.limit !== "all" && (!Number.isInteger(req.limit) || req.limit < 1)) {
    throw new InvalidInputError([{ path: "limit", message: "Give a whole number of tests, 1 or more, or choose all" }]);
  }
  if (req.from && req.to && req.from >= req.to) throw new InvalidInputError([{ path: "to", message: "The end must come after the start" }]);
}

export async function* previewImpact(
  ctx: ProfileContext,
  profile: EngineProfile,
  req: PreviewRequest = {},
  signal?: AbortSignal,
): AsyncGenerator<PreviewEvent> {
  authorise(ctx.actor, "profiles:edit");
  checkPreviewRequest(req);
  const opts = { organisationId: ctx.actor.organisationId, from: req.from, to: req.to, profileSlugs: req.profileSlugs, limit: req.limit === "all" ? undefined : (req.limit ?? DEFAULT_PREVIEW_LIMIT), order: "newest" as const, batchSize: req.batchSize ?? 2000 };
  const total = await countPreviewRows(ctx.db, opts);
  const matrix = emptyMatrix();
  let graded = 0;
  let failedToGrade = 0;
  let changed = 0;
  let done = 0;
  yield { type: "progress", done, total };

  const threads = req.threads ?? (total >= threadedFrom() ? defaultThreadCount() : 0);
  const ranges = threads > 0 ? await splitPreviewRange(ctx.db, opts, total, threads) : [opts];
  // Changed links per range, newest range first; joined in that order at the end, so the list is the
  // same whether one thread walked every range or several walked them side by side.
  const changedByRange: ChangedLink[][] = ranges.map(() => []);
  const fold = (range: number, o: BatchOutcome) => {
    graded += o.graded;
    failedToGrade += o.failedToGrade;
    changed += o.changed;
    done += o.rows;
    o.transitions.forEach((n, k) => (matrix[VERDICTS[Math.floor(k / 3)]][VERDICTS[k % 3]] += n));
    changedByRange[range].push(...o.changedLinks);
  };
  const outcomes =
    threads > 0
      ? gradeRangesOnThreads(profile, ranges, CHANGED_LINKS_CAP)
      : (async function* () {
          for await (const outcome of regradeRange(ctx.db, opts, profile, CHANGED_LINKS_CAP)) yield { range: 0, outcome };
        })();
  try {
    for await (const { range, outcome } of outcomes) {
      if (signal?.aborted) return;
      fold(range, outcome);
      yield { type: "progress", done, total };
    }
  } finally {
    await outcomes.return(undefined);
  }
  const changedLinks = changedByRange.flat().slice(0, CHANGED_LINKS_CAP);
  yield {
    type: "result",
    summary: {
      total: done,
      graded,
      unchanged: graded - changed,
      changed,
      failedToGrade,
      matrix,
      changedLinks,
      changedLinksTruncated: changed > changedLinks.length,
      profile: { slug: profile.slug, version: profile.version },
    },
  };
}
