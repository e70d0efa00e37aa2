import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { diffJson } from "@/lib/profiles/diff";

// The diff is our own tool (no published source): checked by examples and by properties.
describe("diffJson, limit by limit", () => {
  it("names a changed value by its path and shows before and after", () => {
    const a = { connectorLossDb: { value: 0.75, source: "TIA-568.3-D" } };
    const b = { connectorLossDb: { value: 0.5, source: "TIA-568.3-D" } };
    expect(diffJson(a, b)).toEqual([{ path: "connectorLossDb.value", kind: "changed", before: 0.75, after: 0.5 }]);
  });

  it("matches table rows by their identifying fields, not their position", () => {
    const row = (fibreTypes: string[], wavelengthNm: number, maxDbPerKm: number) => ({ fibreTypes, wavelengthNm, maxDbPerKm, source: "s" });
    const a = { attenuation: [row(["OM3", "OM4"], 850, 3), row(["OM3", "OM4"], 1300, 1.5)] };
    const b = { attenuation: [row(["OS2"], 1310, 0.4), row(["OM3", "OM4"], 850, 3), row(["OM3", "OM4"], 1300, 1.2)] };
    const changes = diffJson(a, b);
    expect(changes).toEqual([
      { path: "attenuation[OM3/OM4 1300 nm].maxDbPerKm", kind: "changed", before: 1.5, after: 1.2 },
      { path: "attenuation[OS2 1310 nm]", kind: "added", after: row(["OS2"], 1310, 0.4) },
    ]);
  });

  it("reports added and removed optional limits", () => {
    const a = { orlMinDb: { singlemode: { value: 27, source: "x" } } };
    const b = { orlMinDb: { multimode: { value: 20, source: "y" } } };
    expect(diffJson(a, b).map((c) => [c.path, c.kind])).toEqual([
      ["orlMinDb.singlemode", "removed"],
      ["orlMinDb.multimode", "added"],
    ]);
  });

  it("finds nothing between a document and its deep copy, and something whenever one leaf differs", () => {
    fc.assert(
      fc.property(fc.jsonValue(), (doc) => {
        expect(diffJson(doc, structuredClone(doc))).toEqual([]);
      }),
    );
    fc.assert(
      fc.property(fc.dictionary(fc.string({ minLength: 1 }), fc.integer()), fc.string({ minLength: 1 }), (doc, key) => {
        const changed = { ...doc, [key]: (doc[key] ?? 0) + 1 };
        const diff = diffJson(doc, changed);
        expect(diff).toHaveLength(1);
        expect(diff[0].after).toBe(changed[key]);
      }),
    );
  });
});
