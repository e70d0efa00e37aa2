// Every template value checked against the gathered reference values (../shared/reference/
// reference-values.md, cited below as "ref §N"), with the standard and clause beside each check.
// "seen" / "partly seen" / "from memory" repeat what the reference file says about each figure.
import { describe, expect, it } from "vitest";
import { findTemplate, templates, type FibreType, type Profile } from "@/lib/grading";

function att(p: Profile, fibre: FibreType, nm: number): number | undefined {
  return p.limits.attenuation.find((r) => r.wavelengthNm === nm && r.fibreTypes.includes(fibre))?.maxDbPerKm;
}
function app(p: Profile, name: string, fibre: FibreType) {
  const row = p.limits.applications.find((a) => a.application === name && a.fibreTypes.includes(fibre));
  if (!row) throw new Error(`${name} on ${fibre} missing`);
  return { lossDb: row.maxChannelLossDb.value, reachM: row.maxReachM.value, nm: row.wavelengthNm, minM: row.minReachM?.value };
}
function pon(p: Profile, cls: string) {
  const row = p.limits.ponClasses.find((c) => c.ponClass === cls);
  if (!row) throw new Error(`class ${cls} missing`);
  return row;
}
const tiaMm = findTemplate("tia-568-3-d-multimode")!;
const tiaIsp = findTemplate("tia-568-3-d-singlemode-isp")!;
const tiaOsp = findTemplate("tia-568-3-d-singlemode-osp")!;
const iso = findTemplate("iso-iec-11801-1-14763-3")!;
const ieee = findTemplate("ieee-802-3-applications")!;
const gpon = findTemplate("itu-t-g984-2-gpon")!;
const xgs = findTemplate("itu-t-g9807-1-xgs-pon")!;

describe("template catalogue", () => {
  it("has the families the product promises, version 1, unique slugs, frozen", () => {
    expect(templates.map((t) => t.slug)).toEqual([
      "tia-568-3-d-multimode",
      "tia-568-3-d-singlemode-isp",
      "tia-568-3-d-singlemode-osp", // the organisation default in db/schema.ts
      "iso-iec-11801-1-14763-3",
      "ieee-802-3-applications",
      "itu-t-g984-2-gpon",
      "itu-t-g9807-1-xgs-pon",
    ]);
    for (const t of templates) expect(t.version).toBe(1);
    expect(Object.isFrozen(tiaOsp.limits.connectorLossDb)).toBe(true);
    expect(findTemplate("no-such-template")).toBeUndefined();
  });

  it("annotates every limit with a source, and every source says how sure it is or names a standard", () => {
    const sources: string[] = [];
    const walk = (v: unknown) => {
      if (Array.isArray(v)) v.forEach(walk);
      else if (v && typeof v === "object") {
        const o = v as Record<string, unknown>;
        if (typeof o.source === "string") sources.push(o.source);
        if ("value" in o || "maxDbPerKm" in o) expect(typeof o.source, JSON.stringify(o)).toBe("string");
        Object.values(o).forEach(walk);
      }
    };
    for (const t of templates) walk(t.limits);
    expect(sources.length).toBeGreaterThan(100);
    for (const s of sources) expect(s).toMatch(/seen|from memory|common practice|computed|ILAC|ISO|IEC|TIA|IEEE|ITU|FOA|test/);
  });
});

describe("cabled fibre attenuation (ref §1)", () => {
  it("TIA-568.3-D multimode: 3.5 dB/km at 850 nm, 1.5 dB/km at 1300 nm, OM5 2.3 dB/km at 953 nm", () => {
    for (const f of ["OM1", "OM2", "OM3", "OM4", "OM5"] as const) {
      expect(att(tiaMm, f, 850)).toBe(3.5); // ANSI/TIA-568.3-D Table 1 (ref §1: partly seen, value from memory)
      expect(att(tiaMm, f, 1300)).toBe(1.5); // ANSI/TIA-568.3-D Table 1 (ref §1: from memory)
    }
    expect(att(tiaMm, "OM5", 953)).toBe(2.3); // TIA-568.3-D Table 1 / TIA-492AAAE (ref §1: from memory)
    expect(att(tiaMm, "OM4", 953)).toBeUndefined(); // 953 nm is specified for OM5 only
  });

  it("TIA-568.3-D single-mode: 1.0 dB/km inside plant, 0.5 dB/km outside plant, at 1310 and 1550 nm", () => {
    for (const nm of [1310, 1550]) {
      expect(att(tiaIsp, "OS1a", nm)).toBe(1.0); // ANSI/TIA-568.3-D Table 1 inside plant (ref §1: partly seen)
      expect(att(tiaOsp, "OS2", nm)).toBe(0.5); // ANSI/TIA-568.3-D Table 1 outside plant (ref §1: seen)
    }
  });

  it("ISO/IEC 11801-1: OS1a 1.0 and OS2 0.4 dB/km at 1310/1383/1550 nm; OM 3.5/1.5 dB/km", () => {
    for (const nm of [1310, 1383, 1550]) {
      expect(att(iso, "OS1a", nm)).toBe(1.0); // ISO/IEC 11801-1:2017 (ref §1: from memory)
      expect(att(iso, "OS2", nm)).toBe(0.4); // ISO/IEC 11801-1:2017 (ref §1: seen at 1310 nm, rest from memory)
    }
    expect(att(iso, "OM3", 850)).toBe(3.5); // ISO/IEC 11801-1:2017 (ref §1: from memory)
    expect(att(iso, "OM3", 1300)).toBe(1.5); // ISO/IEC 11801-1:2017 (ref §1: from memory)
  });

  it("IEEE 802.3 planning attenuation 0.4 dB/km at 1310 nm on OS2", () => {
    expect(att(ieee, "OS2", 1310)).toBe(0.4); // IEEE 802.3 Cl. 122 via TIA FOTC summary (ref §1: seen)
  });

  it("ITU-T G.652.D cable: 0.4 dB/km in 1310-1625 nm and 0.3 dB/km at 1550 nm", () => {
    for (const nm of [1310, 1383, 1490, 1577, 1625]) expect(att(gpon, "G.652.D", nm)).toBe(0.4); // ITU-T G.652 Table 2 (ref §1: from memory)
    expect(att(gpon, "G.652.D", 1550)).toBe(0.3); // ITU-T G.652 Table 2 (ref §1: from memory)
    expect(att(xgs, "G.657.A2", 1550)).toBe(0.3); // ITU-T G.657 Table A, same as G.652.D (ref §1: from memory)
  });

  it("uses none of the conflicting 'calculator' values the reference file warns about (0.35/0.25 dB/km as limits)", () => {
    // ref §1 disagreement note: TIA-568.3-D OSP is 0.5/0.5 and G.652.D 0.4/0.3, not 0.35/0.25 or 0.4 at 1550
    for (const t of templates) for (const r of t.limits.attenuation) expect([0.35, 0.25]).not.toContain(r.maxDbPerKm);
    expect(att(tiaOsp, "OS2", 1550)).not.toBe(0.4);
  });
});

describe("connection limits (ref §2)", () => {
  it("TIA-568.3-D: 0.75 dB per mated pair, 0.3 dB per splice", () => {
    for (const t of [tiaMm, tiaIsp, tiaOsp]) {
      expect(t.limits.connectorLossDb.value).toBe(0.75); // ANSI/TIA-568.3-D connecting hardware (ref §2: partly seen)
      expect(t.limits.spliceLossDb.value).toBe(0.3); // ANSI/TIA-568.3-D splices (ref §2: from memory)
    }
  });

  it("TIA-568.3-D return loss: 20 dB multimode, 35 dB single-mode, 55 dB APC; splices 20/35 dB", () => {
    expect(tiaMm.limits.reflectanceMaxDb.multimode.value).toBe(-20); // ANSI/TIA-568.3-D (ref §2: from memory)
    expect(tiaOsp.limits.reflectanceMaxDb.upc.value).toBe(-35); // ANSI/TIA-568.3-D (ref §2: from memory)
    expect(tiaOsp.limits.reflectanceMaxDb.apc.value).toBe(-55); // ANSI/TIA-568.3-D (ref §2: from memory)
    expect(tiaOsp.limits.spliceReflectanceMaxDb?.singlemode.value).toBe(-35); // ANSI/TIA-568.3-D (ref §2: from memory)
    expect(tiaMm.limits.spliceReflectanceMaxDb?.multimode.value).toBe(-20); // ANSI/TIA-568.3-D (ref §2: from memory)
  });

  it("ISO/IEC 14763-3 reference-grade to standard-grade end connections: 0.3 dB MM, 0.5 dB SM", () => {
    expect(iso.limits.endConnectionLossDb?.multimode.value).toBe(0.3); // ISO/IEC 14763-3 (ref §2: from memory)
    expect(iso.limits.endConnectionLossDb?.singlemode.value).toBe(0.5); // ISO/IEC 14763-3 (ref §2: from memory)
    expect(iso.limits.connectorLossDb.value).toBe(0.75); // ISO/IEC 11801-1 channel planning (ref §2: partly seen)
  });

  it("ITU planning: 0.5 dB per connection (G.671 as cited), SM splice 0.15 dB (FOA planning value)", () => {
    expect(gpon.limits.connectorLossDb.value).toBe(0.5); // ITU-T G.671 as cited by a trade-association article (ref §2: seen)
    expect(gpon.limits.spliceLossDb.value).toBe(0.15); // FOA Reference Guide SM splice (ref §2: seen)
  });
});

describe("IEEE 802.3 application limits (ref §4)", () => {
  it("10GBASE-SR: 300 m / 2.6 dB on OM3, 400 m / 2.9 dB on OM4 at 850 nm", () => {
    expect(app(ieee, "10GBASE-SR", "OM3")).toMatchObject({ reachM: 300, lossDb: 2.6, nm: 850 }); // IEEE 802.3 Cl. 52 (ref §4: 300 m seen, 2.6 dB from memory)
    expect(app(ieee, "10GBASE-SR", "OM4")).toMatchObject({ reachM: 400, lossDb: 2.9, nm: 850 }); // IEEE 802.3 Cl. 52 (ref §4: seen)
  });

  it("40GBASE-SR4: 100 m / 1.9 dB on OM3, 150 m / 1.5 dB on OM4", () => {
    expect(app(ieee, "40GBASE-SR4", "OM3")).toMatchObject({ reachM: 100, lossDb: 1.9 }); // IEEE 802.3 Cl. 86 (ref §4: reach seen, IL from memory)
    expect(app(ieee, "40GBASE-SR4", "OM4")).toMatchObject({ reachM: 150, lossDb: 1.5 }); // IEEE 802.3 Cl. 86 (ref §4: seen)
  });

  it("25GBASE-SR and 100GBASE-SR4: 70 m / 1.8 dB on OM3, 100 m / 1.9 dB on OM4", () => {
    for (const a of ["25GBASE-SR", "100GBASE-SR4"]) {
      expect(app(ieee, a, "OM3")).toMatchObject({ reachM: 70, lossDb: 1.8 }); // IEEE 802.3 Cl. 112 / Cl. 95 (ref §4: from memory)
      expect(app(ieee, a, "OM4")).toMatchObject({ reachM: 100, lossDb: 1.9 }); // IEEE 802.3 Cl. 112 / Cl. 95 (ref §4: 25G OM4 seen)
    }
  });

  it("400GBASE-SR8: 0.5-70 m / 1.8 dB on OM3, 0.5-100 m / 1.9 dB on OM4 and OM5", () => {
    expect(app(ieee, "400GBASE-SR8", "OM3")).toMatchObject({ reachM: 70, lossDb: 1.8, minM: 0.5 }); // IEEE 802.3 Cl. 138 (ref §4: seen)
    expect(app(ieee, "400GBASE-SR8", "OM5")).toMatchObject({ reachM: 100, lossDb: 1.9, minM: 0.5 }); // IEEE 802.3 Cl. 138 (ref §4: seen)
  });

  it("single-mode PHYs: 10GBASE-LR 10 km / 6.2 dB, 100GBASE-LR4 10 km / 6.3 dB, 400GBASE-DR4 500 m / 3.0 dB, 1000BASE-LX 5 km / 4.56 dB", () => {
    expect(app(ieee, "10GBASE-LR", "OS2")).toMatchObject({ reachM: 10000, lossDb: 6.2, nm: 1310 }); // IEEE 802.3 Cl. 52 (ref §4: from memory)
    expect(app(ieee, "100GBASE-LR4", "OS2")).toMatchObject({ reachM: 10000, lossDb: 6.3 }); // IEEE 802.3 Cl. 88 (ref §4: from memory)
    expect(app(ieee, "400GBASE-DR4", "OS2")).toMatchObject({ reachM: 500, lossDb: 3.0 }); // IEEE 802.3 Cl. 124 (ref §4: from memory, reach corroborated)
    expect(app(ieee, "1000BASE-LX", "OS2")).toMatchObject({ reachM: 5000, lossDb: 4.56 }); // IEEE 802.3 Table 38-10 (ref §4: from memory)
    expect(app(ieee, "1000BASE-LX", "OM2")).toMatchObject({ reachM: 550, lossDb: 2.35, nm: 1300 }); // IEEE 802.3 Table 38-10 (ref §4: from memory)
  });

  it("1000BASE-SX: 275 m / 2.53 dB on 62.5 um (OM1), 550 m / 3.43 dB on 50 um 500 MHz.km", () => {
    expect(app(ieee, "1000BASE-SX", "OM1")).toMatchObject({ reachM: 275, lossDb: 2.53 }); // IEEE 802.3 Tables 38-2/38-6 (ref §4: from memory)
    expect(app(ieee, "1000BASE-SX", "OM2")).toMatchObject({ reachM: 550, lossDb: 3.43 }); // IEEE 802.3 Tables 38-2/38-6 (ref §4: 550 m seen)
  });

  it("does not offer multimode PHYs on single-mode fibre", () => {
    expect(ieee.limits.applications.some((a) => a.application === "10GBASE-SR" && a.fibreTypes.includes("OS2"))).toBe(false);
  });
});

describe("PON ODN classes (ref §5)", () => {
  it("G-PON (ITU-T G.984.2 cl. 8.2.7.1): A 5-20, B 10-25, C 15-30, B+ 13-28, C+ 17-32 dB", () => {
    const range = (c: string) => [pon(gpon, c).minLossDb.value, pon(gpon, c).maxLossDb.value];
    expect(range("A")).toEqual([5, 20]); // ITU-T G.984.2 (ref §5: seen)
    expect(range("B")).toEqual([10, 25]); // ITU-T G.984.2 (ref §5: seen)
    expect(range("C")).toEqual([15, 30]); // ITU-T G.984.2 (ref §5: seen)
    expect(range("B+")).toEqual([13, 28]); // ITU-T G.984.2 Amd.1 (ref §5: 28 seen, 13 from memory)
    expect(range("C+")).toEqual([17, 32]); // ITU-T G.984.2 Amd.2 (ref §5: 32 seen, 17 from memory)
    expect(gpon.limits.defaultPonClass).toBe("B+");
  });

  it("XGS-PON (ITU-T G.9807.1 / G.987.2 cl. 6.1): N1 14-29, N2 16-31, E1 18-33, E2 20-35 dB", () => {
    const range = (c: string) => [pon(xgs, c).minLossDb.value, pon(xgs, c).maxLossDb.value];
    expect(range("N1")).toEqual([14, 29]); // ITU-T G.987.2 cl. 6.1 (ref §5: seen)
    expect(range("N2")).toEqual([16, 31]); // (ref §5: seen)
    expect(range("E1")).toEqual([18, 33]); // (ref §5: seen)
    expect(range("E2")).toEqual([20, 35]); // (ref §5: seen)
  });

  it("G-PON ODN optical return loss at least 32 dB and discrete reflectance at most -35 dB", () => {
    expect(gpon.limits.orlMinDb.singlemode?.value).toBe(32); // ITU-T G.984.2 cl. 8.2.7.2 (ref §5: clause seen, value from memory)
    expect(gpon.limits.reflectanceMaxDb.upc.value).toBe(-35); // ITU-T G.984.2 cl. 8.2.7.3 (ref §5: clause seen, value from memory)
  });

  it("splitter excess allowance reproduces the upper end of typical PLC losses within 0.5 dB", () => {
    // ref §5: typical PLC splitter maxima 1:2 3.8, 1:4 7.2, 1:8 10.8, 1:16 14.5, 1:32 17.5, 1:64 21.0, 1:128 24.5 dB (seen, industry practice)
    const perStage = gpon.limits.splitterExcessLossDbPerStage.value;
    const typicalMax: Record<number, number> = { 2: 3.8, 4: 7.2, 8: 10.8, 16: 14.5, 32: 17.5, 64: 21.0, 128: 24.5 };
    for (const [n, max] of Object.entries(typicalMax)) {
      const allowance = 10 * Math.log10(Number(n)) + perStage * Math.log2(Number(n));
      expect(Math.abs(allowance - max)).toBeLessThanOrEqual(0.5);
    }
  });
});
