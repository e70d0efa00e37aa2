// Impact preview: re-grade stored tests under a draft and count how verdicts would move. Tests stream
// from the database in batches (db/queries/verdict-stream.ts); only counters and a capped list of changed
// links are kept, so memory stays flat from a thousand tests to every test the organisation has.
import { countVerdicts, streamPreviewRows } from "@/db/queries/verdict-stream";
import { findProfile, latestVersion } from "@/db/queries/profiles";
import { grade } from "@/lib/grading";
import { authorise, ConflictError, InvalidInputError, NotFoundError } from "./access";
import type { ProfileContext } from "./context";
import { validateLimits, type EngineProfile } from "./limits";

export const VERDICTS = ["pass", "marginal", "fail"] as const;
export type VerdictValue = (typeof VERDICTS)[number];
export type TransitionMatrix = Record<VerdictValue, Record<VerdictValue, number>>;

export const DEFAULT_PREVIEW_LIMIT = 1000;
export const CHANGED_LINKS_CAP = 500;
const YIELD_EVERY = 100;

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
}

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
  const opts = { organisationId: ctx.actor.organisationId, from: req.from, to: req.to, profileSlugs: req.profileSlugs, limit: req.limit === "all" ? undefined : (req.limit ?? DEFAULT_PREVIEW_LIMIT), order: "newest" as const, withTest: true, batchSize: req.batchSize ?? 2000 };
  const total = await countVerdicts(ctx.db, opts);
  const matrix = emptyMatrix();
  const changedLinks: ChangedLink[] = [];
  let graded = 0;
  let failedToGrade = 0;
  let changed = 0;
  let done = 0;
  yield { type: "progress", done, total };

  for await (const batch of streamPreviewRows(ctx.db, opts)) {
    if (signal?.aborted) return;
    for (let i = 0; i < batch.length; i++) {
      // Let the event loop breathe now and then: the next batch is arriving on the socket meanwhile, and
      // a loop that never yields would stall PostgreSQL once the socket buffer is full.
      if (i % YIELD_EVERY === YIELD_EVERY - 1) await new Promise<void>((r) => setImmediate(r));
      const row = batch[i];
      let result: ReturnType<typeof grade>;
      try {
        result = grade(row.input as Parameters<typeof grade>[0], profile);
      } catch {
        failedToGrade++;
        continue;
      }
      graded++;
      const before = row.verdict;
      const after = result.verdict as VerdictValue;
      matrix[before][after]++;
      if (before !== after) {
        changed++;
        if (changedLinks.length < CHANGED_LINKS_CAP) {
          changedLinks.push({
            verdictId: row.id,
            seq: row.seq,
            linkRef: row.linkRef,
            before,
            after,
            headroomBefore: row.headroomDb,
            headroomAfter: result.headroomDb,
            storedProfile: `${row.profileSlug}@${row.profileVersion}`,
            reasonCodes: [...new Set(result.reasons.filter((r) => r.severity !== "info").map((r) => r.code))],
          });
        }
      }
    }
    done += batch.length;
    yield { type: "progress", done, total };
  }
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
