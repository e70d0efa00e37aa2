// Benchmark: grading cost against the JSON round trip of the same inputs, in one process.
//   npm run bench:grading            (100 000 tests)
//   npm run bench:grading -- 20000   (fewer, for a quick look)
// Prints tests per second for both and the ratio grading / JSON (goal: <= 1.0). Figures depend on
// the machine; the ratio is what to compare between runs.
import { performance } from "node:perf_hooks";
import { findTemplate, grade, LinkTestSchema, type LinkTest, type Profile } from "../../lib/grading";

const COUNT = Number(process.argv[2] ?? 100_000);
const ROUNDS = 3;

// Small deterministic PRNG (mulberry32) so every run grades the same tests.
function prng(seed: number) {
  return () => {
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const KINDS = ["connector", "splice", "splice", "non-reflective", "bend", "reflective"] as const;

function syntheticTests(n: number): LinkTest[] {
  const rnd = prng(20261201);
  const r2 = (x: number) => Math.round(x * 100) / 100;
  const tests: LinkTest[] = [];
  for (let i = 0; i < n; i++) {
    const lengthM = Math.round(200 + rnd() * 30_000);
    const nEvents = 4 + Math.floor(rnd() * 17); // 4..20 events
    const wavelengths = [1310, 1550];
    const events: LinkTest["events"] = [];
    for (let e = 0; e < nEvents; e++) {
      const nm = wavelengths[e % 2];
      const site = Math.floor(e / 2);
      const kind = site === 0 ? "connector" : KINDS[Math.floor(rnd() * KINDS.length)];
      events.push({
        wavelengthNm: nm,
        direction: rnd() < 0.8 ? "AB" : "BA",
        positionM: Math.round(((site + 0.5) / Math.ceil(nEvents / 2)) * lengthM),
        kind,
        lossDb: r2(rnd() < 0.05 ? -0.05 : rnd() * (kind === "connector" ? 0.9 : 0.35)),
        reflectanceDb: kind === "connector" || kind === "reflective" ? r2(-65 + rnd() * 30) : undefined,
      });
    }
    tests.push({
      link: {
        ref: `bench-${i}`,
        fibreType: "OS2",
        designLengthM: Math.round(lengthM * (0.97 + rnd() * 0.06)),
        connectorPairs: 2 + Math.floor(rnd() * 3),
        splices: Math.floor(rnd() * 8),
        polish: rnd() < 0.3 ? "APC" : "UPC",
        application: rnd() < 0.2 ? "10GBASE-LR" : undefined,
      },
      measurements: wavelengths.map((nm) => ({
        wavelengthNm: nm,
        direction: "AB" as const,
        method: "one-cord" as const,
        insertionLossDb: r2((lengthM / 1000) * (nm === 1310 ? 0.35 : 0.22) + 1 + rnd() * 2),
        orlDb: r2(30 + rnd() * 20),
        lengthM,
      })),
      events,
    });
  }
  return tests;
}

function time(label: string, fn: () => number): number {
  let best = Infinity;
  let sink = 0;
  for (let r = 0; r < ROUNDS; r++) {
    const t0 = performance.now();
    sink += fn();
    best = Math.min(best, performance.now() - t0);
  }
  if (sink === -1) console.log(label); // keeps the work observable to the optimiser
  return best;
}

const tests = syntheticTests(COUNT);
// Check a sample really is valid input, so the benchmark grades what the API would accept.
for (let i = 0; i < tests.length; i += Math.max(1, Math.floor(tests.length / 200))) LinkTestSchema.parse(tests[i]);
const profiles = ["tia-568-3-d-singlemode-osp", "iso-iec-11801-1-14763-3", "ieee-802-3-applications"].map((s) => findTemplate(s) as Profile);

// Warm both paths up before measuring.
for (let i = 0; i < Math.min(5000, tests.length); i++) {
  grade(tests[i], profiles[i % 3]);
  JSON.parse(JSON.stringify(tests[i]));
}

const gradeMs = time("grade", () => {
  let n = 0;
  for (let i = 0; i < tests.length; i++) n += grade(tests[i], profiles[i % 3]).reasons.length;
  return n;
});
const jsonMs = time("json", () => {
  let n = 0;
  for (let i = 0; i < tests.length; i++) n += (JSON.parse(JSON.stringify(tests[i])) as LinkTest).measurements.length;
  return n;
});

const perSec = (ms: number) => Math.round((tests.length / ms) * 1000);
console.log(`tests: ${tests.length} (2 wavelengths, 4-20 events each), best of ${ROUNDS} rounds, node ${process.version}`);
console.log(`grading:          ${perSec(gradeMs).toLocaleString("en")} tests/s (${gradeMs.toFixed(0)} ms)`);
console.log(`JSON round trip:  ${perSec(jsonMs).toLocaleString("en")} tests/s (${jsonMs.toFixed(0)} ms)`);
console.log(`ratio grading / JSON round trip: ${(gradeMs / jsonMs).toFixed(2)} (goal <= 1.00)`);
