// Zod schemas for the grading engine's input (a link test and a limit profile) and output (a graded
// result). The same schemas validate API requests, type the engine, drive console forms and feed the
// OpenAPI document, so every constraint here carries a message that names the field it guards.
import { z } from "zod";

// ---------------------------------------------------------------------------------------------------
// Vocabulary
// ---------------------------------------------------------------------------------------------------

export const MULTIMODE_FIBRES = ["OM1", "OM2", "OM3", "OM4", "OM5"] as const;
export const SINGLEMODE_FIBRES = ["OS1a", "OS2", "G.652.D", "G.657.A1", "G.657.A2", "G.657.B3"] as const;

export const FibreTypeSchema = z
  .enum([...MULTIMODE_FIBRES, ...SINGLEMODE_FIBRES])
  .describe("Fibre category: OM1..OM5 multimode (ISO/IEC 11801-1), OS1a/OS2 single-mode, or an ITU-T G.652/G.657 category");
export type FibreType = z.infer<typeof FibreTypeSchema>;

export function isMultimode(fibre: FibreType): boolean {
  return (MULTIMODE_FIBRES as readonly string[]).includes(fibre);
}

// Nominal test and service wavelengths a fibre family can carry. A wavelength outside this list is
// treated as a data-entry error rather than guessed at, because every limit is tabulated per wavelength.
// Multimode: 850 and 1300 nm test windows (IEC 61280-4-1); OM5 adds 953 nm, the upper SWDM wavelength
// of its specification (TIA-492AAAE, from memory). Single-mode: 1270 (XGS-PON up), 1310, 1383 (water
// peak), 1490 (G-PON down), 1550, 1577 (XGS-PON down), 1625 and 1650 (monitoring), per ITU-T G.984.5 /
// G.9807.1 / L.66 band plans (from memory).
export const MULTIMODE_WAVELENGTHS = [850, 1300] as const;
export const OM5_EXTRA_WAVELENGTHS = [953] as const;
export const SINGLEMODE_WAVELENGTHS = [1270, 1310, 1383, 1490, 1550, 1577, 1625, 1650] as const;

export function wavelengthsFor(fibre: FibreType): readonly number[] {
  if (fibre === "OM5") return [...MULTIMODE_WAVELENGTHS, ...OM5_EXTRA_WAVELENGTHS];
  return isMultimode(fibre) ? MULTIMODE_WAVELENGTHS : SINGLEMODE_WAVELENGTHS;
}

export const DirectionSchema = z.enum(["AB", "BA"]).describe("Test direction: AB launches at end A, BA at end B");
export const TestMethodSchema = z
  .enum(["one-cord", "two-cord", "three-cord", "otdr"])
  .describe("Reference method of the insertion-loss test (IEC 61280-4-1/-4-2), or otdr");
export type TestMethod = z.infer<typeof TestMethodSchema>;

export const EventKindSchema = z.enum([
  "connector",
  "splice",
  "splitter",
  "bend",
  "reflective",
  "non-reflective",
  "break",
  "end",
  "unknown",
]);
export type EventKind = z.infer<typeof EventKindSchema>;

export const PolishSchema = z.enum(["UPC", "APC"]);

/** "1x32", "2x16": M inputs by N outputs. */
export const SPLITTER_RATIO = /^([12])x([1-9][0-9]{0,2})$/;

const wavelength = z.number().int("wavelengthNm must be a whole number of nanometres").min(600).max(1700);

// ---------------------------------------------------------------------------------------------------
// Link test (input)
// ---------------------------------------------------------------------------------------------------

export const SplitterSchema = z.object({
  ratio: z
    .string()
    .regex(SPLITTER_RATIO, "ratio must look like 1xN or 2xN, e.g. 1x32")
    .refine((r) => {
      const n = Number(SPLITTER_RATIO.exec(r)?.[2] ?? 0);
      return n >= 2 && n <= 256;
    }, "ratio must split into 2 to 256 outputs"),
});

export const LinkSchema = z.object({
  ref: z.string().trim().min(1, "ref must not be empty").max(200),
  fibreType: FibreTypeSchema,
  designLengthM: z.number().min(0, "designLengthM must not be negative").max(200_000, "designLengthM must be at most 200 km").optional(),
  connectorPairs: z
    .number()
    .int("connectorPairs must be a whole number")
    .min(0, "connectorPairs must not be negative")
    .max(500)
    .optional()
    .describe("Mated connector pairs in the link including its two end connections (as a one-cord reference test sees them)"),
  splices: z.number().int("splices must be a whole number").min(0, "splices must not be negative").max(5000).optional(),
  splitters: z.array(SplitterSchema).max(8).optional(),
  polish: PolishSchema.optional().describe("End-face polish of the single-mode connectors; UPC when absent"),
  application: z.string().trim().min(1).max(64).optional().describe("Intended application, e.g. 10GBASE-SR"),
  ponClass: z.string().trim().min(1).max(16).optional().describe("PON ODN class, e.g. B+ or N1"),
});

export const MeasurementSchema = z.object({
  wavelengthNm: wavelength,
  direction: DirectionSchema.optional(),
  method: TestMethodSchema.optional().describe("one-cord when absent (the preferred method of TIA-568.3-D and IEC 61280-4-x)"),
  insertionLossDb: z
    .number()
    .min(-0.5, "insertionLossDb below -0.5 dB is not a physical loss: check the reference")
    .max(100, "insertionLossDb must be at most 100 dB")
    .optional(),
  orlDb: z
    .number()
    .min(0, "orlDb is a return loss and must not be negative")
    .max(100, "orlDb must be at most 100 dB")
    .optional(),
  lengthM: z.number().min(0, "lengthM must not be negative").max(200_000, "lengthM must be at most 200 km").optional(),
});

export const EventSchema = z.object({
  wavelengthNm: wavelength,
  direction: DirectionSchema.optional(),
  positionM: z
    .number()
    .min(0, "positionM must not be negative")
    .max(200_000, "positionM must be at most 200 km")
    .describe("Distance from end A, whatever the test direction"),
  kind: EventKindSchema,
  lossDb: z
    .number()
    .min(-5, "lossDb below -5 dB is not a physical gainer")
    .max(100, "lossDb must be at most 100 dB")
    .optional(),
  reflectanceDb: z
    .number()
    .max(0, "reflectanceDb must be at most 0 dB: a passive event cannot reflect more light than it receives")
    .min(-100, "reflectanceDb must be at least -100 dB")
    .optional(),
});

export const PowerReadingSchema = z.object({
  wavelengthNm: wavelength,
  dbm: z.number().min(-80, "dbm must be at least -80 dBm").max(30, "dbm must be at most +30 dBm"),
});

export const InspectionSchema = z.object({
  location: z.string().trim().min(1, "location must not be empty").max(200),
  result: z.enum(["pass", "fail"]).describe("End-face inspection outcome against IEC 61300-3-35"),
});

// An event may sit up to this far past the measured end before it counts as impossible: OTDR length
// accuracy is about 1 % (cable overlength, group index), with a floor for short links. Common practice.
export const END_SLACK_FRACTION = 0.01;
export const END_SLACK_MIN_M = 2;

export const LinkTestSchema = z
  .object({
    link: LinkSchema,
    measurements: z.array(MeasurementSchema).min(1, "measurements must hold at least one measurement").max(64),
    events: z.array(EventSchema).max(5000).optional(),
    powerReadings: z.array(PowerReadingSchema).max(64).optional(),
    inspections: z.array(InspectionSchema).max(500).optional(),
  })
  .superRefine((test, ctx) => {
    const allowed = wavelengthsFor(test.link.fibreType);
    const checkWavelength = (nm: number, path: (string | number)[]) => {
      if (!allowed.includes(nm)) {
        ctx.addIssue({
          code: "custom",
          path: [...path, "wavelengthNm"],
          message: `wavelengthNm ${nm} is not a known wavelength for ${test.link.fibreType} fibre (allowed: ${allowed.join(", ")})`,
        });
      }
    };
    test.measurements.forEach((m, i) => checkWavelength(m.wavelengthNm, ["measurements", i]));
    test.events?.forEach((e, i) => checkWavelength(e.wavelengthNm, ["events", i]));
    test.powerReadings?.forEach((p, i) => checkWavelength(p.wavelengthNm, ["powerReadings", i]));

    let endM = -1;
    for (const m of test.measurements) if (m.lengthM !== undefined) endM = Math.max(endM, m.lengthM);
    for (const e of test.events ?? []) if (e.kind === "end") endM = Math.max(endM, e.positionM);
    if (endM >= 0) {
      const limit = endM + Math.max(END_SLACK_MIN_M, endM * END_SLACK_FRACTION);
      test.events?.forEach((e, i) => {
        if (e.positionM > limit) {
          ctx.addIssue({
            code: "custom",
            path: ["events", i, "positionM"],
            message: `positionM ${e.positionM} m lies beyond the link end at ${endM} m`,
          });
        }
      });
    }
  });
export type LinkTest = z.infer<typeof LinkTestSchema>;
export type LinkEvent = z.infer<typeof EventSchema>;
export type Measurement = z.infer<typeof MeasurementSchema>;

// ---------------------------------------------------------------------------------------------------
// Limit profile
// ---------------------------------------------------------------------------------------------------

/** Where a limit comes from: standard and clause or table, 'common practice', or 'from memory'. */
const source = z.string().trim().min(1, "source must name where the limit comes from");

/** A number together with the source it comes from. */
function limitOf(min: number, max: number, unit: string) {
  return z.object({
    value: z
      .number()
      .min(min, `value must be at least ${min} ${unit}`)
      .max(max, `value must be at most ${max} ${unit}`),
    source,
  });
}
export const LimitSchema = z.object({ value: z.number(), source });
export type Limit = z.infer<typeof LimitSchema>;

const lossLimit = limitOf(0, 100, "dB");
const reflectanceLimit = limitOf(-100, 0, "dB");
const guardBand = limitOf(0, 5, "dB");

export const AttenuationRowSchema = z.object({
  fibreTypes: z.array(FibreTypeSchema).min(1, "fibreTypes must list at least one fibre type"),
  wavelengthNm: wavelength,
  maxDbPerKm: z.number().min(0, "maxDbPerKm must not be negative").max(10, "maxDbPerKm must be at most 10 dB/km"),
  source,
});

export const ApplicationLimitSchema = z.object({
  application: z.string().trim().min(1, "application must not be empty").max(64),
  fibreTypes: z.array(FibreTypeSchema).min(1, "fibreTypes must list at least one fibre type"),
  wavelengthNm: wavelength,
  maxChannelLossDb: lossLimit,
  maxReachM: limitOf(0, 200_000, "m"),
  minReachM: limitOf(0, 200_000, "m").optional(),
});

export const ReceiverWindowSchema = z.object({
  wavelengthNm: wavelength,
  receiver: z.string().trim().min(1).max(32).describe("Which receiver, e.g. ONU or OLT"),
  minDbm: limitOf(-80, 30, "dBm"),
  maxDbm: limitOf(-80, 30, "dBm"),
});

export const PonClassLimitSchema = z
  .object({
    ponClass: z.string().trim().min(1, "ponClass must not be empty").max(16),
    family: z.string().trim().min(1).max(32).describe("e.g. G-PON or XGS-PON"),
    minLossDb: lossLimit,
    maxLossDb: lossLimit,
    receiverWindows: z.array(ReceiverWindowSchema).max(8),
  })
  .superRefine((row, ctx) => {
    if (row.minLossDb.value > row.maxLossDb.value) {
      ctx.addIssue({ code: "custom", path: ["minLossDb", "value"], message: "minLossDb must not exceed maxLossDb" });
    }
    row.receiverWindows.forEach((w, i) => {
      if (w.minDbm.value > w.maxDbm.value) {
        ctx.addIssue({ code: "custom", path: ["receiverWindows", i, "minDbm", "value"], message: "minDbm must not exceed maxDbm" });
      }
    });
  });

export const DecisionRuleSchema = z
  .object({ value: z.enum(["simple", "guarded"]), source })
  .describe("simple: pass up to the limit, marginal inside the guard band below it; guarded: marginal within the guard band on either side");

export const LimitsSchema = z.object({
  decisionRule: DecisionRuleSchema,
  attenuation: z.array(AttenuationRowSchema).min(1, "attenuation must hold at least one row"),
  connectorLossDb: limitOf(0, 5, "dB").describe("Allowance per mated connector pair, also the per-event connector loss limit"),
  endConnectionLossDb: z
    .object({ multimode: limitOf(0, 5, "dB"), singlemode: limitOf(0, 5, "dB") })
    .optional()
    .describe("Allowance for the end connections to reference-grade test cords, when it differs from connectorLossDb"),
  spliceLossDb: limitOf(0, 5, "dB").describe("Allowance per splice, also the per-event limit for non-reflective events"),
  splitterExcessLossDbPerStage: limitOf(0, 3, "dB").describe("Allowed loss above the ideal 10*log10(N) per 1x2 stage"),
  designMarginDb: limitOf(-20, 20, "dB").describe("Added to the loss budget; negative to demand headroom"),
  reflectanceMaxDb: z.object({ multimode: reflectanceLimit, upc: reflectanceLimit, apc: reflectanceLimit }),
  spliceReflectanceMaxDb: z.object({ multimode: reflectanceLimit, singlemode: reflectanceLimit }).optional(),
  orlMinDb: z.object({ multimode: lossLimit.optional(), singlemode: lossLimit.optional() }),
  orlConsistency: z.object({
    toleranceDb: limitOf(0, 20, "dB"),
    backscatterReturnLossDb: z.object({ multimode: limitOf(10, 60, "dB"), singlemode: limitOf(10, 60, "dB") }),
  }),
  lengthTolerance: z.object({ percent: limitOf(0, 100, "%"), minimumM: limitOf(0, 1000, "m") }),
  eventPositionToleranceM: limitOf(0, 100, "m"),
  macrobendThresholdDb: limitOf(0, 10, "dB"),
  guardBands: z.object({
    "one-cord": guardBand,
    "two-cord": guardBand,
    "three-cord": guardBand,
    otdr: guardBand,
    orl: guardBand,
    power: guardBand,
    lengthPercent: limitOf(0, 20, "%"),
  }),
  applications: z.array(ApplicationLimitSchema).max(200),
  ponClasses: z.array(PonClassLimitSchema).max(32),
  defaultPonClass: z.string().trim().min(1).max(16).optional(),
});
export type Limits = z.infer<typeof LimitsSchema>;

export const ProfileSchema = z.object({
  slug: z
    .string()
    .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, "slug must be lower-case words joined by hyphens")
    .max(80),
  version: z.number().int("version must be a whole number").min(1, "version must be at least 1"),
  name: z.string().trim().min(1, "name must not be empty").max(120),
  description: z.string().max(2000).optional(),
  limits: LimitsSchema,
});
export type Profile = z.infer<typeof ProfileSchema>;

// ---------------------------------------------------------------------------------------------------
// Graded result (output)
// ---------------------------------------------------------------------------------------------------

export const VerdictSchema = z.enum(["pass", "marginal", "fail"]);
export type Verdict = z.infer<typeof VerdictSchema>;
export const SeveritySchema = z.enum(["info", "marginal", "fail"]);
export type Severity = z.infer<typeof SeveritySchema>;

export const BudgetBreakdownSchema = z.object({
  lengthM: z.number().describe("Length used for the fibre attenuation term"),
  lengthBasis: z.enum(["measured", "design", "events", "none"]),
  fibreDb: z.number(),
  connectorPairs: z.number().int(),
  connectorsDb: z.number(),
  splices: z.number().int(),
  splicesDb: z.number(),
  splittersDb: z.number(),
  marginDb: z.number(),
  countsFrom: z.enum(["declaration", "events"]),
});

export const WavelengthResultSchema = z.object({
  wavelengthNm: z.number().int(),
  budgetDb: z.number().describe("The tighter of the loss budget and any application or PON class maximum"),
  measuredDb: z.number().describe("Worst insertion loss measured at this wavelength"),
  headroomDb: z.number().describe("budgetDb - measuredDb; negative when over budget"),
  verdict: VerdictSchema,
  limitBasis: z.enum(["loss-budget", "application", "pon-class"]),
  lossBudgetDb: z
    .number()
    .nullable()
    .describe("The loss budget computed from the link's components; null when the profile has no attenuation limit for this fibre and wavelength"),
  direction: DirectionSchema.optional(),
  method: TestMethodSchema,
  guardBandDb: z.number(),
  budget: BudgetBreakdownSchema,
});
export type WavelengthResult = z.infer<typeof WavelengthResultSchema>;

export const ReasonSchema = z.object({
  code: z.string().describe("Stable machine code, e.g. loss.over-budget"),
  severity: SeveritySchema,
  wavelengthNm: z.number().int().optional(),
  eventIndex: z.number().int().optional().describe("Index into the submitted events array"),
  positionM: z.number().optional(),
  measured: z.number().optional(),
  limit: z.number().optional(),
  unit: z.string().optional(),
  rule: z.string().describe("Path of the rule's limit in the profile, e.g. limits.connectorLossDb"),
  source: z.string().describe("Published source of the limit"),
  message: z.string(),
});
export type Reason = z.infer<typeof ReasonSchema>;

export const GradingResultSchema = z.object({
  verdict: VerdictSchema,
  headroomDb: z.number().nullable().describe("Worst loss-budget headroom over all wavelengths; null when no insertion loss was measured"),
  wavelengths: z.array(WavelengthResultSchema),
  reasons: z.array(ReasonSchema),
  engineVersion: z.string(),
  profile: z.object({ slug: z.string(), version: z.number().int() }),
});
export type GradingResult = z.infer<typeof GradingResultSchema>;
