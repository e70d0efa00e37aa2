// The decoder of the compact input copy that impact previews read. Its layout is written by the SQL
// function in db/migrations/0005_preview_input_packing.sql; tests/integration/verdicts/packed-input.test.ts
// checks the two against each other on a real database.
import { describe, expect, it } from "vitest";
import { EventSchema, InspectionSchema, LinkSchema, LinkTestSchema, MeasurementSchema, PowerReadingSchema, SplitterSchema } from "@/lib/grading/schema";
import { PACKED_FIELDS, unpackTestInput } from "@/lib/verdicts/packed-input";

describe("packed test input", () => {
  it("carries every field of the input schema, in its packed order (a new field must be added to the packing)", () => {
    expect([...PACKED_FIELDS.test].sort()).toEqual(Object.keys(LinkTestSchema.shape).sort());
    expect([...PACKED_FIELDS.link].sort()).toEqual(Object.keys(LinkSchema.shape).sort());
    expect([...PACKED_FIELDS.measurement].sort()).toEqual(Object.keys(MeasurementSchema.shape).sort());
    expect([...PACKED_FIELDS.event].sort()).toEqual(Object.keys(EventSchema.shape).sort());
    expect([...PACKED_FIELDS.powerReading].sort()).toEqual(Object.keys(PowerReadingSchema.shape).sort());
    expect([...PACKED_FIELDS.inspection].sort()).toEqual(Object.keys(InspectionSchema.shape).sort());
    // Splitters travel as their ratio alone.
    expect(Object.keys(SplitterSchema.shape)).toEqual(["ratio"]);
  });

  it("leaves off what the input did not carry and keeps empty lists", () => {
    const packed = '[1,["R-1","OS2",null,2,null,["1x32"],null,null,"B+"],[[1310,null,null,1.5,null,null]],[],null,[["A \\"end\\"","pass"]]]';
    expect(unpackTestInput(packed)).toStrictEqual({
      link: { ref: "R-1", fibreType: "OS2", connectorPairs: 2, splitters: [{ ratio: "1x32" }], ponClass: "B+" },
      measurements: [{ wavelengthNm: 1310, insertionLossDb: 1.5 }],
      events: [],
      inspections: [{ location: 'A "end"', result: "pass" }],
    });
  });

  it("decodes every position of measurements, events and power readings", () => {
    const packed = '[1,["L","OM4",120,1,0,null,"APC","10GBASE-SR",null],[[850,"BA","two-cord",2.01,30.5,121]],[[850,"AB",60.5,"splice",-0.02,-60]],[[1490,-21.5]],null]';
    const t = unpackTestInput(packed);
    expect(t.link).toStrictEqual({ ref: "L", fibreType: "OM4", designLengthM: 120, connectorPairs: 1, splices: 0, polish: "APC", application: "10GBASE-SR" });
    expect(t.measurements).toStrictEqual([{ wavelengthNm: 850, direction: "BA", method: "two-cord", insertionLossDb: 2.01, orlDb: 30.5, lengthM: 121 }]);
    expect(t.events).toStrictEqual([{ wavelengthNm: 850, direction: "AB", positionM: 60.5, kind: "splice", lossDb: -0.02, reflectanceDb: -60 }]);
    expect(t.powerReadings).toStrictEqual([{ wavelengthNm: 1490, dbm: -21.5 }]);
    expect("inspections" in t).toBe(false);
  });

  it("refuses a layout version it does not know", () => {
    expect(() => unpackTestInput('[2,["R","OS2"],[],null,null,null]')).toThrow(/version 2/);
  });
});
