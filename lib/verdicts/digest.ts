// The server computes verdict digests with node:crypto over the engine's canonical JSON: the same bytes
// and the same hash as the engine's resultDigest (a portable pure-JS SHA-256 kept for the browser), at a
// fraction of the cost for 1,000-item batches. tests/unit/api/digest.test.ts pins the two together.
import { createHash } from "node:crypto";
import { canonicalJson } from "@/lib/grading";

export function verdictDigest(result: unknown): string {
  return createHash("sha256").update(canonicalJson(result), "utf8").digest("hex");
}
