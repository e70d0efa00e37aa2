// Physically impossible or malformed input is rejected by the schema, with the offending field in
// the issue path and named in the message.
import { describe, expect, it } from "vitest";
import { LinkTestSchema, ProfileSchema, templates } from "@/lib/grading";

const base = () => ({
  link: { ref: "T-1", fibreType: "OS2", designLengthM: 1000 },
  measurements: [{ wavelengthNm: 1310, insertionLossDb: 1.2, lengthM: 1000 }],
  events: [{ wavelengthNm: 1310, positionM: 500, kind: "splice", lossDb: 0.05 }],
});

function issuesOf(input: unknown) {
  const r = LinkTestSchema.safeParse(input);
  expect(r.success).toBe(false);
  return r.success ? [] : r.error.issues.map((i) => ({ path: i.path.join("."), message: i.message }));
}

describe("LinkTestSchema", () => {
  it("accepts a plain valid test", () => {
    expect(LinkTestSchema.safeParse(base()).success).toBe(true);
  });

  it("rejects a negative length, naming the field", () => {
    const t = base();
    t.measurements[0].lengthM = -5;
    expect(issuesOf(t)).toContainEqual({ path: "measurements.0.lengthM", message: expect.stringContaining("lengthM") });
    const d = base();
    d.link.designLengthM = -1;
    expect(issuesOf(d)).toContainEqual({ path: "link.designLengthM", message: expect.stringContaining("designLengthM") });
  });

  it("rejects a reflectance above 0 dB (a passive event cannot return more than it receives)", () => {
    const t = { ...base(), events: [{ wavelengthNm: 1310, positionM: 10, kind: "connector", reflectanceDb: 3 }] };
    expect(issuesOf(t)).toContainEqual({ path: "events.0.reflectanceDb", message: expect.stringContaining("reflectanceDb") });
  });

  it("rejects an event beyond the link end", () => {
    const t = { ...base(), events: [{ wavelengthNm: 1310, positionM: 1500, kind: "splice", lossDb: 0.1 }] };
    expect(issuesOf(t)).toContainEqual({ path: "events.0.positionM", message: expect.stringMatching(/positionM .*beyond the link end/) });
  });

  it("allows an event within the 1 % / 2 m slack of the measured end (OTDR length accuracy)", () => {
    const t = { ...base(), events: [{ wavelengthNm: 1310, positionM: 1009, kind: "end", reflectanceDb: -45 }] };
    expect(LinkTestSchema.safeParse(t).success).toBe(true);
  });

  it("rejects a wavelength the fibre type cannot carry", () => {
    const t = base();
    t.measurements[0].wavelengthNm = 850;
    expect(issuesOf(t)).toContainEqual({ path: "measurements.0.wavelengthNm", message: expect.stringMatching(/wavelengthNm 850 .*OS2/) });
    const mm = { ...base(), link: { ref: "M", fibreType: "OM3" }, measurements: [{ wavelengthNm: 953, insertionLossDb: 1 }], events: [] };
    expect(issuesOf(mm)).toContainEqual({ path: "measurements.0.wavelengthNm", message: expect.stringMatching(/953 .*OM3/) });
    const om5 = { ...mm, link: { ref: "M", fibreType: "OM5" } };
    expect(LinkTestSchema.safeParse(om5).success).toBe(true);
  });

  it("rejects bad counts, ratios, ORL and readings with the field named", () => {
    const cases: [unknown, string][] = [
      [{ ...base(), link: { ...base().link, connectorPairs: -1 } }, "link.connectorPairs"],
      [{ ...base(), link: { ...base().link, splices: 1.5 } }, "link.splices"],
      [{ ...base(), link: { ...base().link, splitters: [{ ratio: "1x1" }] } }, "link.splitters.0.ratio"],
      [{ ...base(), link: { ...base().link, splitters: [{ ratio: "32" }] } }, "link.splitters.0.ratio"],
      [{ ...base(), measurements: [{ wavelengthNm: 1310, orlDb: -3 }] }, "measurements.0.orlDb"],
      [{ ...base(), measurements: [{ wavelengthNm: 1310, insertionLossDb: -2 }] }, "measurements.0.insertionLossDb"],
      [{ ...base(), powerReadings: [{ wavelengthNm: 1490, dbm: 45 }] }, "powerReadings.0.dbm"],
      [{ ...base(), measurements: [] }, "measurements"],
      [{ ...base(), link: { ref: "", fibreType: "OS2" } }, "link.ref"],
      [{ ...base(), link: { ref: "x", fibreType: "OS9" } }, "link.fibreType"],
    ];
    for (const [input, path] of cases) {
      const issues = issuesOf(input);
      expect(issues.map((i) => i.path), path).toContain(path);
    }
  });
});

describe("ProfileSchema", () => {
  it("accepts every built-in template", () => {
    for (const t of templates) expect(ProfileSchema.safeParse(t).success, t.slug).toBe(true);
  });

  it("rejects a limit without a source and an inverted PON range, naming the field", () => {
    const p = structuredClone(templates.find((t) => t.slug === "itu-t-g984-2-gpon")!);
    (p.limits.connectorLossDb as { source: string }).source = "";
    p.limits.ponClasses[0].minLossDb.value = 40;
    const r = ProfileSchema.safeParse(p);
    expect(r.success).toBe(false);
    const paths = r.success ? [] : r.error.issues.map((i) => i.path.join("."));
    expect(paths).toContain("limits.connectorLossDb.source");
    expect(paths).toContain("limits.ponClasses.0.minLossDb.value");
  });

  it("rejects a positive reflectance limit and a negative attenuation", () => {
    const p = structuredClone(templates[0]);
    p.limits.reflectanceMaxDb.upc.value = 5;
    p.limits.attenuation[0].maxDbPerKm = -1;
    const r = ProfileSchema.safeParse(p);
    const paths = r.success ? [] : r.error.issues.map((i) => i.path.join("."));
    expect(paths).toContain("limits.reflectanceMaxDb.upc.value");
    expect(paths).toContain("limits.attenuation.0.maxDbPerKm");
  });
});
