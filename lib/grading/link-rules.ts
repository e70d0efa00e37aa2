// Whole-link rules: the spectral macrobend hint from insertion loss, optical return loss, length
// against design, received power against the receiver window, and end-face inspections.
import { addReason, attenuationFor, fmt, severityOf, type GradingContext } from "./context";
import { decide, headroom, round4 } from "./decide";
import type { PonMatch } from "./loss";
import type { WavelengthResult } from "./schema";
import { siteLoss, type Site, type SiteReading } from "./sites";

/** Single-mode fibre loses less at 1550 nm than at 1310 nm; a link that loses clearly more at the
 *  longer wavelength is bent somewhere (field practice, seen in secondary sources). */
export function gradeSpectralLoss(ctx: GradingContext, wavelengths: readonly WavelengthResult[]): void {
  if (ctx.multimode || wavelengths.length < 2) return;
  let best: { short: WavelengthResult; long: WavelengthResult; diff: number } | undefined;
  for (let i = 0; i < wavelengths.length; i++) {
    for (let j = i + 1; j < wavelengths.length; j++) {
      const diff = wavelengths[j].measuredDb - wavelengths[i].measuredDb;
      if (!best || diff > best.diff) best = { short: wavelengths[i], long: wavelengths[j], diff };
    }
  }
  if (!best) return;
  const limit = ctx.limits.macrobendThresholdDb;
  const outcome = decide(headroom(best.diff, limit.value, "max"), ctx.limits.guardBands[best.long.method].value, ctx.rule);
  if (outcome === "pass") return;
  addReason(ctx, {
    code: "loss.macrobend-suspected",
    severity: severityOf(outcome),
    wavelengthNm: best.long.wavelengthNm,
    measured: round4(best.diff),
    limit: limit.value,
    unit: "dB",
    rule: "limits.macrobendThresholdDb",
    source: limit.source,
    message: `The link loses ${fmt(best.diff)} dB more at ${best.long.wavelengthNm} nm than at ${best.short.wavelengthNm} nm; fibre alone loses less at the longer wavelength, so a bend is likely. Locate it with an OTDR.`,
  });
}

/** x dB as a power ratio is exp(x * ln(10) / 10). */
const DB_TO_LN = Math.LN10 / 10;

export function gradeOrl(ctx: GradingContext, sites: readonly Site[], endM: number | undefined): void {
  const family = ctx.multimode ? "multimode" : "singlemode";
  const min = ctx.limits.orlMinDb[family];
  let measuredAny = false;
  for (const m of ctx.test.measurements) {
    if (m.orlDb === undefined) continue;
    measuredAny = true;
    if (min) {
      const h = headroom(m.orlDb, min.value, "min");
      const outcome = decide(h, ctx.limits.guardBands.orl.value, ctx.rule);
      if (outcome !== "pass") {
        addReason(ctx, {
          code: "orl.below-minimum",
          severity: severityOf(outcome),
          wavelengthNm: m.wavelengthNm,
          measured: m.orlDb,
          limit: min.value,
          unit: "dB",
          rule: `limits.orlMinDb.${family}`,
          source: min.source,
          message: `Optical return loss ${fmt(m.orlDb)} dB at ${m.wavelengthNm} nm is ${outcome === "fail" ? "below" : "within the guard band of"} the ${fmt(min.value)} dB minimum: look for dirty or damaged connectors.`,
        });
      }
    }
    orlConsistency(ctx, sites, m.wavelengthNm, m.direction ?? "AB", m.orlDb, m.lengthM ?? endM);
  }
  if (min && !measuredAny) {
    addReason(ctx, {
      code: "orl.not-measured",
      severity: "info",
      rule: `limits.orlMinDb.${family}`,
      source: min.source,
      message: `The profile sets a ${fmt(min.value)} dB minimum optical return loss, but no ORL was measured.`,
    });
  }
}

/**
 * Compare a reported ORL with what the listed reflections and the fibre's backscatter imply:
 * each reflection R_i seen behind a one-way loss A_i returns 10^((R_i - 2 A_i)/10) of the launched
 * power (physics, computed), and a fibre of length L returns B (1 - 10^(-2 a L / 10)), with B the
 * backscatter return of an infinitely long fibre. Informational only: events may be hidden in dead
 * zones, and attenuation is taken at the profile's limit.
 */
function orlConsistency(ctx: GradingContext, sites: readonly Site[], nm: number, direction: "AB" | "BA", orlDb: number, lengthM: number | undefined) {
  const family = ctx.multimode ? "multimode" : "singlemode";
  const att = attenuationFor(ctx.limits, ctx.fibre, nm);
  if (!att || lengthM === undefined) return;
  // Sites are in position order from end A; walk them from the launch end of this measurement.
  let power = 0;
  let upstreamLoss = 0;
  let anyReflection = false;
  const n = sites.length;
  for (let k = 0; k < n; k++) {
    const s = sites[direction === "AB" ? k : n - 1 - k];
    let reading: SiteReading | undefined;
    for (const r of s.readings) if (r.wavelengthNm === nm) reading = r;
    if (!reading) continue;
    const d = Math.max(0, direction === "AB" ? s.positionM : lengthM - s.positionM);
    if (reading.reflectanceDb !== undefined) {
      anyReflection = true;
      const oneWay = upstreamLoss + (att.value * d) / 1000;
      power += Math.exp((reading.reflectanceDb - 2 * oneWay) * DB_TO_LN);
    }
    upstreamLoss += Math.max(0, siteLoss(reading) ?? 0);
  }
  if (!anyReflection) return;
  const backscatterRl = ctx.limits.orlConsistency.backscatterReturnLossDb[family];
  power += 10 ** (-backscatterRl.value / 10) * (1 - 10 ** ((-2 * att.value * lengthM) / 1000 / 10));
  const implied = round4(-10 * Math.log10(power));
  const tol = ctx.limits.orlConsistency.toleranceDb.value;
  const tolSource = `${ctx.limits.orlConsistency.toleranceDb.source}; ${backscatterRl.source}`;
  const note = (code: string, message: string) =>
    addReason(ctx, { code, severity: "info", wavelengthNm: nm, measured: orlDb, limit: implied, unit: "dB", rule: "limits.orlConsistency", source: tolSource, message });
  if (orlDb > implied + tol) {
    note(
      "orl.inconsistent",
      `Reported ORL ${fmt(orlDb)} dB at ${nm} nm is higher than the ${fmt(implied)} dB that the listed reflections and backscatter alone imply: check the ORL reading or the event reflectances.`,
    );
  } else if (orlDb < implied - tol) {
    note(
      "orl.unlisted-reflection",
      `Reported ORL ${fmt(orlDb)} dB at ${nm} nm is well below the ${fmt(implied)} dB the listed events imply: a reflection is missing from the event list (dead zone, far-end connector or an open end).`,
    );
  }
}

export function gradeLength(ctx: GradingContext): void {
  const design = ctx.test.link.designLengthM;
  if (design === undefined) return;
  let worst: number | undefined;
  for (const m of ctx.test.measurements) {
    if (m.lengthM === undefined) continue;
    if (worst === undefined || Math.abs(m.lengthM - design) > Math.abs(worst - design)) worst = m.lengthM;
  }
  if (worst === undefined) return;
  const tl = ctx.limits.lengthTolerance;
  const tolerance = Math.max((tl.percent.value / 100) * design, tl.minimumM.value);
  const deviation = Math.abs(worst - design);
  const guard = (ctx.limits.guardBands.lengthPercent.value / 100) * design;
  const outcome = decide(headroom(deviation, tolerance, "max"), guard, ctx.rule);
  if (outcome === "pass") return;
  addReason(ctx, {
    code: "length.design-mismatch",
    severity: severityOf(outcome),
    measured: round4(worst),
    limit: round4(tolerance),
    unit: "m",
    rule: "limits.lengthTolerance",
    source: `${tl.percent.source}; ${tl.minimumM.source}`,
    message: `Measured length ${fmt(worst)} m differs from the design length ${fmt(design)} m by ${fmt(deviation)} m (tolerance ${fmt(tolerance)} m): wrong fibre, or a wrong group index on the tester?`,
  });
}

export function gradePower(ctx: GradingContext, pon: PonMatch | undefined): void {
  for (const p of ctx.test.powerReadings ?? []) {
    const w = pon?.row.receiverWindows.findIndex((x) => x.wavelengthNm === p.wavelengthNm) ?? -1;
    if (!pon || w < 0) {
      addReason(ctx, {
        code: "power.no-window",
        severity: "info",
        wavelengthNm: p.wavelengthNm,
        measured: p.dbm,
        unit: "dBm",
        rule: "limits.ponClasses[].receiverWindows",
        source: "Glassgrade engine",
        message: `Received power ${fmt(p.dbm)} dBm at ${p.wavelengthNm} nm recorded; the profile has no receiver window for it${pon ? ` in class ${pon.row.ponClass}` : " (no PON class)"}.`,
      });
      continue;
    }
    const win = pon.row.receiverWindows[w];
    const guard = ctx.limits.guardBands.power.value;
    const path = `limits.ponClasses[${pon.index}].receiverWindows[${w}]`;
    const low = decide(headroom(p.dbm, win.minDbm.value, "min"), guard, ctx.rule);
    const high = decide(headroom(p.dbm, win.maxDbm.value, "max"), guard, ctx.rule);
    if (low !== "pass") {
      addReason(ctx, {
        code: "power.below-sensitivity",
        severity: severityOf(low),
        wavelengthNm: p.wavelengthNm,
        measured: p.dbm,
        limit: win.minDbm.value,
        unit: "dBm",
        rule: `${path}.minDbm`,
        source: win.minDbm.source,
        message: `Received power ${fmt(p.dbm)} dBm at ${p.wavelengthNm} nm is ${low === "fail" ? "below" : "within the guard band of"} the ${win.receiver} sensitivity of ${fmt(win.minDbm.value)} dBm.`,
      });
    }
    if (high !== "pass") {
      addReason(ctx, {
        code: "power.above-overload",
        severity: severityOf(high),
        wavelengthNm: p.wavelengthNm,
        measured: p.dbm,
        limit: win.maxDbm.value,
        unit: "dBm",
        rule: `${path}.maxDbm`,
        source: win.maxDbm.source,
        message: `Received power ${fmt(p.dbm)} dBm at ${p.wavelengthNm} nm is ${high === "fail" ? "above" : "within the guard band of"} the ${win.receiver} overload level of ${fmt(win.maxDbm.value)} dBm.`,
      });
    }
  }
}

export function gradeInspections(ctx: GradingContext): void {
  for (const i of ctx.test.inspections ?? []) {
    if (i.result !== "fail") continue;
    addReason(ctx, {
      code: "inspection.failed",
      severity: "fail",
      rule: "inspections.result",
      source: "IEC 61300-3-35 end-face acceptance criteria (applied by the inspector)",
      message: `End face at ${i.location} failed inspection: clean and re-inspect, or replace the connector.`,
    });
  }
}
