// Insertion loss per wavelength against the tighter of the loss budget, the application's channel
// insertion loss and the PON class's maximum ODN loss; and the PON class's minimum ODN loss.
import { lossBudget, type Counts, type LengthChoice } from "./budget";
import { addReason, fmt, methodOf, severityOf, type GradingContext } from "./context";
import { decide, headroom, worse, type Outcome } from "./decide";
import type { Limits, Measurement, WavelengthResult } from "./schema";

export interface ApplicationMatch {
  row: Limits["applications"][number];
  index: number;
}

export interface PonMatch {
  row: Limits["ponClasses"][number];
  index: number;
}

export function gradeLoss(
  ctx: GradingContext,
  counts: Counts,
  lengthOf: (m: Measurement) => LengthChoice,
  app: ApplicationMatch | undefined,
  pon: PonMatch | undefined,
): WavelengthResult[] {
  const byWavelength = new Map<number, WavelengthResult>();
  const noLimitReported = new Set<number>();

  for (const m of ctx.test.measurements) {
    if (m.insertionLossDb === undefined) continue;
    const nm = m.wavelengthNm;
    const method = methodOf(m.method);
    const guard = ctx.limits.guardBands[method].value;
    const length = lengthOf(m);
    const budget = lossBudget(ctx, counts, nm, method, length);

    let limitDb = budget?.totalDb;
    let basis: WavelengthResult["limitBasis"] = "loss-budget";
    let rule = budget?.rule ?? "";
    let source = budget?.source ?? "";
    if (app && app.row.wavelengthNm === nm && (limitDb === undefined || app.row.maxChannelLossDb.value < limitDb)) {
      limitDb = app.row.maxChannelLossDb.value;
      basis = "application";
      rule = `limits.applications[${app.index}].maxChannelLossDb`;
      source = app.row.maxChannelLossDb.source;
    }
    if (pon && (limitDb === undefined || pon.row.maxLossDb.value < limitDb)) {
      limitDb = pon.row.maxLossDb.value;
      basis = "pon-class";
      rule = `limits.ponClasses[${pon.index}].maxLossDb`;
      source = pon.row.maxLossDb.source;
    }

    if (limitDb === undefined) {
      if (!noLimitReported.has(nm)) {
        noLimitReported.add(nm);
        addReason(ctx, {
          code: "profile.no-attenuation-limit",
          severity: "marginal",
          wavelengthNm: nm,
          rule: "limits.attenuation",
          source: "Glassgrade engine (a link cannot be shown to comply without a limit)",
          message: `The profile has no attenuation limit for ${ctx.fibre} at ${nm} nm, so the insertion loss at ${nm} nm cannot be graded.`,
        });
      }
      continue;
    }

    const measured = m.insertionLossDb;
    const h = headroom(measured, limitDb, "max");
    let outcome: Outcome = decide(h, guard, ctx.rule);

    const code =
      outcome === "pass"
        ? "loss.within-budget"
        : basis === "application"
          ? "loss.over-application-limit"
          : basis === "pon-class"
            ? "loss.over-pon-class-max"
            : "loss.over-budget";
    const what = basis === "application" ? `the ${app?.row.application} channel limit` : basis === "pon-class" ? `the class ${pon?.row.ponClass} maximum` : "the loss budget";
    addReason(ctx, {
      code,
      severity: severityOf(outcome),
      wavelengthNm: nm,
      measured,
      limit: limitDb,
      unit: "dB",
      rule,
      source,
      message:
        outcome === "pass"
          ? `Insertion loss ${fmt(measured)} dB at ${nm} nm is within ${what} of ${fmt(limitDb)} dB (headroom ${fmt(h)} dB).`
          : outcome === "marginal"
            ? `Insertion loss ${fmt(measured)} dB at ${nm} nm is within the ${fmt(guard)} dB guard band of ${what} (${fmt(limitDb)} dB).`
            : `Insertion loss ${fmt(measured)} dB at ${nm} nm exceeds ${what} of ${fmt(limitDb)} dB by ${fmt(-h)} dB.`,
    });

    if (pon) {
      const minDb = pon.row.minLossDb.value;
      const hMin = headroom(measured, minDb, "min");
      const minOutcome = decide(hMin, guard, ctx.rule);
      if (minOutcome !== "pass") {
        addReason(ctx, {
          code: "loss.under-pon-class-min",
          severity: severityOf(minOutcome),
          wavelengthNm: nm,
          measured,
          limit: minDb,
          unit: "dB",
          rule: `limits.ponClasses[${pon.index}].minLossDb`,
          source: pon.row.minLossDb.source,
          message: `Insertion loss ${fmt(measured)} dB at ${nm} nm is below the class ${pon.row.ponClass} minimum of ${fmt(minDb)} dB: the receiver may be overloaded; an attenuator may be needed.`,
        });
      }
      outcome = worse(outcome, minOutcome);
    }

    if (measured < 0) {
      addReason(ctx, {
        code: "loss.negative-reading",
        severity: "info",
        wavelengthNm: nm,
        measured,
        unit: "dB",
        rule: "measurements.insertionLossDb",
        source: "IEC 61280-4-1/-4-2 (a link cannot have gain; a negative reading points at the reference), from memory",
        message: `Insertion loss at ${nm} nm reads ${fmt(measured)} dB: a negative loss usually means the reference was set with a dirty or poorly mated cord; re-reference and retest.`,
      });
    }

    const entry: WavelengthResult = {
      wavelengthNm: nm,
      budgetDb: limitDb,
      measuredDb: measured,
      headroomDb: h,
      verdict: outcome,
      limitBasis: basis,
      lossBudgetDb: budget?.totalDb ?? null,
      method,
      guardBandDb: guard,
      budget: {
        lengthM: budget?.lengthM ?? length.lengthM,
        lengthBasis: budget?.lengthBasis ?? length.basis,
        fibreDb: budget?.fibreDb ?? 0,
        connectorPairs: budget?.connectorPairs ?? 0,
        connectorsDb: budget?.connectorsDb ?? 0,
        splices: budget?.splices ?? 0,
        splicesDb: budget?.splicesDb ?? 0,
        splittersDb: budget?.splittersDb ?? 0,
        marginDb: budget?.marginDb ?? 0,
        countsFrom: counts.countsFrom,
      },
    };
    if (m.direction) entry.direction = m.direction;

    // Keep the worst reading per wavelength: lowest headroom, then the worse verdict.
    const prev = byWavelength.get(nm);
    if (!prev) {
      byWavelength.set(nm, entry);
    } else {
      const kept = entry.headroomDb < prev.headroomDb ? entry : prev;
      kept.verdict = worse(prev.verdict, entry.verdict);
      byWavelength.set(nm, kept);
    }
  }
  return [...byWavelength.values()].sort((a, b) => a.wavelengthNm - b.wavelengthNm);
}
