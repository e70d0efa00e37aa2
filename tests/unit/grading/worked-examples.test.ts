// Published worked examples, each with every input and the published result, reproduced by the
// engine. Sources: the pages named beside each example (figures as shown there; the standards
// texts themselves were not at hand). Profiles are template clones set to the example's own values.
import { describe, expect, it } from "vitest";
import { grade, type Profile } from "@/lib/grading";
import { limit, linkTest, profileFrom, template } from "./helpers";

/** A single-mode profile with the example's attenuation, connector, splice and margin values. */
function planning(opts: { att: Record<number, number>; connector: number; splice: number; margin?: number; fibre?: "OS2" | "OM2" }): Profile {
  const fibre = opts.fibre ?? "OS2";
  return profileFrom(fibre === "OM2" ? "tia-568-3-d-multimode" : "tia-568-3-d-singlemode-osp", (p) => {
    p.limits.attenuation = Object.entries(opts.att).map(([nm, v]) => ({ fibreTypes: [fibre], wavelengthNm: Number(nm), maxDbPerKm: v, source: "worked example" }));
    p.limits.connectorLossDb = limit(opts.connector, "worked example");
    p.limits.spliceLossDb = limit(opts.splice, "worked example");
    p.limits.designMarginDb = limit(opts.margin ?? 0, "worked example");
  });
}

describe("published loss-budget worked examples", () => {
  it("10 km single-mode at 1310 nm: 3.50 + 0.01 + 1.00 + 3 dB margin = 7.51 dB", () => {
    // Source: sites.google.com/a/piterow.us (loss formula example crediting imcnetworks.com), ref "Worked examples" #1: seen.
    // Inputs: 0.35 dB/km x 10 km; 1 splice x 0.01 dB; 2 connectors x 0.5 dB; 3 dB safety margin. Published total: 7.51 dB.
    const profile = planning({ att: { 1310: 0.35 }, connector: 0.5, splice: 0.01, margin: 3 });
    const r = grade(linkTest({ link: { ref: "ex1", fibreType: "OS2", connectorPairs: 2, splices: 1 }, measurements: [{ wavelengthNm: 1310, insertionLossDb: 7.0, lengthM: 10_000 }] }), profile);
    expect(r.wavelengths[0].budget).toMatchObject({ fibreDb: 3.5, splicesDb: 0.01, connectorsDb: 1.0, marginDb: 3 });
    expect(r.wavelengths[0].lossBudgetDb).toBe(7.51);
  });

  it("2 km multimode link: 2 + 2.5 + 1 + 0.5 (higher-order modes) = 6 dB; 13 dB power budget leaves 7 dB", () => {
    // Source: Juniper MX10003 / ACX7348 hardware guides, "Calculating power margin" (Table 30 / Table 28 estimates), seen.
    // Inputs: 2 km at 1 dB/km; 5 connectors x 0.5 dB; 2 splices x 0.5 dB; higher-order mode loss 0.5 dB; PB = 13 dB.
    // Published: link loss 6 dB (2 + 2.5 + 1 + 0.5), power margin PM = 13 - 6 = 7 dB.
    const budgetProfile = planning({ fibre: "OM2", att: { 850: 1.0 }, connector: 0.5, splice: 0.5, margin: 0.5 });
    const link = { ref: "ex2", fibreType: "OM2", connectorPairs: 5, splices: 2, application: "PB13" };
    const r = grade(linkTest({ link, measurements: [{ wavelengthNm: 850, insertionLossDb: 6, lengthM: 2000 }] }), budgetProfile);
    expect(r.wavelengths[0].lossBudgetDb).toBe(6);
    // The power margin: the same link loss graded against a 13 dB channel limit alone.
    const powerBudget = profileFrom("tia-568-3-d-multimode", (p) => {
      p.limits.attenuation = [{ fibreTypes: ["OM5"], wavelengthNm: 1300, maxDbPerKm: 1.5, source: "unused" }];
      p.limits.applications = [{ application: "PB13", fibreTypes: ["OM2"], wavelengthNm: 850, maxChannelLossDb: limit(13), maxReachM: limit(3000) }];
    });
    const m = grade(linkTest({ link, measurements: [{ wavelengthNm: 850, insertionLossDb: 6, lengthM: 2000 }] }), powerBudget);
    expect(m.wavelengths[0].limitBasis).toBe("application");
    expect(m.wavelengths[0].lossBudgetDb).toBeNull(); // no attenuation row for OM2 at 850 nm in this profile
    expect(m.headroomDb).toBe(7);
    expect(m.verdict).toBe("pass");
  });

  it("8 km single-mode link: 4 + 3.5 = 7.5 dB; 13 dB power budget leaves 5.5 dB", () => {
    // Source: Juniper MX10003 / ACX7348 hardware guides (same page as above), seen.
    // Inputs: 8 km at 0.5 dB/km; 7 connectors x 0.5 dB; PB = 13 dB. Published: PM = 13 - 4 - 3.5 = 5.5 dB.
    const p = planning({ att: { 1310: 0.5 }, connector: 0.5, splice: 0.5 });
    const withPb = profileFrom(p.slug, (q) => {
      Object.assign(q.limits, p.limits);
      q.limits.applications = [{ application: "PB13", fibreTypes: ["OS2"], wavelengthNm: 1310, maxChannelLossDb: limit(13), maxReachM: limit(10_000) }];
    });
    const r = grade(linkTest({ link: { ref: "ex3", fibreType: "OS2", connectorPairs: 7, splices: 0, application: "PB13" }, measurements: [{ wavelengthNm: 1310, insertionLossDb: 7.5, lengthM: 8000 }] }), withPb);
    expect(r.wavelengths[0].lossBudgetDb).toBe(7.5);
    expect(13 - r.wavelengths[0].lossBudgetDb!).toBe(5.5);
    expect(r.wavelengths[0].limitBasis).toBe("loss-budget"); // 7.5 dB is the tighter of the two
  });

  it("2 km multimode link with a clock-recovery module: link loss 7 dB, margin 6 dB", () => {
    // Source: Juniper M40 router hardware guide, "Estimating link loss" (Table 16), seen.
    // Inputs: 2 km at 1.0 dB/km; 5 connectors x 0.5; 2 splices x 0.5; higher-order loss 0.5; clock recovery module 1 dB; PB 13 dB.
    // Published: PM = 13 - 2 - 2.5 - 1 - 0.5 - 1 = 6 dB.
    const p = planning({ fibre: "OM2", att: { 850: 1.0 }, connector: 0.5, splice: 0.5, margin: 1.5 });
    const r = grade(linkTest({ link: { ref: "ex4", fibreType: "OM2", connectorPairs: 5, splices: 2 }, measurements: [{ wavelengthNm: 850, insertionLossDb: 6.9, lengthM: 2000 }] }), p);
    expect(r.wavelengths[0].lossBudgetDb).toBe(7);
    expect(13 - r.wavelengths[0].lossBudgetDb!).toBe(6);
  });

  it("10 km G.652 span: 4.0 dB at 1310 nm and 3.0 dB at 1550 nm plus 2 x 0.5 dB connections (before splices)", () => {
    // Source: ETAI trade-association article (HTN Nov/Dec 2022, p.4), citing ITU-T G.652 / G.671; ref worked example #4: seen (partial).
    // Inputs: 0.4 dB/km at 1310, 0.3 dB/km at 1550, 10 km, 2 patch-panel connections x 0.5 dB. Published subtotals: 5.0 dB and 4.0 dB.
    const p = planning({ att: { 1310: 0.4, 1550: 0.3 }, connector: 0.5, splice: 0 });
    const r = grade(
      linkTest({
        link: { ref: "ex5", fibreType: "OS2", connectorPairs: 2, splices: 0 },
        measurements: [
          { wavelengthNm: 1310, insertionLossDb: 4.2, lengthM: 10_000 },
          { wavelengthNm: 1550, insertionLossDb: 3.6, lengthM: 10_000 },
        ],
      }),
      p,
    );
    expect(r.wavelengths.map((w) => w.lossBudgetDb)).toEqual([5.0, 4.0]);
    expect(r.wavelengths.map((w) => w.headroomDb)).toEqual([0.8, 0.4]);
  });

  it("400GBASE-LR8 reach: (6.3 - 2.0) / 0.4 -> 10 km on OS2, / 0.5 -> 8 km, / 1.0 -> 4 km", () => {
    // Source: TIA FOTC summary of IEEE 802.3 Clause 122 (400GBASE-LR8), seen: channel IL 6.3 dB, 2.0 dB connection and splice
    // allocation, reach 10 km at 0.4 dB/km (OS2), 8 km at 0.5 dB/km (OS1a outdoor), 4 km at 1.0 dB/km (OS1a indoor).
    for (const [alpha, km] of [[0.4, 10], [0.5, 8], [1.0, 4]] as const) {
      const p = profileFrom("tia-568-3-d-singlemode-osp", (q) => {
        q.limits.attenuation = [{ fibreTypes: ["OS2"], wavelengthNm: 1310, maxDbPerKm: alpha, source: "LR8 example" }];
        q.limits.connectorLossDb = limit(1.0); // 2 connection pairs carry the 2.0 dB allocation
        q.limits.applications = [{ application: "400GBASE-LR8", fibreTypes: ["OS2"], wavelengthNm: 1310, maxChannelLossDb: limit(6.3), maxReachM: limit(km * 1000) }];
      });
      const at = (m: number) =>
        grade(linkTest({ link: { ref: "lr8", fibreType: "OS2", connectorPairs: 2, splices: 0, application: "400GBASE-LR8" }, measurements: [{ wavelengthNm: 1310, insertionLossDb: 0, lengthM: m }] }), p).wavelengths[0];
      expect(at(km * 1000).lossBudgetDb).toBeLessThanOrEqual(6.3); // the published reach fits the channel IL
      expect(at((km + 1) * 1000).lossBudgetDb).toBeGreaterThan(6.3); // one more whole km does not
      expect(at(((6.3 - 2.0) / alpha) * 1000).lossBudgetDb).toBe(6.3); // 10.75 / 8.6 / 4.3 km: exactly the channel IL
    }
  });

  it("10GBASE-ER and 100GBASE-ER4 over 40 km: 0.2375 dB/km with 1.5 dB connectors = 11 dB; 0.4 dB/km with 2 dB = 18 dB", () => {
    // Source: IEEE 802.3 100GNGOPTX list message msg00583 (2012), seen: (11 - 1.5)/40 = 0.2375 dB/km for 10GBASE-ER
    // (Table 52-24, 11 dB); 100GBASE-ER4 (18 - 2)/40 = 0.4 dB/km.
    const er = planning({ att: { 1550: 0.2375 }, connector: 0.75, splice: 0 });
    const r1 = grade(linkTest({ link: { ref: "er", fibreType: "OS2", connectorPairs: 2, splices: 0 }, measurements: [{ wavelengthNm: 1550, insertionLossDb: 10, lengthM: 40_000 }] }), er);
    expect(r1.wavelengths[0].lossBudgetDb).toBe(11);
    const er4 = planning({ att: { 1310: 0.4 }, connector: 1.0, splice: 0 });
    const r2 = grade(linkTest({ link: { ref: "er4", fibreType: "OS2", connectorPairs: 2, splices: 0 }, measurements: [{ wavelengthNm: 1310, insertionLossDb: 17, lengthM: 40_000 }] }), er4);
    expect(r2.wavelengths[0].lossBudgetDb).toBe(18);
  });

  it("10GBASE-SR on OM4: 1.5 dB of connections + 400 m at 3.5 dB/km = the 2.9 dB channel limit; 40GBASE-SR4: 1.0 + 150 m -> 1.5 dB", () => {
    // Source: IEEE 802.3 Clause 52 / 86 channel figures as published in secondary sources (2.9 dB, 400 m; 1.5 dB, 150 m,
    // 1.0 dB connection allocation; ref §4: seen) against the TIA-568.3-D multimode template's own 3.5 dB/km and 0.75 dB.
    const r = grade(
      linkTest({ link: { ref: "sr", fibreType: "OM4", connectorPairs: 2, splices: 0, application: "10GBASE-SR" }, measurements: [{ wavelengthNm: 850, insertionLossDb: 2.0, lengthM: 400 }] }),
      template("tia-568-3-d-multimode"),
    );
    expect(r.wavelengths[0].lossBudgetDb).toBe(2.9);
    expect(r.wavelengths[0].budgetDb).toBe(2.9);
    const sr4 = profileFrom("tia-568-3-d-multimode", (p) => (p.limits.connectorLossDb = limit(0.5)));
    const r4 = grade(linkTest({ link: { ref: "sr4", fibreType: "OM4", connectorPairs: 2, splices: 0 }, measurements: [{ wavelengthNm: 850, insertionLossDb: 1, lengthM: 150 }] }), sr4);
    expect(Math.round(r4.wavelengths[0].lossBudgetDb! * 10) / 10).toBe(1.5);
  });
});

describe("published event-analysis examples", () => {
  it("bidirectional splice: 0.20 dB one way, 0.10 dB the other -> 0.15 dB", () => {
    // Source: govur.com OTDR bidirectional splice-loss explanation (ref worked example #7), seen.
    const p = profileFrom("tia-568-3-d-singlemode-osp", (q) => {
      q.limits.spliceLossDb = limit(0.1);
      q.limits.guardBands.otdr = limit(0);
    });
    const r = grade(
      linkTest({
        link: { ref: "bi", fibreType: "OS2" },
        measurements: [{ wavelengthNm: 1550, lengthM: 4000 }],
        events: [
          { wavelengthNm: 1550, direction: "AB", positionM: 2000, kind: "splice", lossDb: 0.2 },
          { wavelengthNm: 1550, direction: "BA", positionM: 2001.5, kind: "splice", lossDb: 0.1 },
        ],
      }),
      p,
    );
    const reason = r.reasons.find((x) => x.code === "event.splice-loss")!;
    expect(reason.measured).toBe(0.15);
  });

  it("gainer: true loss 0.04 dB shows 0.12 dB one way and -0.04 dB the other; the average recovers 0.04 dB", () => {
    // Source: shopfiberoptic.com gainer explanation (backscatter -82.00 vs -82.16 dB), ref worked example #8, seen.
    const r = grade(
      linkTest({
        link: { ref: "gain", fibreType: "OS2" },
        measurements: [{ wavelengthNm: 1550, lengthM: 6000 }],
        events: [
          { wavelengthNm: 1550, direction: "AB", positionM: 3000, kind: "splice", lossDb: 0.12 },
          { wavelengthNm: 1550, direction: "BA", positionM: 3000, kind: "splice", lossDb: -0.04 },
        ],
      }),
      template("tia-568-3-d-singlemode-osp"),
    );
    const g = r.reasons.find((x) => x.code === "event.gainer-resolved")!;
    expect(g.measured).toBe(0.04);
    expect(g.severity).toBe("info");
    expect(r.verdict).toBe("pass");
  });

  it("macrobend: a section losing 0.3 dB/km at 1310 nm but 0.5 dB/km at 1550 nm is flagged as bent", () => {
    // Source: govur.com macrobend explanation (ref worked example #9), seen: more loss at 1550 than at 1310 nm points to a bend.
    // The example's rates over a 5 km link: 1.5 dB at 1310 nm, 2.5 dB at 1550 nm.
    const r = grade(
      linkTest({
        link: { ref: "bend", fibreType: "OS2", connectorPairs: 0, splices: 0 },
        measurements: [
          { wavelengthNm: 1310, insertionLossDb: 1.5, lengthM: 5000, method: "three-cord" },
          { wavelengthNm: 1550, insertionLossDb: 2.5, lengthM: 5000, method: "three-cord" },
        ],
      }),
      template("tia-568-3-d-singlemode-osp"),
    );
    expect(r.reasons.map((x) => x.code)).toContain("loss.macrobend-suspected");
    // A splice-like event of equal loss at both wavelengths is not flagged.
    const flat = grade(
      linkTest({
        link: { ref: "flat", fibreType: "OS2", connectorPairs: 0, splices: 0 },
        measurements: [
          { wavelengthNm: 1310, insertionLossDb: 1.5, lengthM: 5000, method: "three-cord" },
          { wavelengthNm: 1550, insertionLossDb: 1.2, lengthM: 5000, method: "three-cord" },
        ],
      }),
      template("tia-568-3-d-singlemode-osp"),
    );
    expect(flat.reasons.map((x) => x.code)).not.toContain("loss.macrobend-suspected");
  });

  it("ideal 1x32 and 1x64 split losses: 15.05 dB and 18.06 dB (10 log10 N)", () => {
    // Source: the 10*log10(N) formula seen on several pages (ref §5 and worked example #14); values computed.
    const p = profileFrom("itu-t-g984-2-gpon", (q) => (q.limits.splitterExcessLossDbPerStage = limit(0)));
    const at = (ratio: string) =>
      grade(linkTest({ link: { ref: "s", fibreType: "G.652.D", connectorPairs: 0, splices: 0, splitters: [{ ratio }] }, measurements: [{ wavelengthNm: 1490, insertionLossDb: 16, lengthM: 0 }] }), p).wavelengths[0].budget.splittersDb;
    expect(at("1x32")).toBeCloseTo(15.05, 2);
    expect(at("1x64")).toBeCloseTo(18.06, 2);
  });

  it("G-PON B+: a 1:32 split over 20 km fits the 28 dB class", () => {
    // Source: a public operator discussion (ref §5, B+ row): "28 dB budget with B+ optics, 1:32, 20 km", seen.
    // The G.984.2 template's own budget for that ODN at 1310 nm: 20 km x 0.4 + 1x32 (15.05 + 5 x 0.5) + 2 x 0.5 = 26.55 dB.
    const r = grade(
      linkTest({ link: { ref: "b+", fibreType: "G.652.D", connectorPairs: 2, splices: 0, splitters: [{ ratio: "1x32" }], ponClass: "B+" }, measurements: [{ wavelengthNm: 1310, insertionLossDb: 26.5, lengthM: 20_000 }] }),
      template("itu-t-g984-2-gpon"),
    );
    expect(r.wavelengths[0].lossBudgetDb).toBeCloseTo(26.55, 2);
    expect(r.wavelengths[0].lossBudgetDb).toBeLessThanOrEqual(28);
    expect(r.verdict).not.toBe("fail");
  });
});
