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

/**
 * A number for a message, to 0.001 (trailing zeros dropped). Built from integers because turning a
 * fractional double into its shortest decimal string is the slowest step of a whole grading run.
 */
export function fmt(x: number): string {
  const m = Math.round(x * 1000);
  if (!Number.isSafeInteger(m)) return String(x);
  const neg = m < 0;
  const a = neg ? -m : m;
  const whole = Math.floor(a / 1000);
  const frac = a - whole * 1000;
  let out = (neg ? "-" : "") + whole;
  if (frac !== 0) {
    let digits = frac < 10 ? "00" + frac : frac < 100 ? "0" + frac : "" + frac;
    while (digits.endsWith("0")) digits = digits.slice(0, -1);
    out += "." + digits;
  }
  return out;
}
