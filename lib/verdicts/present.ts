// A stored verdict row as the API shows it: no test id, key id or user id leaves the service.
import type { StoredVerdict } from "@/db/schema";
import type { GradingResult } from "@/lib/grading/schema";
import type { VerdictResource, VerdictSummary } from "@/lib/api/schemas/verdicts";

/** The fields a full verdict and a list entry share. */
function common(row: StoredVerdict, result: GradingResult) {
  return {
    id: row.id,
    seq: row.seq,
    linkRef: row.linkRef,
    verdict: result.verdict,
    headroomDb: result.headroomDb,
    profile: { slug: row.profileSlug, version: row.profileVersion },
    engineVersion: row.engineVersion,
    digest: row.digest,
    prevDigest: row.prevDigest,
    createdAt: row.createdAt.toISOString(),
  };
}

export function toVerdictResource(row: StoredVerdict): VerdictResource {
  const result = row.result as GradingResult;
  return { ...common(row, result), wavelengths: result.wavelengths, reasons: result.reasons };
}

export function toVerdictSummary(row: StoredVerdict): VerdictSummary {
  return { ...common(row, row.result as GradingResult), reasonCodes: row.reasonCodes };
}
