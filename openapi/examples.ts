// Example payloads for the API reference: an invented single-mode drop in a made-up town, graded for real
// when the document is built so the example response always matches the engine.
import { findTemplate, grade, resultDigest } from "@/lib/grading";
import type { LinkTest, Profile } from "@/lib/grading/schema";
import type { VerdictResource } from "@/lib/api/schemas/verdicts";

export const EXAMPLE_PROFILE = "tia-568-3-d-singlemode-osp";

export const exampleTest: LinkTest = {
  link: { ref: "NM-KIRKBY-0417", fibreType: "OS2", designLengthM: 2400, connectorPairs: 2, splices: 3, polish: "APC" },
  measurements: [
    { wavelengthNm: 1310, direction: "AB", method: "one-cord", insertionLossDb: 2.1, orlDb: 52, lengthM: 2412 },
    { wavelengthNm: 1550, direction: "AB", method: "one-cord", insertionLossDb: 1.8, orlDb: 54, lengthM: 2412 },
  ],
  events: [
    { wavelengthNm: 1310, positionM: 0, kind: "connector", lossDb: 0.3, reflectanceDb: -62 },
    { wavelengthNm: 1310, positionM: 812, kind: "splice", lossDb: 0.05 },
    { wavelengthNm: 1310, positionM: 1630, kind: "splice", lossDb: 0.08 },
    { wavelengthNm: 1310, positionM: 2050, kind: "splice", lossDb: 0.04 },
    { wavelengthNm: 1310, positionM: 2412, kind: "end", reflectanceDb: -58 },
  ],
};

export function exampleVerdict(): VerdictResource | undefined {
  const profile = findTemplate(EXAMPLE_PROFILE) as Profile | undefined;
  if (!profile) return undefined;
  try {
    const result = grade(exampleTest, profile);
    return {
      id: "0b8f3c1e-6d2a-4f7e-9a51-2c4d8e6f1a3b",
      seq: 1042,
      linkRef: exampleTest.link.ref,
      verdict: result.verdict,
      headroomDb: result.headroomDb,
      wavelengths: result.wavelengths,
      reasons: result.reasons,
      profile: result.profile,
      engineVersion: result.engineVersion,
      digest: resultDigest(result),
      prevDigest: null,
      createdAt: "2026-11-30T09:14:07.512Z",
    };
  } catch {
    return undefined;
  }
}
