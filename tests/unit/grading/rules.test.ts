// Each rule of the engine on small hand-made links, and the edge cases: zero-length patch links,
// gainers, one direction only, missing ORL, unknown application. Limits come from the templates
// (sources in lib/grading/templates) unless a test sets its own.
import { describe, expect, it } from "vitest";
import { grade, type GradingResult, type LinkTest } from "@/lib/grading";
import { decide } from "@/lib/grading/decide";
import { limit, linkTest, problems, profileFrom, template } from "./helpers";

const OSP = template("tia-568-3-d-singlemode-osp");
const MM = template("tia-568-3-d-multimode");
const GPON = template("itu-t-g984-2-gpon");
const IEEE = template("ieee-802-3-applications");
const codes = (r: GradingResult) => r.reasons.map((x) => x.code);
const reason = (r: GradingResult, code: string) => r.reasons.find((x) => x.code === code);

function osp(extra: Omit<Partial<LinkTest>, "link"> & { link?: Partial<LinkTest["link"]> } = {}): LinkTest {
  return linkTest({
    ...extra,
    link: { ref: "R", fibreType: "OS2", connectorPairs: 2, splices: 2, ...extra.link },
    measurements: extra.measurements ?? [
      { wavelengthNm: 1310, insertionLossDb: 1.5, lengthM: 2000 },
      { wavelengthNm: 1550, insertionLossDb: 1.4, lengthM: 2000 },
    ],
  });
}

describe("decision rule (ILAC-G8 simple and guarded acceptance, as documented in docs/grading.md)", () => {
  it("simple: pass up to the limit, marginal inside the guard band below it, fail beyond it", () => {
    // headroom = limit - measured; guard band 0.2 dB
    expect(decide(0.5, 0.2, "simple")).toBe("pass");
    expect(decide(0.2, 0.2, "simple")).toBe("pass");
    expect(decide(0.1, 0.2, "simple")).toBe("marginal");
    expect(decide(0, 0.2, "simple")).toBe("marginal");
    expect(decide(-0.01, 0.2, "simple")).toBe("fail");
  });

  it("guarded: marginal within the guard band on either side of the limit", () => {
    expect(decide(0.2, 0.2, "guarded")).toBe("pass");
    expect(decide(0.1, 0.2, "guarded")).toBe("marginal");
    expect(decide(-0.2, 0.2, "guarded")).toBe("marginal");
    expect(decide(-0.21, 0.2, "guarded")).toBe("fail");
  });

  it("a zero guard band gives plain pass/fail under either rule", () => {
    for (const rule of ["simple", "guarded"] as const) {
      expect(decide(0, 0, rule)).toBe("pass");
      expect(decide(-0.0001, 0, rule)).toBe("fail");
    }
  });
});

describe("loss budget", () => {
  it("adds fibre, connectors and splices: 2 km x 0.5 + 2 x 0.75 + 2 x 0.3 = 3.1 dB (TIA-568.3-D OSP template)", () => {
    const r = grade(osp(), OSP);
    expect(r.wavelengths.map((w) => [w.wavelengthNm, w.budgetDb, w.verdict])).toEqual([
      [1310, 3.1, "pass"],
      [1550, 3.1, "pass"],
    ]);
    expect(r.headroomDb).toBe(1.6);
    expect(r.verdict).toBe("pass");
    expect(reason(r, "loss.within-budget")?.source).toContain("TIA-568.3-D");
  });

  it("counts the end connections by reference method: one-cord both, two-cord one, three-cord none (IEC 61280-4-x)", () => {
    const at = (method: "one-cord" | "two-cord" | "three-cord" | "otdr") =>
      grade(osp({ measurements: [{ wavelengthNm: 1310, insertionLossDb: 1, lengthM: 2000, method }] }), OSP).wavelengths[0];
    expect(at("one-cord").budget.connectorPairs).toBe(2);
    expect(at("two-cord").budget.connectorPairs).toBe(1);
    expect(at("three-cord").budget.connectorPairs).toBe(0);
    expect(at("otdr").budget.connectorPairs).toBe(2);
    expect(at("three-cord").budgetDb).toBe(1.6); // 1.0 fibre + 0.6 splices
    expect(at("two-cord").guardBandDb).toBe(0.25);
  });

  it("uses the ISO/IEC 14763-3 reference-grade allowance for the end connections (0.5 dB SM) and 0.75 dB inside", () => {
    const r = grade(osp({ link: { connectorPairs: 4, splices: 0 } }), template("iso-iec-11801-1-14763-3"));
    // 2 x 0.5 (ends) + 2 x 0.75 (interior) = 2.5 dB; fibre 2 km x 0.4 = 0.8 dB
    expect(r.wavelengths[0].budget.connectorsDb).toBe(2.5);
    expect(r.wavelengths[0].budgetDb).toBe(3.3);
  });

  it("marks a reading just under the budget marginal (within the one-cord guard band) and one over it fail", () => {
    const near = grade(osp({ measurements: [{ wavelengthNm: 1310, insertionLossDb: 3.0, lengthM: 2000 }] }), OSP);
    expect(near.verdict).toBe("marginal");
    expect(reason(near, "loss.over-budget")?.severity).toBe("marginal");
    const over = grade(osp({ measurements: [{ wavelengthNm: 1310, insertionLossDb: 3.2, lengthM: 2000 }] }), OSP);
    expect(over.verdict).toBe("fail");
    expect(over.headroomDb).toBe(-0.1);
    const guarded = profileFrom(OSP.slug, (p) => (p.limits.decisionRule = { value: "guarded", source: "test" }));
    expect(grade(osp({ measurements: [{ wavelengthNm: 1310, insertionLossDb: 3.2, lengthM: 2000 }] }), guarded).verdict).toBe("marginal");
    expect(grade(osp({ measurements: [{ wavelengthNm: 1310, insertionLossDb: 3.35, lengthM: 2000 }] }), guarded).verdict).toBe("fail");
  });

  it("takes counts from the events when not declared, and says so", () => {
    const r = grade(
      linkTest({
        link: { ref: "ev", fibreType: "OS2" },
        measurements: [{ wavelengthNm: 1310, insertionLossDb: 1.2, lengthM: 1000, method: "otdr" }],
        events: [
          { wavelengthNm: 1310, positionM: 0, kind: "connector", lossDb: 0.2, reflectanceDb: -50 },
          { wavelengthNm: 1310, positionM: 400, kind: "splice", lossDb: 0.05 },
          { wavelengthNm: 1310, positionM: 700, kind: "non-reflective", lossDb: 0.04 },
          { wavelengthNm: 1310, positionM: 1000, kind: "connector", lossDb: 0.3, reflectanceDb: -48 },
        ],
      }),
      OSP,
    );
    expect(r.wavelengths[0].budget).toMatchObject({ connectorPairs: 2, splices: 2, countsFrom: "events" });
    expect(codes(r)).toContain("budget.counts-from-events");
  });

  it("uses the design length, then the far-end event, when no length was measured", () => {
    const design = grade(osp({ link: { designLengthM: 3000 }, measurements: [{ wavelengthNm: 1310, insertionLossDb: 1 }] }), OSP);
    expect(design.wavelengths[0].budget).toMatchObject({ lengthM: 3000, lengthBasis: "design", fibreDb: 1.5 });
    const fromEnd = grade(
      osp({ measurements: [{ wavelengthNm: 1310, insertionLossDb: 1 }], events: [{ wavelengthNm: 1310, positionM: 4000, kind: "end", reflectanceDb: -40 }] }),
      OSP,
    );
    expect(fromEnd.wavelengths[0].budget).toMatchObject({ lengthM: 4000, lengthBasis: "events" });
  });

  it("keeps the worst direction per wavelength", () => {
    const r = grade(
      osp({
        measurements: [
          { wavelengthNm: 1310, direction: "AB", insertionLossDb: 1.2, lengthM: 2000 },
          { wavelengthNm: 1310, direction: "BA", insertionLossDb: 1.9, lengthM: 2000 },
        ],
      }),
      OSP,
    );
    expect(r.wavelengths).toHaveLength(1);
    expect(r.wavelengths[0]).toMatchObject({ measuredDb: 1.9, direction: "BA" });
  });

  it("reports a wavelength the profile has no attenuation limit for as marginal, not as a pass", () => {
    const r = grade(osp({ measurements: [{ wavelengthNm: 1625, insertionLossDb: 1, lengthM: 2000 }] }), OSP);
    expect(r.verdict).toBe("marginal");
    expect(codes(r)).toContain("profile.no-attenuation-limit");
    expect(r.headroomDb).toBeNull();
  });

  it("flags a negative insertion loss as a reference problem without failing the link", () => {
    const r = grade(osp({ measurements: [{ wavelengthNm: 1310, insertionLossDb: -0.1, lengthM: 10 }] }), OSP);
    expect(reason(r, "loss.negative-reading")?.severity).toBe("info");
  });
});

describe("applications", () => {
  const sr = (fibreType: string, lengthM: number, il: number, application = "10GBASE-SR") =>
    grade(linkTest({ link: { ref: "A", fibreType, connectorPairs: 2, splices: 0, application }, measurements: [{ wavelengthNm: 850, insertionLossDb: il, lengthM }] }), IEEE);

  it("takes the tighter of the loss budget and the channel limit (10GBASE-SR on OM3: 2.6 dB)", () => {
    const short = sr("OM3", 100, 1.0); // loss budget 1.5 + 0.35 = 1.85 dB < 2.6 dB
    expect(short.wavelengths[0]).toMatchObject({ limitBasis: "loss-budget", budgetDb: 1.85 });
    const long = sr("OM3", 290, 1.0); // loss budget 1.5 + 1.015 = 2.515 dB < 2.6 dB still
    expect(long.wavelengths[0].limitBasis).toBe("loss-budget");
    const ebudget = profileFrom(IEEE.slug, (p) => (p.limits.connectorLossDb = limit(1.0)));
    const r = grade(linkTest({ link: { ref: "A", fibreType: "OM3", connectorPairs: 2, splices: 0, application: "10GBASE-SR" }, measurements: [{ wavelengthNm: 850, insertionLossDb: 2.7, lengthM: 290 }] }), ebudget);
    expect(r.wavelengths[0]).toMatchObject({ limitBasis: "application", budgetDb: 2.6 });
    expect(codes(r)).toContain("loss.over-application-limit");
  });

  it("fails a link longer than the application's reach (10GBASE-SR on OM3: 300 m)", () => {
    const r = sr("OM3", 350, 1.5);
    expect(reason(r, "length.over-application-reach")).toMatchObject({ severity: "fail", limit: 300, measured: 350 });
  });

  it("fails an application on a fibre type it does not run on", () => {
    const r = sr("OM3", 100, 1.0, "10GBASE-LR");
    expect(reason(r, "application.fibre-not-supported")?.severity).toBe("fail");
  });

  it("grades an unknown application against the loss budget alone, with a note", () => {
    const r = sr("OM3", 100, 1.0, "99GBASE-XYZ");
    expect(reason(r, "application.not-in-profile")?.severity).toBe("info");
    expect(r.verdict).toBe("pass");
  });

  it("marks an application whose wavelength was not tested as marginal", () => {
    const r = grade(linkTest({ link: { ref: "A", fibreType: "OM4", connectorPairs: 2, application: "10GBASE-SR" }, measurements: [{ wavelengthNm: 1300, insertionLossDb: 1.0, lengthM: 100 }] }), IEEE);
    expect(reason(r, "application.wavelength-not-tested")?.severity).toBe("marginal");
  });

  it("enforces the 0.5 m minimum length of 400GBASE-SR8", () => {
    const r = grade(linkTest({ link: { ref: "A", fibreType: "OM4", connectorPairs: 2, application: "400GBASE-SR8" }, measurements: [{ wavelengthNm: 850, insertionLossDb: 0.3, lengthM: 0.2 }] }), IEEE);
    expect(reason(r, "length.under-application-minimum")?.severity).toBe("fail");
  });
});

describe("PON classes", () => {
  const odn = (il: number, extra: Partial<LinkTest["link"]> = {}, powerReadings?: LinkTest["powerReadings"]) =>
    grade(
      linkTest({
        link: { ref: "P", fibreType: "G.652.D", connectorPairs: 4, splices: 6, splitters: [{ ratio: "1x32" }], ...extra },
        measurements: [{ wavelengthNm: 1310, insertionLossDb: il, lengthM: 15_000 }],
        powerReadings,
      }),
      GPON,
    );

  it("applies the default class B+ (13-28 dB) and the tighter of it and the loss budget", () => {
    const r = odn(22);
    // loss budget 15 km x 0.4 + 4 x 0.5 + 6 x 0.15 + 15.05 + 2.5 = 26.45 dB < 28 dB
    expect(r.wavelengths[0].limitBasis).toBe("loss-budget");
    expect(r.verdict).toBe("pass");
    const c = odn(22, { ponClass: "C+", splitters: [{ ratio: "1x64" }], designLengthM: 15_000 });
    expect(c.wavelengths[0].budgetDb).toBeLessThanOrEqual(32);
  });

  it("fails an ODN below the class minimum (receiver overload)", () => {
    const r = grade(linkTest({ link: { ref: "P", fibreType: "G.652.D", connectorPairs: 2, ponClass: "C+" }, measurements: [{ wavelengthNm: 1310, insertionLossDb: 10, lengthM: 1000 }] }), GPON);
    expect(reason(r, "loss.under-pon-class-min")).toMatchObject({ severity: "fail", limit: 17 });
  });

  it("fails an ODN over the class maximum when that is the tighter limit", () => {
    const p = profileFrom(GPON.slug, (q) => (q.limits.splitterExcessLossDbPerStage = limit(3)));
    const r = grade(linkTest({ link: { ref: "P", fibreType: "G.652.D", connectorPairs: 4, splitters: [{ ratio: "1x32" }] }, measurements: [{ wavelengthNm: 1310, insertionLossDb: 29, lengthM: 15_000 }] }), p);
    expect(r.wavelengths[0].limitBasis).toBe("pon-class");
    expect(codes(r)).toContain("loss.over-pon-class-max");
  });

  it("marks a declared class missing from the profile as marginal", () => {
    expect(reason(odn(20, { ponClass: "Z9" }), "pon-class.not-in-profile")?.severity).toBe("marginal");
  });

  it("checks received power against the class receiver window (B+ ONU: -27 to -8 dBm at 1490 nm)", () => {
    expect(problems(odn(22, {}, [{ wavelengthNm: 1490, dbm: -20 }]))).toEqual([]);
    expect(reason(odn(22, {}, [{ wavelengthNm: 1490, dbm: -29 }]), "power.below-sensitivity")?.severity).toBe("fail");
    expect(reason(odn(22, {}, [{ wavelengthNm: 1490, dbm: -26.8 }]), "power.below-sensitivity")?.severity).toBe("marginal");
    expect(reason(odn(22, {}, [{ wavelengthNm: 1490, dbm: -5 }]), "power.above-overload")?.severity).toBe("fail");
    expect(reason(odn(22, {}, [{ wavelengthNm: 1550, dbm: -12 }]), "power.no-window")?.severity).toBe("info");
  });
});

describe("events", () => {
  const traced = (events: LinkTest["events"], link: Partial<LinkTest["link"]> = {}, profile = OSP) =>
    grade(linkTest({ link: { ref: "E", fibreType: "OS2", connectorPairs: 2, splices: 2, ...link }, measurements: [{ wavelengthNm: 1310, insertionLossDb: 1.5, lengthM: 2000 }], events }), profile);

  it("fails a connector over 0.75 dB and a splice over 0.3 dB (TIA-568.3-D), marginal within the OTDR guard band", () => {
    const r = traced([
      { wavelengthNm: 1310, positionM: 10, kind: "connector", lossDb: 0.9 },
      { wavelengthNm: 1310, positionM: 800, kind: "splice", lossDb: 0.35 },
      { wavelengthNm: 1310, positionM: 1200, kind: "splice", lossDb: 0.25 },
    ]);
    expect(reason(r, "event.connector-loss")).toMatchObject({ severity: "fail", measured: 0.9, limit: 0.75, positionM: 10, eventIndex: 0 });
    expect(r.reasons.filter((x) => x.code === "event.splice-loss").map((x) => [x.severity, x.positionM])).toEqual([
      ["fail", 800],
      ["marginal", 1200],
    ]);
  });

  it("judges reflectance by polish: -40 dB passes UPC (-35 dB) but fails APC (-55 dB); multimode allows -20 dB", () => {
    const ev = [{ wavelengthNm: 1310, positionM: 10, kind: "connector" as const, lossDb: 0.2, reflectanceDb: -40 }];
    expect(codes(traced(ev))).not.toContain("event.reflectance");
    expect(reason(traced(ev, { polish: "APC" }), "event.reflectance")).toMatchObject({ severity: "fail", limit: -55 });
    const mm = grade(linkTest({ link: { ref: "M", fibreType: "OM3", connectorPairs: 2 }, measurements: [{ wavelengthNm: 850, insertionLossDb: 1 }], events: [{ wavelengthNm: 850, positionM: 5, kind: "connector", reflectanceDb: -25 }] }), MM);
    expect(codes(mm)).not.toContain("event.reflectance");
  });

  it("checks splitter excess loss over the ideal 10 log10 N", () => {
    const ev = (loss: number) => [{ wavelengthNm: 1310, positionM: 900, kind: "splitter" as const, lossDb: loss }];
    // 1x32: ideal 15.05 dB, allowance 5 stages x 0.5 = 2.5 dB
    expect(codes(traced(ev(17.3), { splitters: [{ ratio: "1x32" }] }, GPON))).not.toContain("event.splitter-excess-loss");
    expect(reason(traced(ev(18.2), { splitters: [{ ratio: "1x32" }] }, GPON), "event.splitter-excess-loss")).toMatchObject({ severity: "fail", limit: 2.5 });
    expect(reason(traced(ev(17.3), {}, GPON), "budget.splitter-undeclared")?.severity).toBe("marginal");
  });

  it("fails a break", () => {
    expect(reason(traced([{ wavelengthNm: 1310, positionM: 1500, kind: "break" }]), "event.break")?.severity).toBe("fail");
  });

  it("detects a macrobend from the difference between wavelengths at one position", () => {
    const r = traced([
      { wavelengthNm: 1310, positionM: 600, kind: "splice", lossDb: 0.05 },
      { wavelengthNm: 1550, positionM: 601, kind: "bend", lossDb: 0.45 },
    ]);
    expect(reason(r, "event.macrobend")).toMatchObject({ severity: "fail", measured: 0.4, wavelengthNm: 1550 });
    const splice = traced([
      { wavelengthNm: 1310, positionM: 600, kind: "splice", lossDb: 0.1 },
      { wavelengthNm: 1550, positionM: 600, kind: "splice", lossDb: 0.12 },
    ]);
    expect(codes(splice)).not.toContain("event.macrobend");
    const oneWavelength = traced([{ wavelengthNm: 1550, positionM: 600, kind: "bend", lossDb: 0.1 }]);
    expect(reason(oneWavelength, "event.bend-unconfirmed")?.severity).toBe("info");
  });

  it("edge case: a gainer seen from one end only is noted and not failed", () => {
    const r = traced([{ wavelengthNm: 1310, positionM: 700, kind: "splice", lossDb: -0.12, direction: "AB" }]);
    expect(reason(r, "event.gainer-unresolved")?.severity).toBe("info");
    expect(r.verdict).toBe("pass");
  });

  it("edge case: both ends average a gainer into a real loss that can fail", () => {
    const r = traced([
      { wavelengthNm: 1310, positionM: 700, kind: "splice", lossDb: -0.1, direction: "AB" },
      { wavelengthNm: 1310, positionM: 702, kind: "splice", lossDb: 0.9, direction: "BA" },
    ]);
    expect(reason(r, "event.gainer-resolved")?.measured).toBe(0.4);
    expect(reason(r, "event.splice-loss")).toMatchObject({ severity: "fail", measured: 0.4 });
  });
});

describe("optical return loss", () => {
  const withOrl = (orlDb: number | undefined, events: LinkTest["events"] = []) =>
    grade(
      linkTest({
        link: { ref: "O", fibreType: "G.652.D", connectorPairs: 2, splices: 0, ponClass: "B+" },
        measurements: [{ wavelengthNm: 1310, insertionLossDb: 15, orlDb, lengthM: 10_000 }],
        events,
      }),
      profileFrom(GPON.slug, (p) => (p.limits.designMarginDb = limit(12))),
    );

  it("fails ORL below the 32 dB minimum (ITU-T G.984.2), marginal within the 1 dB guard band", () => {
    expect(reason(withOrl(28), "orl.below-minimum")?.severity).toBe("fail");
    expect(reason(withOrl(32.5), "orl.below-minimum")?.severity).toBe("marginal");
    expect(codes(withOrl(40))).not.toContain("orl.below-minimum");
  });

  it("edge case: missing ORL is noted where the profile sets a minimum, and is silent where it does not", () => {
    expect(reason(withOrl(undefined), "orl.not-measured")?.severity).toBe("info");
    expect(codes(grade(osp(), OSP))).not.toContain("orl.not-measured");
  });

  it("checks the reported ORL against reflections and backscatter", () => {
    // Computed (physics): a -30 dB reflection at 0 m returns 1.0e-3; 10 km of fibre with a 31 dB backscatter return
    // loss at 0.4 dB/km returns 10^-3.1 x (1 - 10^(-0.8)) = 6.68e-4; together -10 log10(1.668e-3) = 27.78 dB.
    const ev = [{ wavelengthNm: 1310, positionM: 0, kind: "connector" as const, lossDb: 0.2, reflectanceDb: -30 }];
    expect(reason(withOrl(45, ev), "orl.inconsistent")?.severity).toBe("info");
    expect(reason(withOrl(45, ev), "orl.inconsistent")?.limit).toBeCloseTo(27.78, 2);
    // Only a -60 dB reflection listed: backscatter of 10 km gives about 31.3 dB; a 20 dB reading hides an unlisted reflection.
    const quiet = [{ wavelengthNm: 1310, positionM: 0, kind: "connector" as const, lossDb: 0.2, reflectanceDb: -60 }];
    expect(reason(withOrl(20, quiet), "orl.unlisted-reflection")?.severity).toBe("info");
    expect(codes(withOrl(32, quiet)).filter((c) => c.startsWith("orl.")).filter((c) => c !== "orl.below-minimum")).toEqual([]);
  });
});

describe("length, inspections and whole results", () => {
  it("fails a measured length far from the design length (5 % / 5 m tolerance, common practice)", () => {
    expect(reason(grade(osp({ link: { designLengthM: 2500 } }), OSP), "length.design-mismatch")?.severity).toBe("fail");
    expect(codes(grade(osp({ link: { designLengthM: 2050 } }), OSP))).not.toContain("length.design-mismatch");
  });

  it("fails a failed end-face inspection (IEC 61300-3-35)", () => {
    const r = grade(osp({ inspections: [{ location: "panel A port 4", result: "fail" }, { location: "B", result: "pass" }] }), OSP);
    expect(r.reasons.filter((x) => x.code === "inspection.failed")).toHaveLength(1);
    expect(r.verdict).toBe("fail");
  });

  it("edge case: a zero-length patch link is graded on its connectors alone", () => {
    const r = grade(linkTest({ link: { ref: "patch", fibreType: "OM4", connectorPairs: 2, splices: 0 }, measurements: [{ wavelengthNm: 850, insertionLossDb: 0.4, lengthM: 0 }] }), MM);
    expect(r.wavelengths[0].budget).toMatchObject({ fibreDb: 0, connectorsDb: 1.5 });
    expect(r.verdict).toBe("pass");
  });

  it("edge case: one direction only is graded without complaint", () => {
    const r = grade(osp({ measurements: [{ wavelengthNm: 1310, direction: "AB", insertionLossDb: 1.5, lengthM: 2000 }] }), OSP);
    expect(problems(r)).toEqual([]);
  });

  it("edge case: an OTDR-only test without insertion loss has no headroom but still grades its events", () => {
    const r = grade(linkTest({ link: { ref: "o", fibreType: "OS2" }, measurements: [{ wavelengthNm: 1310, lengthM: 500 }], events: [{ wavelengthNm: 1310, positionM: 100, kind: "splice", lossDb: 0.5 }] }), OSP);
    expect(r.headroomDb).toBeNull();
    expect(r.wavelengths).toEqual([]);
    expect(r.verdict).toBe("fail");
  });

  it("lists reasons most severe first, each with a rule path, a source and a message", () => {
    const r = grade(
      osp({
        measurements: [{ wavelengthNm: 1310, insertionLossDb: 3.05, lengthM: 2000 }],
        events: [{ wavelengthNm: 1310, positionM: 50, kind: "connector", lossDb: 1.2 }],
        inspections: [{ location: "A", result: "fail" }],
      }),
      OSP,
    );
    const ranks = r.reasons.map((x) => ({ fail: 0, marginal: 1, info: 2 })[x.severity]);
    expect([...ranks].sort((a, b) => a - b)).toEqual(ranks);
    for (const x of r.reasons) {
      expect(x.rule.length).toBeGreaterThan(0);
      expect(x.source.length).toBeGreaterThan(0);
      expect(x.message.length).toBeGreaterThan(10);
    }
    expect(r).toMatchObject({ engineVersion: expect.stringMatching(/^\d+\.\d+\.\d+$/), profile: { slug: OSP.slug, version: 1 } });
  });
});
