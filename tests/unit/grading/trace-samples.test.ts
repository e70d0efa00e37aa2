// Checks against real OTDR traces: the key-event tables of public SR-4731 sample files, as decoded
// and cross-checked in ../shared/reference/sor/expected-values.json (the samples are published in the
// otdrparser test set, BSD-2-Clause; demo_ab also in pyOTDR). Only the numbers are used here.
import { describe, expect, it } from "vitest";
import { grade } from "@/lib/grading";
import { linkTest, template } from "./helpers";

const C = 299_792_458; // m/s

/**
 * Return loss (dB) of an infinitely long fibre's backscatter, from an OTDR's backscatter coefficient
 * K (dB for a 1 ns pulse), group index n and attenuation a (dB/km): the backscatter per metre is
 * 2·10^(K/10)/(v·1 ns), integrated over the fibre it returns that over 2a (a in nepers per metre).
 * Physics, computed; the relation between K and the capture fraction is the usual OTDR one.
 */
function infiniteBackscatterRl(kDb: number, groupIndex: number, dbPerKm: number): number {
  const perMetre = (2 * 10 ** (kDb / 10)) / ((C / groupIndex) * 1e-9);
  const nepersPerMetre = (dbPerKm * Math.LN10) / 10 / 1000;
  return -10 * Math.log10(perMetre / (2 * nepersPerMetre));
}

describe("real OTDR trace samples", () => {
  it("the template's 31 dB single-mode backscatter return loss lies within what four real traces imply", () => {
    // (backscatter coefficient dB @1 ns, group index, lead-in attenuation dB/km) from expected-values.json:
    const samples = [
      [-81.5, 1.4711, 0.344], // pyotdr/demo_ab.sor, 1310 nm
      [-80.0, 1.475, 0.343], // sample1310_lowDR.sor, 1310 nm, G.652
      [-78.5, 1.4677, 0.371], // otdrparser/1310_0001.sor, 1310 nm, G.652
      [-80.4, 1.47, 0.343], // otdrparser/issue15a.sor, 1310 nm, G.652
    ] as const;
    const rl = samples.map(([k, n, a]) => infiniteBackscatterRl(k, n, a));
    for (const x of rl) expect(x).toBeGreaterThan(30); // reference-values.md §6: "≈ 31–34 dB" (from memory)
    for (const x of rl) expect(x).toBeLessThan(34.5);
    const template31 = template("tia-568-3-d-singlemode-osp").limits.orlConsistency.backscatterReturnLossDb.singlemode.value;
    expect(template31).toBeGreaterThanOrEqual(Math.min(...rl) - 0.5);
    expect(template31).toBeLessThanOrEqual(Math.max(...rl));
  });

  it("sample1310_lowDR: the reported ORL of 32.392 dB agrees with the ORL its events and backscatter imply", () => {
    // sample1310_lowDR.sor (otdrparser tests, BSD-2-Clause; also pyOTDR): 1310 nm, G.652, total loss 6.39 dB,
    // ORL 32.392 dB, events at 0 m (-44.177 dB), 2019.93 m (0.557 dB, -40.574 dB), end at 17 065.447 m (-38.395 dB).
    const test = linkTest({
      link: { ref: "lowDR", fibreType: "G.652.D", connectorPairs: 2, splices: 1 },
      measurements: [{ wavelengthNm: 1310, method: "otdr", insertionLossDb: 6.39, orlDb: 32.392, lengthM: 17_065.447 }],
      events: [
        { wavelengthNm: 1310, positionM: 0, kind: "connector", lossDb: 0, reflectanceDb: -44.177 },
        { wavelengthNm: 1310, positionM: 2019.93, kind: "non-reflective", lossDb: 0.557, reflectanceDb: -40.574 },
        { wavelengthNm: 1310, positionM: 17_065.447, kind: "end", reflectanceDb: -38.395 },
      ],
    });
    const r = grade(test, template("tia-568-3-d-singlemode-osp"));
    const orlNotes = r.reasons.filter((x) => x.code === "orl.inconsistent" || x.code === "orl.unlisted-reflection");
    expect(orlNotes).toEqual([]); // within the 3 dB consistency tolerance
    // Budget 17.065 km x 0.5 + 2 x 0.75 + 1 x 0.3 = 10.33 dB; the trace's 6.39 dB passes it.
    expect(r.wavelengths[0]).toMatchObject({ budgetDb: 10.3327, measuredDb: 6.39, verdict: "pass" });
    // Its 0.557 dB non-reflective event is over the 0.3 dB splice limit.
    expect(r.reasons.find((x) => x.code === "event.splice-loss")).toMatchObject({ measured: 0.557, positionM: 2019.93, severity: "fail" });
  });

  it("issue15a: a 21-event, 42 km trace with gainers grades without error and finds its over-limit splices", () => {
    // otdrparser/issue15a.sor (BSD-2-Clause), 1310 nm, G.652: the key events (0.0 dB reflectance means none in SR-4731).
    const raw: [number, number, number, string][] = [
      [0.0, 0.0, 0.0, "1F"], [498.634, 0.34, -48.15, "1F"], [1257.293, -0.078, 0.0, "0F"], [9208.931, 0.157, 0.0, "0F"],
      [26311.377, 0.154, -63.124, "1F"], [26590.775, 0.078, -63.046, "1F"], [29549.951, 0.094, -58.935, "1F"],
      [30159.733, 0.029, -59.329, "1F"], [30588.008, -0.044, -58.963, "1F"], [31205.948, 0.091, 0.0, "0F"],
      [31846.321, 0.038, -58.046, "1F"], [32496.891, 0.194, 0.0, "0F"], [32882.338, 0.111, -58.114, "1F"],
      [33763.361, -0.009, -56.709, "1F"], [34369.064, 0.275, -56.024, "1F"], [34760.63, 0.133, -56.917, "1F"],
      [34989.043, 0.523, -56.772, "1F"], [35702.834, 0.289, -55.239, "1F"], [35978.154, 0.176, -54.07, "1F"],
      [41099.099, 0.0, 0.0, "0F"], [42277.874, 3.0, 0.0, "0O"],
    ];
    const events = raw.map(([positionM, lossDb, refl, code]) => ({
      wavelengthNm: 1310,
      positionM,
      kind: code === "0O" ? ("end" as const) : code.startsWith("1") ? ("reflective" as const) : ("non-reflective" as const),
      lossDb: code === "0O" ? undefined : lossDb,
      reflectanceDb: refl === 0 ? undefined : refl,
    }));
    const r = grade(linkTest({ link: { ref: "issue15a", fibreType: "G.652.D" }, measurements: [{ wavelengthNm: 1310, method: "otdr", lengthM: 42_277.874 }], events }), template("tia-568-3-d-singlemode-osp"));
    // Reflective events are judged against the 0.75 dB connector limit, none exceed it; no reflectance is above -35 dB.
    expect(r.reasons.filter((x) => x.code === "event.connector-loss" && x.severity === "fail")).toEqual([]);
    expect(r.reasons.filter((x) => x.code === "event.reflectance")).toEqual([]);
    // The 1257 m non-reflective gainer (-0.078 dB) from one end is noted, not failed.
    expect(r.reasons.find((x) => x.code === "event.gainer-unresolved")?.positionM).toBe(1257.293);
    expect(r.wavelengths).toEqual([]);
  });
});
