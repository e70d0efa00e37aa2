// The decision rule: turns one comparison of a measured value against a limit into pass, marginal or
// fail, using the guard band that the test method's uncertainty calls for.
//
// simple  (ILAC-G8:2019 "simple acceptance", from memory): accept up to the limit itself; values within
//         the guard band below the limit are accepted but reported as marginal.
// guarded (ILAC-G8:2019 guard-banded non-binary statement, from memory): pass only when clearly inside
//         (limit - w), fail only when clearly outside (limit + w); in between the measurement cannot
//         tell, so the outcome is marginal.
import type { Severity } from "./schema";

export type Outcome = "pass" | Exclude<Severity, "info">;
export type DecisionRule = "simple" | "guarded";

/** Quantities are compared and reported at 0.1 mdB / 0.1 mm resolution, far below any instrument's. */
export function round4(x: number): number {
  return Math.round(x * 1e4) / 1e4 + 0;
}

/** Headroom is positive when inside the limit. For a maximum: limit - measured; for a minimum: measured - limit. */
export function headroom(measured: number, limit: number, kind: "max" | "min"): number {
  return round4(kind === "max" ? round4(limit) - round4(measured) : round4(measured) - round4(limit));
}

export function decide(headroomValue: number, guardBand: number, rule: DecisionRule): Outcome {
  const w = round4(guardBand);
  if (rule === "simple") {
    if (headroomValue < 0) return "fail";
    return headroomValue < w ? "marginal" : "pass";
  }
  if (headroomValue >= w) return "pass";
  return headroomValue >= -w ? "marginal" : "fail";
}

const RANK: Record<Outcome | "info", number> = { info: 0, pass: 0, marginal: 1, fail: 2 };

export function worse<T extends Outcome | "info">(a: T, b: T): T {
  return RANK[b] > RANK[a] ? b : a;
}

export function severityRank(s: Outcome | "info"): number {
  return RANK[s];
}
