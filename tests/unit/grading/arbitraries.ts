// fast-check generators of valid link tests and limit profiles for the property tests.
import fc from "fast-check";
import {
  LinkTestSchema,
  templates,
  wavelengthsFor,
  FibreTypeSchema,
  type FibreType,
  type LinkTest,
  type Profile,
} from "@/lib/grading";

const EVENT_KINDS = ["connector", "splice", "splitter", "bend", "reflective", "non-reflective", "unknown"] as const;
const APPLICATIONS = ["10GBASE-SR", "10GBASE-LR", "1000BASE-SX", "400GBASE-SR8", "100GBASE-LR4", "FOO-BAR", undefined];
const PON_CLASSES = ["B+", "C+", "N1", "E2", "Z9", undefined];
const METHODS = ["one-cord", "two-cord", "three-cord", "otdr", undefined] as const;

// Hundredths from integers: fc.double leans hard towards its bounds and special values, which would
// leave the interesting middle (values near a limit) under-sampled.
const dB = (min: number, max: number) => fc.integer({ min: Math.round(min * 100), max: Math.round(max * 100) }).map((x) => x / 100);
const ratio = (min: number, max: number) => fc.integer({ min: Math.round(min * 1000), max: Math.round(max * 1000) }).map((x) => x / 1000);

export interface TestOptions {
  /** Leave out PON classes: their minimum loss makes more loss better, by design. */
  withPon?: boolean;
  /** Leave out the events' "break" and "end" kinds. */
  minLength?: number;
}

/**
 * A valid link test. Events come in sites: each site has one position and readings at every tested
 * wavelength (from one or both ends), sites at least 20 m apart, so the engine groups them as built.
 */
export function arbLinkTest(opts: TestOptions = {}): fc.Arbitrary<LinkTest> {
  return fc
    .record({
      fibreType: fc.constantFrom(...(FibreTypeSchema.options as readonly FibreType[])),
      lengthM: fc.oneof(
        { arbitrary: fc.constant(0), weight: 1 },
        { arbitrary: fc.integer({ min: opts.minLength ?? 1, max: 2_000 }), weight: 4 },
        { arbitrary: fc.integer({ min: 2_000, max: 60_000 }), weight: 2 },
      ),
      // Design length as a ratio of the measured one: usually close, sometimes far off or absent.
      design: fc.option(fc.oneof({ arbitrary: ratio(0.97, 1.03), weight: 4 }, { arbitrary: ratio(0, 2), weight: 1 }), { nil: undefined }),
      connectorPairs: fc.option(fc.integer({ min: 0, max: 8 }), { nil: undefined }),
      splices: fc.option(fc.integer({ min: 0, max: 20 }), { nil: undefined }),
      splitter: fc.option(fc.constantFrom("1x8", "1x16", "1x32", "2x32", "1x64"), { nil: undefined }),
      polish: fc.option(fc.constantFrom("UPC" as const, "APC" as const), { nil: undefined }),
      application: fc.oneof({ arbitrary: fc.constant(undefined), weight: 3 }, { arbitrary: fc.constantFrom(...APPLICATIONS), weight: 1 }),
      ponClass: opts.withPon ? fc.oneof({ arbitrary: fc.constant(undefined), weight: 2 }, { arbitrary: fc.constantFrom(...PON_CLASSES), weight: 1 }) : fc.constant(undefined),
      method: fc.constantFrom(...METHODS),
      wavelengthPick: fc.array(fc.boolean(), { minLength: 3, maxLength: 3 }),
      exoticWavelength: fc.oneof({ arbitrary: fc.constant(false), weight: 9 }, { arbitrary: fc.constant(true), weight: 1 }),
      bothWays: fc.boolean(),
      // Insertion loss per wavelength as a ratio of a rough expectation, so that verdicts spread.
      ilRatio: fc.array(fc.oneof({ arbitrary: ratio(0.3, 1.2), weight: 5 }, { arbitrary: ratio(-0.1, 4), weight: 1 }), { minLength: 3, maxLength: 3 }),
      orl: fc.array(fc.option(dB(25, 60), { nil: undefined }), { minLength: 3, maxLength: 3 }),
      sites: fc.array(
        fc.record({
          slot: fc.integer({ min: 0, max: 1000 }),
          kind: fc.constantFrom(...EVENT_KINDS),
          loss: fc.array(fc.option(fc.oneof({ arbitrary: dB(0, 0.4), weight: 5 }, { arbitrary: dB(-0.3, 3), weight: 1 }), { nil: undefined }), { minLength: 3, maxLength: 3 }),
          refl: fc.array(fc.option(fc.oneof({ arbitrary: dB(-75, -40), weight: 5 }, { arbitrary: dB(-80, -10), weight: 1 }), { nil: undefined }), { minLength: 3, maxLength: 3 }),
        }),
        { maxLength: 6 },
      ),
      power: fc.array(dB(-40, 5), { maxLength: 2 }),
      inspections: fc.array(fc.oneof({ arbitrary: fc.constant("pass" as const), weight: 15 }, { arbitrary: fc.constant("fail" as const), weight: 1 }), { maxLength: 3 }),
    })
    .map((g) => {
      const allowed = wavelengthsFor(g.fibreType);
      const usual = allowed.includes(1550) ? [1310, 1550] : allowed.includes(953) ? [850, 953, 1300] : [850, 1300];
      const picked = usual.filter((_, i) => g.wavelengthPick[i]);
      const nms = g.exoticWavelength ? [allowed[allowed.length - 1]] : picked.length > 0 ? picked : [usual[0]];
      const expected = (i: number) => (g.lengthM / 1000) * (nms[i] < 1000 ? 3 : 0.4) + 0.75 * (g.connectorPairs ?? 2) + 0.3 * (g.splices ?? 0) + (g.splitter ? 17 : 0);
      const dirs = g.bothWays ? (["AB", "BA"] as const) : (["AB"] as const);
      const measurements = nms.flatMap((nm, i) =>
        dirs.map((direction) => ({
          wavelengthNm: nm,
          direction,
          method: g.method,
          insertionLossDb: Math.round(Math.max(-0.3, Math.min(99, expected(i) * g.ilRatio[i])) * 100) / 100,
          orlDb: g.orl[i],
          lengthM: g.lengthM,
        })),
      );
      const usedSlots = new Set<number>();
      const events = g.sites.flatMap((s) => {
        // Slots 20 m apart (scaled to the length) keep sites separate; duplicates collapse.
        const pos = g.lengthM === 0 ? 0 : Math.round(((s.slot * g.lengthM) / 1000) / 20) * 20;
        if (usedSlots.has(pos) || pos > g.lengthM) return [];
        usedSlots.add(pos);
        return nms.flatMap((nm, i) =>
          dirs.map((direction) => ({
            wavelengthNm: nm,
            direction,
            positionM: pos,
            kind: s.kind,
            lossDb: s.kind === "splitter" ? (s.loss[i] === undefined ? undefined : s.loss[i]! + 15) : s.loss[i],
            reflectanceDb: s.refl[i],
          })),
        );
      });
      const test = {
        link: {
          ref: "prop",
          fibreType: g.fibreType,
          designLengthM: g.design === undefined ? undefined : Math.round(g.lengthM * g.design),
          connectorPairs: g.connectorPairs,
          splices: g.splices,
          splitters: g.splitter ? [{ ratio: g.splitter }] : undefined,
          polish: g.polish,
          application: g.application,
          ponClass: g.ponClass,
        },
        measurements,
        events,
        powerReadings: g.power.map((dbm, i) => ({ wavelengthNm: nms[i % nms.length], dbm })),
        inspections: g.inspections.map((result, i) => ({ location: `port ${i}`, result })),
      };
      return LinkTestSchema.parse(test);
    });
}

/** A built-in template, half the time switched to the guarded decision rule. */
export const arbTemplate = (withPon = true): fc.Arbitrary<Profile> =>
  fc
    .tuple(fc.constantFrom(...templates.filter((t) => withPon || t.limits.ponClasses.length === 0)), fc.boolean())
    .map(([t, guarded]) => {
      if (!guarded) return t;
      const g = structuredClone(t) as Profile;
      g.limits.decisionRule = { value: "guarded", source: "property test" };
      return g;
    });

/** Scale every limit of a profile in the strict direction by a factor in [0, 1]. */
export function tighten(p: Profile, f: number, dBStep: number): Profile {
  const q = structuredClone(p) as Profile;
  const L = q.limits;
  const down = (x: { value: number }) => (x.value = x.value * f);
  for (const row of L.attenuation) row.maxDbPerKm *= f;
  down(L.connectorLossDb);
  if (L.endConnectionLossDb) {
    down(L.endConnectionLossDb.multimode);
    down(L.endConnectionLossDb.singlemode);
  }
  down(L.spliceLossDb);
  down(L.splitterExcessLossDbPerStage);
  L.designMarginDb.value -= dBStep;
  for (const k of ["multimode", "upc", "apc"] as const) L.reflectanceMaxDb[k].value -= dBStep;
  if (L.spliceReflectanceMaxDb) {
    L.spliceReflectanceMaxDb.multimode.value -= dBStep;
    L.spliceReflectanceMaxDb.singlemode.value -= dBStep;
  }
  if (L.orlMinDb.multimode) L.orlMinDb.multimode.value += dBStep;
  if (L.orlMinDb.singlemode) L.orlMinDb.singlemode.value += dBStep;
  down(L.lengthTolerance.percent);
  down(L.lengthTolerance.minimumM);
  down(L.macrobendThresholdDb);
  for (const a of L.applications) {
    down(a.maxChannelLossDb);
    down(a.maxReachM);
    if (a.minReachM) a.minReachM.value += dBStep;
  }
  // Ranges shrink from both sides by at most half their width, so they never cross over.
  for (const c of L.ponClasses) {
    const s = Math.min(dBStep, (c.maxLossDb.value - c.minLossDb.value) / 2);
    c.maxLossDb.value -= s;
    c.minLossDb.value += s;
    for (const w of c.receiverWindows) {
      const sw = Math.min(dBStep, (w.maxDbm.value - w.minDbm.value) / 2);
      w.minDbm.value += sw;
      w.maxDbm.value -= sw;
    }
  }
  return q;
}
