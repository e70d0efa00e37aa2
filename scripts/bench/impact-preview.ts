// Benchmark: impact preview over 200,000 stored tests against the engine grading the same tests in memory.
//   npm run bench:impact              (200 000 tests; seeds its own database once, reuses it after)
//   npm run bench:impact -- 20000     (fewer, for a quick look)
//   npm run bench:impact -- 200000 --reseed
// Prints tests per second for the streamed preview (database read + JSON + grading) and for the engine
// alone, their ratio (goal: preview >= 0.5 x engine), and resident memory sampled during the preview
// (goal: flat, i.e. independent of the number of tests). Uses database glassgrade_bench_profiles on the
// project's private cluster; it never touches the demo or test databases.
import { execFileSync } from "node:child_process";
import path from "node:path";
import { performance } from "node:perf_hooks";

const COUNT = Number(process.argv.find((a) => /^\d+$/.test(a)) ?? 200_000);
const RESEED = process.argv.includes("--reseed");
const DB_NAME = process.env.BENCH_DB_NAME ?? "glassgrade_bench_profiles";
const ROOT = path.resolve(import.meta.dirname, "../..");
const PG = path.join(ROOT, "scripts/pg.sh");
const ORG_SLUG = "bench-profiles";
const PROFILE_SLUG = "bench-tight";

const mb = (bytes: number) => (bytes / 1024 / 1024).toFixed(0);

async function main() {
  execFileSync(PG, ["start"], { stdio: "inherit" });
  const url = execFileSync(PG, ["url", DB_NAME], { encoding: "utf8" }).trim();
  if (RESEED) execFileSync(PG, ["dropdb", DB_NAME], { stdio: "ignore" });
  try {
    execFileSync(PG, ["createdb", DB_NAME], { stdio: "ignore" });
  } catch {
    /* already there */
  }
  process.env.DATABASE_URL = url;

  const { runMigrations } = await import("../../db/migrate");
  const { getDb, closeDb } = await import("../../db");
  const { organisations, users, memberships } = await import("../../db/schema");
  const { eq, sql } = await import("drizzle-orm");
  const { findTemplate, grade } = await import("../../lib/grading");
  const { bulkAppendGraded } = await import("../../db/queries/bulk-load");
  const { resultDigest } = await import("../../lib/grading");
  const { syntheticLinkTest, seededRandom } = await import("../../tests/helpers/synthetic-links");
  const { cloneTemplate, saveDraft } = await import("../../lib/profiles/drafts");
  const { draftProfileFor, previewImpact } = await import("../../lib/profiles/impact-preview");
  const { defaultThreadCount, THREAD_HEAP_MB } = await import("../../lib/profiles/preview-threads");
  await runMigrations();
  const db = getDb();

  let [org] = await db.select().from(organisations).where(eq(organisations.slug, ORG_SLUG));
  if (!org) [org] = await db.insert(organisations).values({ slug: ORG_SLUG, name: "Bench organisation" }).returning();
  let [user] = await db.select().from(users).where(eq(users.email, "bench@bench.example"));
  if (!user) {
    [user] = await db.insert(users).values({ email: "bench@bench.example", name: "Bench engineer" }).returning();
    await db.insert(memberships).values({ organisationId: org.id, userId: user.id, role: "engineer" });
  }
  const ctx = { db, actor: { userId: user.id, organisationId: org.id, role: "engineer" as const } };
  const template = findTemplate("tia-568-3-d-singlemode-osp")!;

  const stored = Number((await db.execute<{ n: string }>(sql`select count(*) as n from verdicts where organisation_id = ${org.id}`)).rows[0].n);
  if (stored !== COUNT) {
    if (stored > 0) {
      console.log(`[bench] ${stored} tests stored, ${COUNT} wanted: run with --reseed`);
      process.exitCode = 1;
      await closeDb();
      return;
    }
    console.log(`[bench] seeding ${COUNT.toLocaleString("en-GB")} graded tests into ${DB_NAME} (once)…`);
    const rand = seededRandom(2026);
    const t0 = performance.now();
    const start = Date.now() - COUNT * 1000;
    for (let i = 0; i < COUNT; i += 5000) {
      const items = [];
      for (let j = i; j < Math.min(COUNT, i + 5000); j++) {
        const test = syntheticLinkTest(j, rand);
        const result = grade(test, template);
        items.push({ linkRef: test.link.ref, input: test, result, digest: resultDigest(result), createdAt: new Date(start + j * 1000) });
      }
      await bulkAppendGraded(db, org.id, items);
      process.stdout.write(`\r[bench] seeded ${(i + items.length).toLocaleString("en-GB")}`);
    }
    console.log(`\n[bench] seeded in ${((performance.now() - t0) / 1000).toFixed(1)} s`);
  }

  const existing = await db.execute(sql`select 1 from profiles where organisation_id = ${org.id} and slug = ${PROFILE_SLUG}`);
  if (existing.rows.length === 0) await cloneTemplate(ctx, { templateSlug: template.slug, slug: PROFILE_SLUG, name: "Bench: tighter splices" });
  const limits = structuredClone(template.limits);
  limits.spliceLossDb = { value: 0.15, source: "bench" };
  await saveDraft(ctx, PROFILE_SLUG, limits);
  const draft = await draftProfileFor(ctx, PROFILE_SLUG);

  // The engine alone on the same inputs (regenerated from the same seed), already in memory.
  const engineRun = () => {
    const rand = seededRandom(2026);
    const inputs = Array.from({ length: COUNT }, (_, j) => syntheticLinkTest(j, rand));
    let sink = 0;
    const e0 = performance.now();
    for (const t of inputs) sink += grade(t, draft).reasons.length;
    return { ms: performance.now() - e0, sink };
  };
  // The preview, streaming from PostgreSQL. Memory is sampled while it runs.
  const previewRun = async (threads?: number, limit: number | "all" = "all") => {
    const rssStart = process.memoryUsage().rss;
    const samples: number[] = [];
    const sampler = setInterval(() => samples.push(process.memoryUsage().rss), 50);
    const checkpoints: string[] = [];
    let nextCheckpoint = 0.25;
    const p0 = performance.now();
    let summary: { total: number; changed: number } | undefined;
    for await (const ev of previewImpact(ctx, draft, { limit, threads })) {
      if (ev.type === "progress" && ev.total > 0 && ev.done / ev.total >= nextCheckpoint) {
        checkpoints.push(`${Math.round(nextCheckpoint * 100)}%: ${mb(process.memoryUsage().rss)} MB`);
        nextCheckpoint += 0.25;
      }
      if (ev.type === "result") summary = ev.summary;
    }
    const ms = performance.now() - p0;
    clearInterval(sampler);
    return { ms, summary: summary!, rssStart, peakRss: Math.max(rssStart, ...samples), checkpoints };
  };

  // Warm both code paths so neither side pays the JIT's start-up cost (for the preview that includes
  // starting its grading threads, which then stay for the next preview, as in a running server), then
  // alternate preview and engine twice and average, so a machine that gets busier or quieter skews both
  // sides alike. The previews run first, before any 200k-test array exists, so their memory figures are their own.
  const rssBeforeThreads = process.memoryUsage().rss;
  for (const t of Array.from({ length: 2000 }, (_, j) => syntheticLinkTest(j, seededRandom(1)))) grade(t, draft);
  const coldStart = await previewRun(undefined, 20_000);
  const preview1 = await previewRun();
  const single1 = await previewRun(0);
  const engine1 = engineRun();
  const preview2 = await previewRun();
  const single2 = await previewRun(0);
  const engine2 = engineRun();
  const previewMs = (preview1.ms + preview2.ms) / 2;
  const engineMs = (engine1.ms + engine2.ms) / 2;
  const summary = preview1.summary;
  const sink = engine1.sink;
  const { rssStart, peakRss, checkpoints } = preview1;
  const singleMs = (single1.ms + single2.ms) / 2;
  const previewRate = (summary!.total / previewMs) * 1000;
  const singleRate = (single1.summary.total / singleMs) * 1000;
  if (single1.summary.changed !== summary.changed) throw new Error("the threaded and single-thread previews disagree");
  const engineRate = (COUNT / engineMs) * 1000;
  console.log(`\nImpact preview over ${summary!.total.toLocaleString("en-GB")} stored tests (${summary!.changed.toLocaleString("en-GB")} verdicts would change)`);
  console.log(`  preview (PostgreSQL stream + grade on ${defaultThreadCount()} thread(s)): ${previewRate.toFixed(0).padStart(8)} tests/s  (mean of ${(preview1.ms / 1000).toFixed(1)} s and ${(preview2.ms / 1000).toFixed(1)} s)`);
  console.log(`  preview graded on the request's thread only:   ${singleRate.toFixed(0).padStart(8)} tests/s  (mean of ${(single1.ms / 1000).toFixed(1)} s and ${(single2.ms / 1000).toFixed(1)} s)`);
  console.log(`  engine in memory, same inputs, one thread:     ${engineRate.toFixed(0).padStart(8)} tests/s  (mean of ${(engine1.ms / 1000).toFixed(1)} s and ${(engine2.ms / 1000).toFixed(1)} s)  [checksum ${sink}]`);
  console.log(`  ratio preview / engine:                        ${(previewRate / engineRate).toFixed(2)}  (goal >= 0.50)`);
  console.log(`  ratio single-thread preview / engine:          ${(singleRate / engineRate).toFixed(2)}`);
  // Only the first round's previews run before the engine's 200k-test array has ever existed, so only
  // their memory figures are the preview's own.
  console.log(`  single-thread preview: RSS ${mb(single1.rssStart)} MB before, peak ${mb(single1.peakRss)} MB; at ${single1.checkpoints.join(", ")}`);
  console.log(`  each grading thread's heap is capped at ${THREAD_HEAP_MB} MB`);
  console.log(`  first preview after start-up (20,000 tests, grading threads starting): ${(coldStart.ms / 1000).toFixed(1)} s`);
  console.log(`  RSS before any grading thread ${mb(rssBeforeThreads)} MB; before the measured preview ${mb(rssStart)} MB, peak during it ${mb(peakRss)} MB (+${mb(peakRss - rssStart)} MB); at ${checkpoints.join(", ")}`);
  await closeDb();
}

main().catch((err) => {
  console.error(err);
  process.exitCode = 1;
});
