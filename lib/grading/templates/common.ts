// Limits shared by several templates: the decision rule, guard bands, tolerances and the IEEE 802.3
// application table. Every value names its source; 'from memory' marks figures whose standard text
// was not at hand when they were entered (see docs/grading.md).
import type { Limits } from "../schema";

export const SIMPLE_RULE: Limits["decisionRule"] = {
  value: "simple",
  source: "ILAC-G8:2019 simple acceptance (the measured value is compared with the limit itself), from memory",
};

export const GUARD_BANDS: Limits["guardBands"] = {
  "one-cord": {
    value: 0.2,
    source: "IEC 61280-4-1/-4-2 uncertainty annex, about 0.1-0.2 dB for a one-cord reference with reference-grade cords; from memory (low confidence)",
  },
  "two-cord": { value: 0.25, source: "common practice (a two-cord reference adds one uncertain connection)" },
  "three-cord": { value: 0.3, source: "common practice (a three-cord reference adds two uncertain connections)" },
  otdr: { value: 0.1, source: "common practice (OTDR event-loss and reflectance reading uncertainty)" },
  orl: { value: 1, source: "common practice (ORL meter and OTDR ORL reading uncertainty)" },
  power: { value: 0.5, source: "common practice (field power-meter calibration and connection uncertainty)" },
  lengthPercent: { value: 1, source: "OTDR length accuracy about 1 % (group index, cable helix); from memory" },
};

export const LENGTH_TOLERANCE: Limits["lengthTolerance"] = {
  percent: { value: 5, source: "common practice (as-built records against measured optical length)" },
  minimumM: { value: 5, source: "common practice (OTDR event dead zone and record rounding)" },
};

export const EVENT_POSITION_TOLERANCE: Limits["eventPositionToleranceM"] = {
  value: 5,
  source: "common practice (event positions from the two ends agree to within a few metres)",
};

export const MACROBEND_THRESHOLD: Limits["macrobendThresholdDb"] = {
  value: 0.3,
  source: "common practice (bend loss rises with wavelength while splice loss barely changes; IEC 60793-1-47 measures bend loss at 1550/1625 nm)",
};

export const ORL_CONSISTENCY: Limits["orlConsistency"] = {
  toleranceDb: { value: 3, source: "common practice" },
  backscatterReturnLossDb: {
    multimode: {
      value: 29,
      source: "computed from a backscatter coefficient of about -68 dB (1 ns) at 850 nm for 50 um fibre; from memory (low confidence)",
    },
    singlemode: {
      value: 31,
      source: "computed from a backscatter coefficient of about -79 dB (1 ns) at 1310 nm for G.652 fibre; about 31-34 dB from memory",
    },
  },
};

export const NO_MARGIN: Limits["designMarginDb"] = {
  value: 0,
  source: "common practice (acceptance limits of the cabling standards carry no design margin)",
};

export const SPLITTER_EXCESS: Limits["splitterExcessLossDbPerStage"] = {
  value: 0.5,
  source:
    "common practice: about 0.5 dB per 1x2 stage matches the upper end of typical PLC splitter design ranges (1x32 about 17.5 dB), seen in a secondary source",
};

const TIA_CONNECTOR = "ANSI/TIA-568.3-D connecting hardware: 0.75 dB per mated pair (partly seen in a secondary source quoting TIA-568)";
const TIA_SPLICE = "ANSI/TIA-568.3-D splice requirement: 0.3 dB (from memory)";

export const TIA_CONNECTOR_LOSS: Limits["connectorLossDb"] = { value: 0.75, source: TIA_CONNECTOR };
export const TIA_SPLICE_LOSS: Limits["spliceLossDb"] = { value: 0.3, source: TIA_SPLICE };

export const TIA_REFLECTANCE: Limits["reflectanceMaxDb"] = {
  multimode: { value: -20, source: "ANSI/TIA-568.3-D connector return loss at least 20 dB, multimode (from memory)" },
  upc: { value: -35, source: "ANSI/TIA-568.3-D connector return loss at least 35 dB, single-mode (from memory)" },
  apc: { value: -55, source: "ANSI/TIA-568.3-D connector return loss at least 55 dB, single-mode APC / analog video (from memory)" },
};

export const TIA_SPLICE_REFLECTANCE: NonNullable<Limits["spliceReflectanceMaxDb"]> = {
  multimode: { value: -20, source: "ANSI/TIA-568.3-D splice return loss at least 20 dB, multimode (from memory)" },
  singlemode: { value: -35, source: "ANSI/TIA-568.3-D splice return loss at least 35 dB, single-mode (from memory)" },
};

/** The limits every template shares: decision rule, guard bands, tolerances and the consistency model. */
export const SHARED_LIMITS = {
  decisionRule: SIMPLE_RULE,
  splitterExcessLossDbPerStage: SPLITTER_EXCESS,
  designMarginDb: NO_MARGIN,
  orlConsistency: ORL_CONSISTENCY,
  lengthTolerance: LENGTH_TOLERANCE,
  eventPositionToleranceM: EVENT_POSITION_TOLERANCE,
  macrobendThresholdDb: MACROBEND_THRESHOLD,
  guardBands: GUARD_BANDS,
} satisfies Partial<Limits>;

const MM = ["OM1", "OM2", "OM3", "OM4", "OM5"] as const;
const OM3_UP = ["OM3", "OM4", "OM5"] as const;
const OM4_UP = ["OM4", "OM5"] as const;
const SM = ["OS1a", "OS2", "G.652.D", "G.657.A1", "G.657.A2", "G.657.B3"] as const;

type AppRow = Limits["applications"][number];
function app(application: string, fibreTypes: readonly AppRow["fibreTypes"][number][], wavelengthNm: number, lossDb: number, lossSource: string, reachM: number, reachSource: string, minReachM?: number): AppRow {
  const row: AppRow = {
    application,
    fibreTypes: [...fibreTypes],
    wavelengthNm,
    maxChannelLossDb: { value: lossDb, source: lossSource },
    maxReachM: { value: reachM, source: reachSource },
  };
  if (minReachM !== undefined) row.minReachM = { value: minReachM, source: reachSource };
  return row;
}

// IEEE 802.3 channel insertion loss and reach per application and fibre type (reference-values §4).
export const IEEE_APPLICATIONS: AppRow[] = [
  app("1000BASE-SX", ["OM1"], 850, 2.53, "IEEE 802.3 Table 38-6, 62.5 um 200 MHz.km (from memory)", 275, "IEEE 802.3 Table 38-2 (from memory)"),
  app("1000BASE-SX", ["OM2", ...OM3_UP], 850, 3.43, "IEEE 802.3 Table 38-6, 50 um 500 MHz.km (from memory); OM3-OM5 meet that row's bandwidth (common practice)", 550, "IEEE 802.3 Table 38-2, 550 m on 50 um 500 MHz.km (seen in a secondary source)"),
  app("1000BASE-LX", MM, 1300, 2.35, "IEEE 802.3 Table 38-10, multimode with mode-conditioning cord (from memory)", 550, "IEEE 802.3 Table 38-10 (from memory)"),
  app("1000BASE-LX", SM, 1310, 4.56, "IEEE 802.3 Table 38-10, single-mode (from memory)", 5000, "IEEE 802.3 Table 38-10 (from memory)"),
  app("10GBASE-SR", ["OM1"], 850, 1.6, "IEEE 802.3 Clause 52, 62.5 um 200 MHz.km, 1.6 dB (from memory, low confidence; an appliance installation guide lists 1.5 dB / 33 m on OM1, seen)", 33, "IEEE 802.3 Clause 52, 33 m on OM1 (from memory; the same 33 m seen in an appliance installation guide)"),
  app("10GBASE-SR", ["OM2"], 850, 1.8, "IEEE 802.3 Clause 52, 50 um 500 MHz.km (from memory, low confidence)", 82, "IEEE 802.3 Clause 52 (from memory, low confidence)"),
  app("10GBASE-SR", ["OM3"], 850, 2.6, "IEEE 802.3 Clause 52 (from memory)", 300, "IEEE 802.3 Clause 52, 300 m on OM3 (seen, Ethernet Alliance)"),
  app("10GBASE-SR", OM4_UP, 850, 2.9, "IEEE 802.3 Clause 52, 2.9 dB on OM4 (seen in a secondary source)", 400, "IEEE 802.3-2012 Clause 52, 400 m on OM4 (seen, Ethernet Alliance)"),
  app("10GBASE-LR", SM, 1310, 6.2, "IEEE 802.3 Clause 52, 6.2 dB (from memory; 2 dB connection allocation seen in an IEEE 802.3 list message)", 10000, "IEEE 802.3 Clause 52 (from memory)"),
  app("25GBASE-SR", ["OM3"], 850, 1.8, "IEEE 802.3 Clause 112 (from memory)", 70, "IEEE 802.3 Clause 112 (from memory)"),
  app("25GBASE-SR", OM4_UP, 850, 1.9, "IEEE 802.3 Clause 112, 1.9 dB on OM4 (seen in a secondary source)", 100, "IEEE 802.3 Clause 112, 100 m on OM4 (seen in a secondary source)"),
  app("40GBASE-SR4", ["OM3"], 850, 1.9, "IEEE 802.3 Clause 86 (from memory)", 100, "IEEE 802.3 Clause 86, 100 m on OM3 (seen, Ethernet Alliance)"),
  app("40GBASE-SR4", OM4_UP, 850, 1.5, "IEEE 802.3 Clause 86, 1.5 dB on OM4 with 1.0 dB connection allocation (seen in a secondary source)", 150, "IEEE 802.3 Clause 86, 150 m on OM4 (seen, Ethernet Alliance)"),
  app("100GBASE-SR4", ["OM3"], 850, 1.8, "IEEE 802.3 Clause 95 (from memory)", 70, "IEEE 802.3 Clause 95 (from memory)"),
  app("100GBASE-SR4", OM4_UP, 850, 1.9, "IEEE 802.3 Clause 95 (from memory)", 100, "IEEE 802.3 Clause 95 (from memory)"),
  app("100GBASE-LR4", SM, 1310, 6.3, "IEEE 802.3 Clause 88 (from memory)", 10000, "IEEE 802.3 Clause 88 (from memory)"),
  app("400GBASE-SR8", ["OM3"], 850, 1.8, "IEEE 802.3 Clause 138, 1.8 dB on OM3 (seen, TIA FOTC summary)", 70, "IEEE 802.3 Clause 138, 0.5-70 m on OM3 (seen, TIA FOTC summary)", 0.5),
  app("400GBASE-SR8", OM4_UP, 850, 1.9, "IEEE 802.3 Clause 138, 1.9 dB on OM4/OM5 (seen, TIA FOTC summary)", 100, "IEEE 802.3 Clause 138, 0.5-100 m on OM4/OM5 (seen, TIA FOTC summary)", 0.5),
  app("400GBASE-DR4", SM, 1310, 3.0, "IEEE 802.3 Clause 124 (from memory)", 500, "IEEE 802.3 Clause 124, 500 m (from memory, corroborated in a secondary source)"),
];

export const MULTIMODE_FIBRES = MM;
export const SINGLEMODE_FIBRES = SM;
