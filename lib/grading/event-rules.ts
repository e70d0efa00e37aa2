// Per-event rules: connector and splice loss, reflectance by polish, splitter excess loss, breaks,
// gainers and the macrobend signature.
import { idealSplitLossDb, splitStages, splitterOutputs } from "./budget";
import { addReason, fmt, severityOf, type GradingContext } from "./context";
import { decide, headroom, round4 } from "./decide";
import type { Limit } from "./schema";
import { isConnectorLike, isSpliceLike, siteLoss, type Site, type SiteReading } from "./sites";

const GAINER_SOURCE =
  "Bidirectional averaging of OTDR event loss (IEC 61746 / ITU-T G.650.3 practice; seen in secondary sources)";
const BREAK_SOURCE = "common practice (a break interrupts the link)";

export function gradeEvents(ctx: GradingContext, sites: readonly Site[]): void {
  const splitterRatios = assignSplitterRatios(ctx, sites);
  for (const site of sites) {
    if (site.kind === "end") continue;
    if (site.kind === "break") {
      addReason(ctx, {
        code: "event.break",
        severity: "fail",
        eventIndex: site.firstIndex,
        positionM: round4(site.positionM),
        rule: "events.kind",
        source: BREAK_SOURCE,
        message: `Fibre break at ${fmt(site.positionM)} m.`,
      });
      continue;
    }
    for (const r of site.readings) {
      const nm = r.wavelengthNm;
      reportGainer(ctx, site, nm, r);
      const loss = siteLoss(r);
      if (site.kind === "splitter") {
        const outputs = splitterRatios.get(site);
        if (loss !== undefined && outputs !== undefined) gradeSplitter(ctx, site, nm, r, loss, outputs);
      } else if (isConnectorLike(site)) {
        if (loss !== undefined) lossRule(ctx, site, nm, r, loss, ctx.limits.connectorLossDb, "limits.connectorLossDb", "event.connector-loss", "connector");
        reflectanceRule(ctx, site, nm, r, connectorReflectanceLimit(ctx));
      } else if (isSpliceLike(site)) {
        if (loss !== undefined) lossRule(ctx, site, nm, r, loss, ctx.limits.spliceLossDb, "limits.spliceLossDb", "event.splice-loss", site.kind === "splice" ? "splice" : `${site.kind} event`);
        const spliceLimit = ctx.limits.spliceReflectanceMaxDb;
        if (spliceLimit) {
          reflectanceRule(ctx, site, nm, r, ctx.multimode
            ? { limit: spliceLimit.multimode, rule: "limits.spliceReflectanceMaxDb.multimode" }
            : { limit: spliceLimit.singlemode, rule: "limits.spliceReflectanceMaxDb.singlemode" });
        }
      }
    }
    macrobend(ctx, site);
  }
}

function connectorReflectanceLimit(ctx: GradingContext): { limit: Limit; rule: string } {
  const r = ctx.limits.reflectanceMaxDb;
  if (ctx.multimode) return { limit: r.multimode, rule: "limits.reflectanceMaxDb.multimode" };
  return ctx.test.link.polish === "APC"
    ? { limit: r.apc, rule: "limits.reflectanceMaxDb.apc" }
    : { limit: r.upc, rule: "limits.reflectanceMaxDb.upc" };
}

function lossRule(ctx: GradingContext, site: Site, nm: number, r: SiteReading, loss: number, limit: Limit, rule: string, code: string, what: string) {
  const h = headroom(loss, limit.value, "max");
  const outcome = decide(h, ctx.limits.guardBands.otdr.value, ctx.rule);
  if (outcome === "pass") return;
  addReason(ctx, {
    code,
    severity: severityOf(outcome),
    wavelengthNm: nm,
    eventIndex: r.eventIndex,
    positionM: round4(site.positionM),
    measured: round4(loss),
    limit: limit.value,
    unit: "dB",
    rule,
    source: limit.source,
    message: `${capitalise(what)} at ${fmt(site.positionM)} m loses ${fmt(loss)} dB at ${nm} nm${bothWays(r)}, ${outcome === "fail" ? "over" : "within the guard band of"} the ${fmt(limit.value)} dB limit.`,
  });
}

function reflectanceRule(ctx: GradingContext, site: Site, nm: number, r: SiteReading, lim: { limit: Limit; rule: string }) {
  if (r.reflectanceDb === undefined) return;
  // Reflectance limits are maxima (closer to 0 dB is worse); it is read from the trace, so the OTDR
  // guard band applies.
  const h = headroom(r.reflectanceDb, lim.limit.value, "max");
  const outcome = decide(h, ctx.limits.guardBands.otdr.value, ctx.rule);
  if (outcome === "pass") return;
  addReason(ctx, {
    code: "event.reflectance",
    severity: severityOf(outcome),
    wavelengthNm: nm,
    eventIndex: r.eventIndex,
    positionM: round4(site.positionM),
    measured: r.reflectanceDb,
    limit: lim.limit.value,
    unit: "dB",
    rule: lim.rule,
    source: lim.limit.source,
    message: `Reflectance ${fmt(r.reflectanceDb)} dB at ${fmt(site.positionM)} m (${nm} nm) is ${outcome === "fail" ? "above" : "within the guard band of"} the ${fmt(lim.limit.value)} dB maximum; clean or re-terminate the connection.`,
  });
}

function gradeSplitter(ctx: GradingContext, site: Site, nm: number, r: SiteReading, loss: number, outputs: number) {
  const ideal = idealSplitLossDb(outputs);
  const excess = loss - ideal;
  const allowance = splitStages(outputs) * ctx.limits.splitterExcessLossDbPerStage.value;
  const h = headroom(excess, allowance, "max");
  const outcome = decide(h, ctx.limits.guardBands.otdr.value, ctx.rule);
  if (outcome === "pass") return;
  addReason(ctx, {
    code: "event.splitter-excess-loss",
    severity: severityOf(outcome),
    wavelengthNm: nm,
    eventIndex: r.eventIndex,
    positionM: round4(site.positionM),
    measured: round4(excess),
    limit: round4(allowance),
    unit: "dB",
    rule: "limits.splitterExcessLossDbPerStage",
    source: `${ctx.limits.splitterExcessLossDbPerStage.source}; ideal split 10*log10(N) (computed)`,
    message: `1x${outputs} splitter at ${fmt(site.positionM)} m loses ${fmt(loss)} dB at ${nm} nm, ${fmt(excess)} dB above the ideal ${fmt(ideal)} dB; allowed excess ${fmt(allowance)} dB.`,
  });
}

/** Pair splitter events with declared ratios in position order; one declared ratio serves them all. */
function assignSplitterRatios(ctx: GradingContext, sites: readonly Site[]): Map<Site, number> {
  const out = new Map<Site, number>();
  const declared = ctx.test.link.splitters?.map((s) => splitterOutputs(s.ratio)) ?? [];
  const splitterSites = sites.filter((s) => s.kind === "splitter");
  if (splitterSites.length === 0 || declared.length === 0) return out;
  const uniform = declared.every((n) => n === declared[0]);
  if (declared.length === splitterSites.length || uniform) {
    splitterSites.forEach((s, i) => out.set(s, declared.length === splitterSites.length ? declared[i] : declared[0]));
    return out;
  }
  addReason(ctx, {
    code: "event.splitter-ratio-unmatched",
    severity: "info",
    rule: "link.splitters",
    source: "Glassgrade engine",
    message: `${splitterSites.length} splitter event(s) but ${declared.length} declared splitter(s) of different ratios; splitter excess loss not checked per event.`,
  });
  return out;
}

function reportGainer(ctx: GradingContext, site: Site, nm: number, r: SiteReading) {
  const negative = (r.ab !== undefined && r.ab < 0) || (r.ba !== undefined && r.ba < 0);
  if (!negative) return;
  const both = r.ab !== undefined && r.ba !== undefined;
  const avg = siteLoss(r) ?? 0;
  addReason(ctx, {
    code: both ? "event.gainer-resolved" : "event.gainer-unresolved",
    severity: "info",
    wavelengthNm: nm,
    eventIndex: r.eventIndex,
    positionM: round4(site.positionM),
    measured: round4(avg),
    unit: "dB",
    rule: "events.lossDb",
    source: GAINER_SOURCE,
    message: both
      ? `Gainer at ${fmt(site.positionM)} m (${nm} nm): A→B ${fmt(r.ab ?? 0)} dB, B→A ${fmt(r.ba ?? 0)} dB; the bidirectional average ${fmt(avg)} dB is graded.`
      : `Apparent gain of ${fmt(-avg)} dB at ${fmt(site.positionM)} m (${nm} nm) from one direction only: the true loss is unknown until the link is tested from the other end.`,
  });
}

// A macrobend loses far more at the longer wavelength, while a splice or connector loses about the
// same at both (field practice; IEC 60793-1-47 specifies bend loss at 1550/1625 nm). Applied to
// single-mode fibre, where the effect is the accepted signature.
function macrobend(ctx: GradingContext, site: Site) {
  if (ctx.multimode || site.kind === "splitter" || site.readings.length < 2) {
    if (site.kind === "bend" && site.readings.length < 2) reportUnconfirmedBend(ctx, site);
    return;
  }
  // Readings are in ascending wavelength order, so j > i is the longer wavelength.
  const rs = site.readings;
  let best: { short: number; long: number; diff: number; index: number } | undefined;
  for (let i = 0; i < rs.length; i++) {
    const li = siteLoss(rs[i]);
    if (li === undefined) continue;
    for (let j = i + 1; j < rs.length; j++) {
      const lj = siteLoss(rs[j]);
      if (lj === undefined) continue;
      const diff = lj - li;
      if (!best || diff > best.diff) best = { short: rs[i].wavelengthNm, long: rs[j].wavelengthNm, diff, index: rs[j].eventIndex };
    }
  }
  if (!best) return;
  const limit = ctx.limits.macrobendThresholdDb;
  const h = headroom(best.diff, limit.value, "max");
  const outcome = decide(h, ctx.limits.guardBands.otdr.value, ctx.rule);
  if (outcome === "pass") return;
  addReason(ctx, {
    code: "event.macrobend",
    severity: severityOf(outcome),
    wavelengthNm: best.long,
    eventIndex: best.index,
    positionM: round4(site.positionM),
    measured: round4(best.diff),
    limit: limit.value,
    unit: "dB",
    rule: "limits.macrobendThresholdDb",
    source: limit.source,
    message: `Event at ${fmt(site.positionM)} m loses ${fmt(best.diff)} dB more at ${best.long} nm than at ${best.short} nm: a macrobend (tight bend or pinch) is likely; inspect the routing there.`,
  });
}

function reportUnconfirmedBend(ctx: GradingContext, site: Site) {
  addReason(ctx, {
    code: "event.bend-unconfirmed",
    severity: "info",
    eventIndex: site.firstIndex,
    positionM: round4(site.positionM),
    rule: "limits.macrobendThresholdDb",
    source: ctx.limits.macrobendThresholdDb.source,
    message: `A bend was reported at ${fmt(site.positionM)} m at one wavelength only; test at two wavelengths to confirm it.`,
  });
}

function bothWays(r: SiteReading): string {
  return r.ab !== undefined && r.ba !== undefined ? " (bidirectional average)" : "";
}

function capitalise(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}
