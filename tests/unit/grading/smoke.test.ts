import { describe, expect, it } from "vitest";
import { findTemplate, grade, LinkTestSchema, ProfileSchema, templates, type LinkTest } from "@/lib/grading";

describe("grading engine basics", () => {
  it("every template is a valid profile", () => {
    for (const t of templates) expect(() => ProfileSchema.parse(t), t.slug).not.toThrow();
  });

  it("grades a 2 km OSP link against the TIA-568.3-D budget", () => {
    // Budget = 2 km x 0.5 dB/km + 2 x 0.75 dB + 2 x 0.3 dB = 3.1 dB (ANSI/TIA-568.3-D formula; values from memory / partly seen)
    const profile = findTemplate("tia-568-3-d-singlemode-osp")!;
    const test: LinkTest = LinkTestSchema.parse({
      link: { ref: "L1", fibreType: "OS2", connectorPairs: 2, splices: 2 },
      measurements: [
        { wavelengthNm: 1310, insertionLossDb: 2.0, lengthM: 2000 },
        { wavelengthNm: 1550, insertionLossDb: 3.5, lengthM: 2000 },
      ],
    });
    const r = grade(test, profile);
    expect(r.wavelengths.map((w) => w.budgetDb)).toEqual([3.1, 3.1]);
    expect(r.wavelengths[0].verdict).toBe("pass");
    expect(r.wavelengths[1].verdict).toBe("fail");
    expect(r.verdict).toBe("fail");
    expect(r.headroomDb).toBe(-0.4);
  });
});
