// Invented link tests for the API suites. Values are chosen against the TIA single-mode OSP template:
// budget = 0.5 dB/km x length + 0.75 dB per connector pair + 0.3 dB per splice (ANSI/TIA-568.3-D, as the
// template cites it), so the verdict of each fixture is known before grading.
import type { LinkTest } from "@/lib/grading/schema";

export function passingTest(ref = "T-PASS-1"): LinkTest {
  // 2 km, 2 pairs, 2 splices: budget 1.0 + 1.5 + 0.6 = 3.1 dB; 1.2 dB measured leaves ample headroom.
  return {
    link: { ref, fibreType: "OS2", designLengthM: 2000, connectorPairs: 2, splices: 2 },
    measurements: [
      { wavelengthNm: 1310, method: "one-cord", insertionLossDb: 1.2, lengthM: 2000 },
      { wavelengthNm: 1550, method: "one-cord", insertionLossDb: 1.0, lengthM: 2000 },
    ],
  };
}

export function failingTest(ref = "T-FAIL-1"): LinkTest {
  // Same link, 6.5 dB measured: more than 3 dB over the 3.1 dB budget.
  return {
    link: { ref, fibreType: "OS2", designLengthM: 2000, connectorPairs: 2, splices: 2 },
    measurements: [
      { wavelengthNm: 1310, method: "one-cord", insertionLossDb: 6.5, lengthM: 2000 },
      { wavelengthNm: 1550, method: "one-cord", insertionLossDb: 6.2, lengthM: 2000 },
    ],
  };
}
