// Benchmark of the grading API against `next start` and the real database.
//   npm run bench:api            (env: BENCH_PORT=3121 BENCH_DB=glassgrade_bench_api BENCH_REQUESTS=3000
//                                 BENCH_ROUNDS=6 BENCH_CONNECTIONS=10 BENCH_BATCH_CALLS=10 BENCH_BATCH_CONNECTIONS=2
//                                 NEXT_DIST_DIR=.next-bench)
// 1. GET /api/v1/health and POST /api/v1/gradings in interleaved rounds at the same concurrency: req/s,
//    p50 and p99 of each, and grading throughput as a ratio of health's (goal >= 0.60).
// 2. Row accounting: new verdicts == 2xx gradings, new call-log rows == all responses (goal: no loss).
// 3. POST /api/v1/gradings/batch with 1,000 tests per call: graded-and-stored tests/s and its ratio to
//    the single-call tests/s (goal >= 10).
// Figures are ratios within one run on one machine, never absolute promises.
import { execFileSync, spawn } from "node:child_process";
import { existsSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import autocannon, { type Result } from "autocannon";
import { count, eq, inArray } from "drizzle-orm";

const ROOT = path.resolve(import.meta.dirname, "../..");
const PORT = Number(process.env.BENCH_PORT ?? 3121);
const DB_NAME = process.env.BENCH_DB ?? "glassgrade_bench_api";
// A fixed number of requests (not a duration) so every response is counted and rows can be reconciled.
const REQUESTS = Number(process.env.BENCH_REQUESTS ?? 3000);
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 10);
const BATCH_CALLS = Number(process.env.BENCH_BATCH_CALLS ?? 10);
const BATCH_CONNECTIONS = Number(process.env.BENCH_BATCH_CONNECTIONS ?? 2);
const DIST = process.env.NEXT_DIST_DIR ?? ".next-bench";
const URL_BASE = `http://127.0.0.1:${PORT}`;

function sh(cmd: string, args: string[], env: NodeJS.ProcessEnv = process.env) {
  execFileSync(cmd, args, { cwd: ROOT, stdio: "inherit", env });
}

function test(i: number) {
  const length = 1000 + (i % 50) * 137;
  return {
    link: { ref: `BENCH-${i}`, fibreType: "OS2", designLengthM: length, connectorPairs: 2, splices: 2 + (i % 4) },
    measurements: [
      { wavelengthNm: 1310, method: "one-cord", insertionLossDb: 1 + (i % 30) / 10, orlDb: 50, lengthM: length },
      { wavelengthNm: 1550, method: "one-cord", insertionLossDb: 0.8 + (i % 30) / 10, orlDb: 52, lengthM: length },
    ],
    events: Array.from({ length: 4 + (i % 8) }, (_, k) => ({
      wavelengthNm: 1310,
      positionM: Math.round(((k + 1) * length) / (6 + (i % 8))),
      kind: k === 0 ? "connector" : "splice",
      lossDb: k === 0 ? 0.3 : 0.05,
      ...(k === 0 ? { reflectanceDb: -55 } : {}),
    })),
  };
}

async function waitForHealth(timeoutMs: number) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    try {
      if ((await fetch(`${URL_BASE}/api/v1/health`)).ok) return;
    } catch {
      /* not up yet */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`next start did not answer on ${URL_BASE} within ${timeoutMs} ms`);
}

const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 6);

/** Rounds summed: req/s over the total time; p50 and p99 are the medians of the rounds' values. */
function combine(rounds: Result[]): Result {
  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
  const sum = (f: (r: Result) => number) => rounds.reduce((a, r) => a + f(r), 0);
  const seconds = sum((r) => r.duration);
  const responses = sum((r) => r["2xx"] + r.non2xx);
  return {
    ...rounds[0],
    requests: { ...rounds[0].requests, average: responses / seconds },
    latency: { ...rounds[0].latency, p50: median(rounds.map((r) => r.latency.p50)), p99: median(rounds.map((r) => r.latency.p99)) },
    duration: seconds,
    errors: sum((r) => r.errors),
    timeouts: sum((r) => r.timeouts),
    non2xx: sum((r) => r.non2xx),
    "2xx": sum((r) => r["2xx"]),
    "4xx": sum((r) => r["4xx"]),
    "5xx": sum((r) => r["5xx"]),
  };
}

function line(name: string, r: Result) {
  return `${name.padEnd(26)} ${r.requests.average.toFixed(0).padStart(7)} req/s   p50 ${String(r.latency.p50).padStart(4)} ms   p99 ${String(r.latency.p99).padStart(4)} ms   2xx ${r["2xx"]}  non-2xx ${r.non2xx}  errors ${r.errors}`;
}

async function main() {
  const databaseUrl = execFileSync("bash", ["scripts/pg.sh", "url", DB_NAME], { cwd: ROOT }).toString().trim();
  process.env.DATABASE_URL = databaseUrl;
  sh("bash", ["scripts/pg.sh", "start"]);
  execFileSync("bash", ["scripts/pg.sh", "createdb", DB_NAME], { cwd: ROOT, stdio: "ignore" });
  const { runMigrations } = await import("../../db/migrate");
  const { getDb, closeDb } = await import("../../db");
  const schema = await import("../../db/schema");
  const { generateApiKey } = await import("../../lib/keys/api-key");
  await runMigrations();

  const db = getDb();
  const [org] = await db.insert(schema.organisations).values({ slug: `bench-${Date.now()}`, name: "Benchmark organisation" }).returning();
  const k = generateApiKey("sandbox");
  // A high allowance: this run measures the API, not the rate limiter.
  await db.insert(schema.apiKeys).values({
    organisationId: org.id,
    name: "bench",
    environment: "sandbox",
    start: k.start,
    hash: k.hash,
    scopes: ["grade", "verdicts:read", "profiles:read"],
    rateLimitPerMinute: 100_000_000,
  });

  if (!existsSync(path.join(ROOT, DIST, "BUILD_ID"))) {
    console.log(`[bench] building the app into ${DIST}`);
    sh("npx", ["next", "build"], { ...process.env, NEXT_DIST_DIR: DIST, NEXT_TELEMETRY_DISABLED: "1" });
  }
  const server = spawn(process.execPath, [path.join(ROOT, "node_modules/next/dist/bin/next"), "start", "-p", String(PORT), "-H", "127.0.0.1"], {
    cwd: ROOT,
    env: { ...process.env, DATABASE_URL: databaseUrl, NEXT_DIST_DIR: DIST, NEXT_TELEMETRY_DISABLED: "1", NEXTAUTH_SECRET: "bench-only", NEXTAUTH_URL: URL_BASE },
    stdio: ["ignore", "ignore", "inherit"],
  });
  try {
    await waitForHealth(60_000);
    const auth = { authorization: `Bearer ${k.secret}`, "content-type": "application/json" };
    let n = 0;
    const gradingRequest = {
      method: "POST",
      path: "/api/v1/gradings",
      headers: auth,
      setupRequest: (req: object) => ({ ...req, body: JSON.stringify({ test: test(n++) }) }),
    };

    const callLogRows = async () => {
      const [r] = await db
        .select({ n: count() })
        .from(schema.callLog)
        .where(inArray(schema.callLog.route, ["/api/v1/health", "/api/v1/gradings", "/api/v1/gradings/batch"]));
      return r.n;
    };
    const verdictRows = async () => {
      const [r] = await db.select({ n: count() }).from(schema.verdicts).where(eq(schema.verdicts.organisationId, org.id));
      return r.n;
    };

    // Warm-up: JIT, connection pool, route modules.
    await autocannon({ url: `${URL_BASE}/api/v1/health`, connections: CONNECTIONS, amount: 500 });
    await autocannon({ url: URL_BASE, connections: CONNECTIONS, amount: 500, requests: [gradingRequest] });

    const logBefore = await callLogRows();
    const verdictsBefore = await verdictRows();
    // Interleaved rounds, so both routes see the same background load on a shared machine.
    const healthRounds: Result[] = [];
    const gradingRounds: Result[] = [];
    const perRound = Math.ceil(REQUESTS / ROUNDS);
    for (let r = 0; r < ROUNDS; r++) {
      healthRounds.push(await autocannon({ url: `${URL_BASE}/api/v1/health`, connections: CONNECTIONS, amount: perRound }));
      gradingRounds.push(await autocannon({ url: URL_BASE, connections: CONNECTIONS, amount: perRound, requests: [gradingRequest] }));
    }
    const health = combine(healthRounds);
    const grading = combine(gradingRounds);
    const logAfter = await callLogRows();
    const verdictsAfter = await verdictRows();

    const totalResponses = health["2xx"] + health.non2xx + grading["2xx"] + grading.non2xx;
    const ratio = grading.requests.average / health.requests.average;
    console.log(`\nGlassgrade API benchmark: ${CONNECTIONS} connections, ${REQUESTS} requests per route in ${ROUNDS} interleaved rounds, node ${process.version}, ${DIST}`);
    // Other work on the machine slows both routes; the ratios are what carry over between machines.
    console.log(`machine: ${os.cpus().length} cores, load average ${os.loadavg().map((l) => l.toFixed(1)).join(" / ")}`);
    console.log(line("GET  /api/v1/health", health));
    console.log(line("POST /api/v1/gradings", grading));
    console.log(`grading / health throughput: ${ratio.toFixed(2)} (goal >= 0.60) ${ratio >= 0.6 ? "MET" : "NOT MET"}`);
    const lostVerdicts = grading["2xx"] - (verdictsAfter - verdictsBefore);
    const lostLog = totalResponses - (logAfter - logBefore);
    console.log(`verdict rows added ${verdictsAfter - verdictsBefore} for ${grading["2xx"]} 2xx gradings; call-log rows added ${logAfter - logBefore} for ${totalResponses} responses -> ${lostVerdicts === 0 && lostLog === 0 ? "no rows lost" : `MISMATCH (verdicts ${lostVerdicts}, call log ${lostLog})`}`);

    // Batch: 1,000 tests per call, sequential calls, counted by what was stored.
    const batchVerdictsBefore = await verdictRows();
    const bodies = Array.from({ length: BATCH_CALLS }, (_, c) => JSON.stringify({ tests: Array.from({ length: 1000 }, (_, i) => test(1_000_000 + c * 1000 + i)) }));
    const started = performance.now();
    let graded = 0;
    let next = 0;
    // A few calls in flight, as an integrator's uploader would run them: one call's grading overlaps
    // another's database write.
    const worker = async () => {
      while (next < bodies.length) {
        const body = bodies[next++];
        const res = await fetch(`${URL_BASE}/api/v1/gradings/batch`, { method: "POST", headers: auth, body });
        const json = (await res.json()) as { graded?: number };
        if (res.status !== 201) throw new Error(`batch call answered ${res.status}`);
        graded += json.graded ?? 0;
      }
    };
    await Promise.all(Array.from({ length: BATCH_CONNECTIONS }, worker));
    const seconds = (performance.now() - started) / 1000;
    const stored = (await verdictRows()) - batchVerdictsBefore;
    const batchRate = stored / seconds;
    const batchRatio = batchRate / grading.requests.average;
    console.log(`POST /api/v1/gradings/batch  ${BATCH_CALLS} calls x 1,000 tests, ${BATCH_CONNECTIONS} in flight: ${graded} graded, ${stored} stored in ${seconds.toFixed(2)} s -> ${batchRate.toFixed(0)} tests/s`);
    console.log(`batch tests/s / single-call tests/s: ${batchRatio.toFixed(1)} (goal >= 10) ${batchRatio >= 10 ? "MET" : "NOT MET"}`);
  } finally {
    server.kill("SIGTERM");
    await closeDb();
  }
}

main().catch((err) => {
  console.error("[bench] failed:", err);
  process.exitCode = 1;
});
