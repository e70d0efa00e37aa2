// Loss budget of the link at one wavelength:
//   fibre attenuation x length + connector pairs x allowance + splices x allowance
//   + splitters (ideal 10*log10(N) + excess allowance) + the profile's design margin
// (TIA-568.3-D / ISO/IEC 14763-3 link-loss formula, from memory; see docs/grading.md).
import { attenuationFor, type GradingContext } from "./context";
import { round4 } from "./decide";
import { SPLITTER_RATIO, type Limit, type Limits, type TestMethod } from "./schema";
import { isConnectorLike, type Site } from "./sites";

export interface Counts {
  connectorPairs: number;
  splices: number;
  /** Split ratios in position order (declared, or left empty when only events hint at splitters). */
  splitterOutputs: number[];
  countsFrom: "declaration" | "events";
  undeclaredSplitterSites: number;
}

export function countComponents(ctx: GradingContext, sites: readonly Site[]): Counts {
  const link = ctx.test.link;
  let connectorSites = 0;
  let spliceSites = 0;
  let splitterSites = 0;
  for (const s of sites) {
    if (s.kind === "splitter") splitterSites++;
    else if (isConnectorLike(s)) connectorSites++;
    else if (s.kind === "splice" || s.kind === "non-reflective") spliceSites++;
  }
  const declaredSplitters = link.splitters?.map((s) => splitterOutputs(s.ratio));
  return {
    connectorPairs: link.connectorPairs ?? connectorSites,
    splices: link.splices ?? spliceSites,
    splitterOutputs: declaredSplitters ?? [],
    countsFrom: link.connectorPairs !== undefined && link.splices !== undefined ? "declaration" : "events",
    undeclaredSplitterSites: declaredSplitters ? 0 : splitterSites,
  };
}

export function splitterOutputs(ratio: string): number {
  return Number(SPLITTER_RATIO.exec(ratio)?.[2] ?? 0);
}

/** Ideal loss of an equal 1xN split: 10*log10(N) (lossless power division; computed). */
export function idealSplitLossDb(outputs: number): number {
  return 10 * Math.log10(outputs);
}

/** Number of 1x2 stages an N-way split amounts to; the excess allowance is charged per stage. */
export function splitStages(outputs: number): number {
  return Math.log2(outputs);
}

// How many of the link's two end connections are inside the measured loss for each reference method
// (IEC 61280-4-1/-4-2: one-cord includes both, two-cord one, three-cord none; an OTDR with launch and
// receive cords sees both). Partly seen / from memory; see docs/grading.md.
export const END_CONNECTIONS_IN_RESULT: Record<TestMethod, number> = {
  "one-cord": 2,
  "two-cord": 1,
  "three-cord": 0,
  otdr: 2,
};

export interface LossBudget {
  totalDb: number;
  lengthM: number;
  lengthBasis: "measured" | "design" | "events" | "none";
  fibreDb: number;
  connectorPairs: number;
  connectorsDb: number;
  splices: number;
  splicesDb: number;
  splittersDb: number;
  marginDb: number;
  countsFrom: "declaration" | "events";
  rule: string;
  source: string;
}

export interface LengthChoice {
  lengthM: number;
  basis: "measured" | "design" | "events" | "none";
}

export function lossBudget(
  ctx: GradingContext,
  counts: Counts,
  wavelengthNm: number,
  method: TestMethod,
  length: LengthChoice,
): LossBudget | undefined {
  const { limits } = ctx;
  const att = attenuationFor(limits, ctx.fibre, wavelengthNm);
  if (!att) return undefined;

  const ends = END_CONNECTIONS_IN_RESULT[method];
  const pairs = Math.max(0, counts.connectorPairs - (2 - ends));
  const endLimit: Limit | undefined = limits.endConnectionLossDb
    ? ctx.multimode
      ? limits.endConnectionLossDb.multimode
      : limits.endConnectionLossDb.singlemode
    : undefined;
  const endPairs = endLimit ? Math.min(ends, pairs) : 0;
  const connectorsDb = endPairs * (endLimit?.value ?? 0) + (pairs - endPairs) * limits.connectorLossDb.value;

  let splittersDb = 0;
  for (const n of counts.splitterOutputs) {
    splittersDb += idealSplitLossDb(n) + splitStages(n) * limits.splitterExcessLossDbPerStage.value;
  }

  const fibreDb = (att.value * length.lengthM) / 1000;
  const splicesDb = counts.splices * limits.spliceLossDb.value;
  const marginDb = limits.designMarginDb.value;

  const cited = citation(limits, att.index, endPairs > 0 ? endLimit : undefined, counts.splitterOutputs.length > 0, marginDb !== 0);

  return {
    totalDb: round4(fibreDb + connectorsDb + splicesDb + splittersDb + marginDb),
    lengthM: round4(length.lengthM),
    lengthBasis: length.basis,
    fibreDb: round4(fibreDb),
    connectorPairs: pairs,
    connectorsDb: round4(connectorsDb),
    splices: counts.splices,
    splicesDb: round4(splicesDb),
    splittersDb: round4(splittersDb),
    marginDb: round4(marginDb),
    countsFrom: counts.countsFrom,
    rule: cited.rule,
    source: cited.source,
  };
}

// The rule path and sources of a budget depend only on which terms it uses; they are joined once per
// profile and kept, since every graded wavelength needs them.
const citations = new WeakMap<Limits, Map<string, { rule: string; source: string }>>();

function citation(limits: Limits, attIndex: number, endLimit: Limit | undefined, splitters: boolean, margin: boolean) {
  let byKey = citations.get(limits);
  if (!byKey) {
    byKey = new Map();
    citations.set(limits, byKey);
  }
  const key = `${attIndex}|${endLimit ? (endLimit === limits.endConnectionLossDb?.multimode ? "m" : "s") : ""}|${splitters ? 1 : 0}|${margin ? 1 : 0}`;
  let hit = byKey.get(key);
  if (!hit) {
    const rules = [`limits.attenuation[${attIndex}]`, "limits.connectorLossDb", "limits.spliceLossDb"];
    const sources = [limits.attenuation[attIndex].source, limits.connectorLossDb.source, limits.spliceLossDb.source];
    if (endLimit) {
      rules.push("limits.endConnectionLossDb");
      sources.push(endLimit.source);
    }
    if (splitters) {
      rules.push("limits.splitterExcessLossDbPerStage");
      sources.push(limits.splitterExcessLossDbPerStage.source);
    }
    if (margin) {
      rules.push("limits.designMarginDb");
      sources.push(limits.designMarginDb.source);
    }
    hit = { rule: rules.join(" + "), source: [...new Set(sources)].join("; ") };
    byKey.set(key, hit);
  }
  return hit;
}
