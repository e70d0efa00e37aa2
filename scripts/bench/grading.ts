// Benchmark: grading cost against the JSON round trip of the same inputs, in one process.
//   npm run bench:grading            (100 000 tests)
//   npm run bench:grading -- 20000   (fewer, for a quick look)
// Prints tests per second for both and the ratio grading / JSON (goal: <= 1.0). Figures depend on
// the machine; the ratio is what to compare between runs.
//
// The engine is measured twice: as tsx loads it (each file turned into its own CommonJS module, so
// every call across files goes through an export getter) and bundled into one module by esbuild,
// which is how `next build` ships it. The goal applies to the bundled figure.
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { performance } from "node:perf_hooks";
import { pathToFileURL } from "node:url";
import * as engine from "../../lib/grading";
import { findTemplate, LinkTestSchema, type GradingResult, type LinkTest, type Profile } from "../../lib/grading";

type Grade = (test: LinkTest, profile: Profile) => GradingResult;

const COUNT = Number(process.argv[2] ?? 100_000);
const ROUNDS = 5;

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

// The two workloads alternate in chunks of CHUNK tests, so that both see the same machine load
// (other processes, CPU frequency) and the ratio stays meaningful on a busy machine.
const CHUNK = 500;
let sink = 0;

function measure(grade: Grade, tests: LinkTest[], profiles: Profile[]): { gradeMs: number; jsonMs: number } {
  let gradeMs = 0;
  let jsonMs = 0;
  for (let start = 0; start < tests.length; start += CHUNK) {
    const end = Math.min(tests.length, start + CHUNK);
    let t0 = performance.now();
    for (let i = start; i < end; i++) sink += grade(tests[i], profiles[i % profiles.length]).reasons.length;
    gradeMs += performance.now() - t0;
    t0 = performance.now();
    for (let i = start; i < end; i++) sink += (JSON.parse(JSON.stringify(tests[i])) as LinkTest).measurements.length;
    jsonMs += performance.now() - t0;
  }
  return { gradeMs, jsonMs };
}

/** The engine bundled into a single ES module, loaded from a temporary file. */
// esbuild arrives with tsx (and vite); it is not a direct dependency, so its absence only skips the
// bundled figure.
async function bundledGrade(): Promise<Grade | undefined> {
  let build: typeof import("esbuild").build;
  try {
    ({ build } = await import("esbuild"));
  } catch {
    console.log("esbuild is not installed: the bundled figure is skipped");
    return undefined;
  }
  const out = await build({
    entryPoints: [path.join(import.meta.dirname ?? __dirname, "../../lib/grading/index.ts")],
    bundle: true,
    format: "esm",
    platform: "node",
    write: false,
    logLevel: "warning",
  });
  const dir = mkdtempSync(path.join(tmpdir(), "glassgrade-bench-"));
  try {
    const file = path.join(dir, "grading.mjs");
    writeFileSync(file, out.outputFiles[0].text);
    const mod = (await import(pathToFileURL(file).href)) as { grade: Grade };
    return mod.grade;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

function run(label: string, grade: Grade, tests: LinkTest[], profiles: Profile[]): number {
  for (let i = 0; i < Math.min(5000, tests.length); i++) {
    grade(tests[i], profiles[i % profiles.length]);
    JSON.parse(JSON.stringify(tests[i]));
  }
  const rounds = Array.from({ length: ROUNDS }, () => measure(grade, tests, profiles));
  rounds.sort((a, b) => a.gradeMs / a.jsonMs - b.gradeMs / b.jsonMs);
  const { gradeMs, jsonMs } = rounds[Math.floor(ROUNDS / 2)];
  const perSec = (ms: number) => Math.round((tests.length / ms) * 1000).toLocaleString("en");
  console.log(`${label}`);
  console.log(`  grading:          ${perSec(gradeMs)} tests/s (${gradeMs.toFixed(0)} ms)`);
  console.log(`  JSON round trip:  ${perSec(jsonMs)} tests/s (${jsonMs.toFixed(0)} ms)`);
  console.log(`  ratio grading / JSON round trip: ${(gradeMs / jsonMs).toFixed(2)}`);
  return gradeMs / jsonMs;
}

async function main() {
  const tests = syntheticTests(COUNT);
  // Check a sample really is valid input, so the benchmark grades what the API would accept.
  for (let i = 0; i < tests.length; i += Math.max(1, Math.floor(tests.length / 200))) LinkTestSchema.parse(tests[i]);
  const profiles = ["tia-568-3-d-singlemode-osp", "iso-iec-11801-1-14763-3", "ieee-802-3-applications"].map((s) => findTemplate(s) as Profile);

  console.log(`tests: ${tests.length} (2 wavelengths, 4-20 events each), median of ${ROUNDS} interleaved rounds, node ${process.version}`);
  run("engine as loaded by tsx (one CommonJS module per file)", engine.grade, tests, profiles);
  const bundledEngine = await bundledGrade();
  if (bundledEngine) {
    const bundled = run("engine bundled into one module (as next build ships it)", bundledEngine, tests, profiles);
    console.log(`goal (bundled ratio <= 1.00): ${bundled <= 1 ? "met" : "not met"}`);
  }
  if (sink === -1) console.log("unreachable"); // keeps the work observable to the optimiser
}

main().catch((err) => {
  console.error(err);
  process.exitCode = 1;
});
