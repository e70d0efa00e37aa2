// grade(test, profile): the one entry point of the engine. Pure and synchronous: the same validated
// test and profile always give the same result.
import { countComponents, type LengthChoice } from "./budget";
import { addReason, createContext, fmt, type GradingContext } from "./context";
import { decide, headroom, worse } from "./decide";
import { gradeEvents } from "./event-rules";
import { gradeInspections, gradeLength, gradeOrl, gradePower, gradeSpectralLoss } from "./link-rules";
import { gradeLoss, type ApplicationMatch, type PonMatch } from "./loss";
import type { GradingResult, LinkTest, Measurement, Profile, Reason, Verdict } from "./schema";
import { groupSites, type Site } from "./sites";

export const ENGINE_VERSION = "1.0.0";

export function grade(test: LinkTest, profile: Profile): GradingResult {
  const ctx = createContext(test, profile.limits);
  const sites = groupSites(test.events ?? [], profile.limits.eventPositionToleranceM.value);
  const counts = countComponents(ctx, sites);
  const endM = linkEnd(test, sites);
  const lengthOf = (m: Measurement): LengthChoice =>
    m.lengthM !== undefined
      ? { lengthM: m.lengthM, basis: "measured" }
      : test.link.designLengthM !== undefined
        ? { lengthM: test.link.designLengthM, basis: "design" }
        : endM !== undefined
          ? { lengthM: endM, basis: "events" }
          : { lengthM: 0, basis: "none" };

  const fromEvents = [
    test.link.connectorPairs === undefined ? `${counts.connectorPairs} connector pair(s)` : "",
    test.link.splices === undefined ? `${counts.splices} splice(s)` : "",
  ].filter(Boolean);
  if (fromEvents.length > 0) {
    addReason(ctx, {
      code: "budget.counts-from-events",
      severity: "info",
      rule: "link.connectorPairs, link.splices",
      source: "Glassgrade engine",
      message: `Not declared, so counted from the ${test.events?.length ? "event list" : "(empty) event list"}: ${fromEvents.join(", ")}.`,
    });
  }
  if (counts.undeclaredSplitterSites > 0) {
    addReason(ctx, {
      code: "budget.splitter-undeclared",
      severity: "marginal",
      rule: "link.splitters",
      source: "Glassgrade engine",
      message: `${counts.undeclaredSplitterSites} splitter event(s) found but no splitter ratio declared, so the loss budget has no splitter allowance; declare link.splitters.`,
    });
  }

  const app = matchApplication(ctx);
  const pon = matchPonClass(ctx);
  const wavelengths = gradeLoss(ctx, counts, lengthOf, app, pon);
  if (app) checkApplicationReach(ctx, app, test, endM, wavelengths.map((w) => w.wavelengthNm));

  gradeSpectralLoss(ctx, wavelengths);
  gradeEvents(ctx, sites);
  gradeOrl(ctx, sites, endM);
  gradeLength(ctx);
  gradePower(ctx, pon);
  gradeInspections(ctx);

  const reasons = sortReasons(ctx.reasons);
  let verdict: Verdict = "pass";
  for (const r of reasons) if (r.severity !== "info") verdict = worse<Verdict>(verdict, r.severity);
  let worst: number | null = null;
  for (const w of wavelengths) worst = worst === null ? w.headroomDb : Math.min(worst, w.headroomDb);

  return {
    verdict,
    headroomDb: worst,
    wavelengths,
    reasons,
    engineVersion: ENGINE_VERSION,
    profile: { slug: profile.slug, version: profile.version },
  };
}

/** The far end: longest measured length, else the furthest end event. */
function linkEnd(test: LinkTest, sites: readonly Site[]): number | undefined {
  let end: number | undefined;
  for (const m of test.measurements) if (m.lengthM !== undefined) end = Math.max(end ?? 0, m.lengthM);
  if (end !== undefined) return end;
  for (const s of sites) if (s.kind === "end") end = Math.max(end ?? 0, s.positionM);
  return end;
}

function matchApplication(ctx: GradingContext): ApplicationMatch | undefined {
  const name = ctx.test.link.application;
  if (!name) return undefined;
  const wanted = name.toUpperCase();
  const rows = ctx.limits.applications;
  let named = false;
  for (let i = 0; i < rows.length; i++) {
    if (rows[i].application.toUpperCase() !== wanted) continue;
    named = true;
    if (rows[i].fibreTypes.includes(ctx.fibre)) return { row: rows[i], index: i };
  }
  if (named) {
    addReason(ctx, {
      code: "application.fibre-not-supported",
      severity: "fail",
      rule: "limits.applications",
      source: sourcesOfApplication(ctx, wanted),
      message: `${name} is not specified over ${ctx.fibre} fibre in this profile.`,
    });
  } else {
    addReason(ctx, {
      code: "application.not-in-profile",
      severity: "info",
      rule: "limits.applications",
      source: "Glassgrade engine",
      message: `The profile has no limits for application ${name}; graded against the loss budget only.`,
    });
  }
  return undefined;
}

function sourcesOfApplication(ctx: GradingContext, wanted: string): string {
  const s = new Set<string>();
  for (const r of ctx.limits.applications) if (r.application.toUpperCase() === wanted) s.add(r.maxChannelLossDb.source);
  return [...s].join("; ");
}

function matchPonClass(ctx: GradingContext): PonMatch | undefined {
  const declared = ctx.test.link.ponClass;
  const name = declared ?? ctx.limits.defaultPonClass;
  if (!name) return undefined;
  const rows = ctx.limits.ponClasses;
  for (let i = 0; i < rows.length; i++) {
    if (rows[i].ponClass.toUpperCase() === name.toUpperCase()) return { row: rows[i], index: i };
  }
  addReason(ctx, {
    code: "pon-class.not-in-profile",
    severity: declared ? "marginal" : "info",
    rule: declared ? "link.ponClass" : "limits.defaultPonClass",
    source: "Glassgrade engine",
    message: `The profile has no PON class ${name}; available: ${rows.map((r) => r.ponClass).join(", ") || "none"}.`,
  });
  return undefined;
}

function checkApplicationReach(ctx: GradingContext, app: ApplicationMatch, test: LinkTest, endM: number | undefined, measuredNm: number[]) {
  const { row, index } = app;
  if (!measuredNm.includes(row.wavelengthNm)) {
    addReason(ctx, {
      code: "application.wavelength-not-tested",
      severity: "marginal",
      wavelengthNm: row.wavelengthNm,
      rule: `limits.applications[${index}].wavelengthNm`,
      source: row.maxChannelLossDb.source,
      message: `${row.application} runs at ${row.wavelengthNm} nm but no insertion loss was measured there, so its channel limit was not checked.`,
    });
  }
  const lengthM = endM ?? test.link.designLengthM;
  if (lengthM === undefined) return;
  const guard = (ctx.limits.guardBands.lengthPercent.value / 100) * row.maxReachM.value;
  checkLengthLimit(ctx, "length.over-application-reach", lengthM, row.maxReachM.value, guard, "max", `limits.applications[${index}].maxReachM`, row.maxReachM.source, `${row.application} reach`);
  if (row.minReachM) {
    checkLengthLimit(ctx, "length.under-application-minimum", lengthM, row.minReachM.value, 0, "min", `limits.applications[${index}].minReachM`, row.minReachM.source, `${row.application} minimum length`);
  }
}

export function checkLengthLimit(
  ctx: GradingContext,
  code: string,
  lengthM: number,
  limitM: number,
  guardM: number,
  kind: "max" | "min",
  rule: string,
  source: string,
  what: string,
) {
  const outcome = decide(headroom(lengthM, limitM, kind), guardM, ctx.rule);
  if (outcome === "pass") return;
  addReason(ctx, {
    code,
    severity: outcome,
    measured: lengthM,
    limit: limitM,
    unit: "m",
    rule,
    source,
    message:
      outcome === "marginal"
        ? `Link length ${fmt(lengthM)} m is within the length guard band of the ${what} of ${fmt(limitM)} m.`
        : `Link length ${fmt(lengthM)} m is ${kind === "max" ? "beyond" : "short of"} the ${what} of ${fmt(limitM)} m.`,
  });
}

function severityOrder(r: Reason): number {
  return r.severity === "fail" ? 0 : r.severity === "marginal" ? 1 : 2;
}

function compareReasons(a: Reason, b: Reason): number {
  return (
    severityOrder(a) - severityOrder(b) ||
    (a.code < b.code ? -1 : a.code > b.code ? 1 : 0) ||
    (a.wavelengthNm ?? 0) - (b.wavelengthNm ?? 0) ||
    (a.positionM ?? -1) - (b.positionM ?? -1) ||
    (a.measured ?? 0) - (b.measured ?? 0) ||
    (a.message < b.message ? -1 : a.message > b.message ? 1 : 0)
  );
}

/** Most severe first, then a stable order that does not depend on the order of the submitted events. */
function sortReasons(reasons: Reason[]): Reason[] {
  return reasons.sort(compareReasons);
}
