// Varied, plausible single-mode outside-plant link tests for previews, replays and benchmarks. An invented
// scenario (Northmere's feeder routes), seeded so every run sees the same links.
import type { LinkTest } from "@/lib/grading/schema";
import { seededRandom } from "@/lib/seeded-random";

export { seededRandom };

const round = (x: number, places = 2) => Math.round(x * 10 ** places) / 10 ** places;

/** Link number `i` of a family of links; `rand` decides how healthy it is. */
export function syntheticLinkTest(i: number, rand: () => number): LinkTest {
  const lengthM = Math.round(800 + rand() * 14_000);
  const splices = Math.max(1, Math.floor(lengthM / 2000));
  const health = rand();
  // Most links are clean, some have one lossy splice, a few a bad connector.
  const badSplice = health > 0.75 ? round(0.2 + rand() * 0.5) : null;
  const badConnector = health > 0.93 ? round(0.6 + rand() * 0.6) : null;
  const events: NonNullable<LinkTest["events"]> = [];
  const measurements: LinkTest["measurements"] = [];
  for (const [wavelengthNm, coeff] of [[1310, 0.33], [1550, 0.2]] as const) {
    let total = 0;
    const conLoss = round(0.15 + rand() * 0.2);
    events.push({ wavelengthNm, positionM: 0, kind: "connector", lossDb: conLoss, reflectanceDb: round(-52 - rand() * 6, 1) });
    total += conLoss;
    for (let s = 1; s <= splices; s++) {
      const loss = s === 1 && badSplice !== null ? badSplice : round(0.02 + rand() * 0.08);
      events.push({ wavelengthNm, positionM: Math.round((lengthM * s) / (splices + 1)), kind: "splice", lossDb: loss });
      total += loss;
    }
    const farLoss = badConnector ?? round(0.15 + rand() * 0.2);
    events.push({ wavelengthNm, positionM: lengthM, kind: "connector", lossDb: farLoss, reflectanceDb: round(-50 - rand() * 6, 1) });
    total += farLoss + (coeff * lengthM) / 1000;
    measurements.push({ wavelengthNm, direction: "AB", method: "one-cord", insertionLossDb: round(total + (rand() - 0.5) * 0.1), orlDb: round(38 + rand() * 6, 1), lengthM });
  }
  return {
    link: { ref: `NM-FDR-${String(i).padStart(6, "0")}`, fibreType: "OS2", designLengthM: lengthM, connectorPairs: 2, splices, polish: "UPC" },
    measurements,
    events,
  };
}

export function syntheticLinkTests(count: number, seed = 7, offset = 0): LinkTest[] {
  const rand = seededRandom(seed);
  return Array.from({ length: count }, (_, i) => syntheticLinkTest(offset + i, rand));
}
