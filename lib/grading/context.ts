// Shared state of one grading run: the validated input, the profile, and the reasons gathered so far.
import type { DecisionRule, Outcome } from "./decide";
import { isMultimode, type FibreType, type Limits, type LinkTest, type Reason, type Severity, type TestMethod } from "./schema";

export interface GradingContext {
  test: LinkTest;
  limits: Limits;
  fibre: FibreType;
  multimode: boolean;
  rule: DecisionRule;
  reasons: Reason[];
}

export function createContext(test: LinkTest, limits: Limits): GradingContext {
  return {
    test,
    limits,
    fibre: test.link.fibreType,
    multimode: isMultimode(test.link.fibreType),
    rule: limits.decisionRule.value,
    reasons: [],
  };
}

export function addReason(ctx: GradingContext, reason: Reason): void {
  ctx.reasons.push(reason);
}

/** Map a pass/marginal/fail outcome to a reason severity (a passing check is informational). */
export function severityOf(outcome: Outcome): Severity {
  return outcome === "pass" ? "info" : outcome;
}

export function methodOf(method: TestMethod | undefined): TestMethod {
  return method ?? "one-cord";
}

/** Attenuation coefficient limit (dB/km) and the row it came from, or undefined if the profile has none. */
export function attenuationFor(
  limits: Limits,
  fibre: FibreType,
  wavelengthNm: number,
): { value: number; source: string; index: number } | undefined {
  const rows = limits.attenuation;
  for (let i = 0; i < rows.length; i++) {
    const row = rows[i];
    if (row.wavelengthNm === wavelengthNm && row.fibreTypes.includes(fibre)) {
      return { value: row.maxDbPerKm, source: row.source, index: i };
    }
  }
  return undefined;
}

export function fmt(x: number): string {
  return String(Math.round(x * 1000) / 1000);
}
