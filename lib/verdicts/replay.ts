// Replay: grade the stored test again under the stored profile version and compare digests; optionally
// also grade it under another profile version to show what would change. Writes nothing.
import type { Database } from "@/db";
import { findVerdictWithInput } from "@/db/queries/verdicts";
import { ENGINE_VERSION, grade } from "@/lib/grading";
import { verdictDigest } from "./digest";
import { LinkTestSchema, type GradingResult } from "@/lib/grading/schema";
import type { ReplayResult } from "@/lib/api/schemas/verdicts";
import { resolveProfile } from "@/lib/profiles/resolve";
import { isUuid } from "./read";

export type ReplayOutcome =
  | { ok: true; result: ReplayResult }
  | { ok: false; code: "not_found" | "profile_unavailable" | "comparison_profile"; detail: string };

function outcome(r: GradingResult, digest: string) {
  return {
    profile: r.profile,
    verdict: r.verdict,
    headroomDb: r.headroomDb,
    digest,
    reasonCodes: [...new Set(r.reasons.map((x) => x.code))].sort(),
  };
}

export async function replayVerdict(
  db: Database,
  organisationId: string,
  id: string,
  compareWith?: string,
): Promise<ReplayOutcome> {
  if (!isUuid(id)) return { ok: false, code: "not_found", detail: `No verdict ${id} in your organisation.` };
  const found = await findVerdictWithInput(db, organisationId, id);
  if (!found) return { ok: false, code: "not_found", detail: `No verdict ${id} in your organisation.` };
  const { verdict, input } = found;
  const stored = verdict.result as GradingResult;

  const original = await resolveProfile(db, organisationId, `${verdict.profileSlug}@${verdict.profileVersion}`);
  if (!original.ok) {
    return { ok: false, code: "profile_unavailable", detail: `The profile version this verdict used can no longer be loaded: ${original.reason}.` };
  }
  const test = LinkTestSchema.parse(input);
  const again = grade(test, original.profile);
  const replayDigest = verdictDigest(again);

  let comparison: ReplayResult["comparison"];
  if (compareWith) {
    const other = await resolveProfile(db, organisationId, compareWith);
    if (!other.ok) return { ok: false, code: "comparison_profile", detail: other.reason };
    const alt = grade(test, other.profile);
    const o = outcome(alt, verdictDigest(alt));
    const before = new Set(outcome(stored, verdict.digest).reasonCodes);
    const after = new Set(o.reasonCodes);
    const reasonsAdded = [...after].filter((c) => !before.has(c));
    const reasonsRemoved = [...before].filter((c) => !after.has(c));
    comparison = { ...o, changed: alt.verdict !== stored.verdict || reasonsAdded.length + reasonsRemoved.length > 0, reasonsAdded, reasonsRemoved };
  }

  return {
    ok: true,
    result: {
      verdictId: verdict.id,
      reproduced: replayDigest === verdict.digest,
      storedDigest: verdict.digest,
      replayDigest,
      engineVersion: { stored: verdict.engineVersion, current: ENGINE_VERSION },
      stored: outcome(stored, verdict.digest),
      replayed: outcome(again, replayDigest),
      ...(comparison ? { comparison } : {}),
    },
  };
}
