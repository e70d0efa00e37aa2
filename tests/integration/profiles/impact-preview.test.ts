import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db";
import { findTemplate, grade } from "@/lib/grading";
import type { Profile } from "@/lib/grading/schema";
import { ForbiddenError } from "@/lib/auth/errors";
import { cloneTemplate, saveDraft } from "@/lib/profiles/drafts";
import { draftProfileFor, previewImpact, relatedProfileSlugs, type PreviewEvent, type PreviewRequest, type PreviewSummary } from "@/lib/profiles/impact-preview";
import type { LinkTest } from "@/lib/grading/schema";
import { orgWithRoles, ospTemplate, storeHistory, type OrgWithRoles } from "../../helpers/profile-fixtures";

async function run(o: OrgWithRoles, profile: Profile, req: PreviewRequest) {
  const events: PreviewEvent[] = [];
  for await (const ev of previewImpact(o.ctx("engineer"), profile, req)) events.push(ev);
  const result = events.at(-1);
  if (result?.type !== "result") throw new Error("no result event");
  return { progress: events.filter((e) => e.type === "progress"), summary: result.summary as PreviewSummary };
}

/** The same comparison done the obvious way, all in memory: what the streamed preview must agree with. */
function expected(tests: LinkTest[], stored: Profile, draft: Profile) {
  const matrix: Record<string, number> = {};
  let changed = 0;
  for (const t of tests) {
    const before = grade(t, stored).verdict;
    const after = grade(t, draft).verdict;
    matrix[`${before}->${after}`] = (matrix[`${before}->${after}`] ?? 0) + 1;
    if (before !== after) changed++;
  }
  return { matrix, changed };
}

function flatten(summary: PreviewSummary) {
  const out: Record<string, number> = {};
  for (const [from, row] of Object.entries(summary.matrix)) for (const [to, n] of Object.entries(row)) if (n) out[`${from}->${to}`] = n;
  return out;
}

describe("impact preview", () => {
  let o: OrgWithRoles;
  let tests: LinkTest[];
  let draft: Profile;
  const end = new Date("2026-11-20T12:00:00Z");
  beforeAll(async () => {
    o = await orgWithRoles();
    tests = await storeHistory(o.org.id, 700, { end, seed: 11 });
    await cloneTemplate(o.ctx("engineer"), { templateSlug: ospTemplate().slug, slug: "tight-splices", name: "Tight splices" });
    const limits = structuredClone(ospTemplate().limits);
    limits.spliceLossDb = { value: 0.15, source: "test: tightened" };
    limits.connectorLossDb = { value: 0.5, source: "test: tightened" };
    await saveDraft(o.ctx("engineer"), "tight-splices", limits);
    draft = await draftProfileFor(o.ctx("engineer"), "tight-splices");
  });
  afterAll(async () => {
    await closeDb();
  });

  it("re-grades every stored test in small batches and agrees with an in-memory re-grade", async () => {
    const { progress, summary } = await run(o, draft, { limit: "all", batchSize: 64 });
    const want = expected(tests, ospTemplate(), draft);
    expect(summary.total).toBe(700);
    expect(summary.graded).toBe(700);
    expect(summary.failedToGrade).toBe(0);
    expect(flatten(summary)).toEqual(want.matrix);
    expect(summary.changed).toBe(want.changed);
    expect(summary.changed).toBeGreaterThan(0);
    expect(summary.changedLinks).toHaveLength(Math.min(500, want.changed));
    // Tightening can only make verdicts worse.
    for (const c of summary.changedLinks) expect(["pass->marginal", "pass->fail", "marginal->fail"]).toContain(`${c.before}->${c.after}`);
    // Progress: starts at zero, rises by batch, ends at the total.
    expect(progress[0]).toEqual({ type: "progress", done: 0, total: 700 });
    expect(progress.length).toBe(1 + Math.ceil(700 / 64));
    const dones = progress.map((p) => (p.type === "progress" ? p.done : -1));
    expect([...dones].sort((a, b) => a - b)).toEqual(dones);
    expect(dones.at(-1)).toBe(700);
    expect(summary.profile).toEqual({ slug: "tight-splices", version: 1 });
  });

  it("gives the same answer on grading threads as on the request's thread, changed links in the same order", async () => {
    const inThread = await run(o, draft, { limit: "all", batchSize: 50, threads: 0 });
    const threaded = await run(o, draft, { limit: "all", batchSize: 50, threads: 2 });
    expect(threaded.summary).toEqual(inThread.summary);
    expect(threaded.summary.changedLinks.length).toBeGreaterThan(0);
    // Newest first, as streamed, even though batches finish on different threads.
    const seqs = threaded.summary.changedLinks.map((c) => c.seq);
    expect([...seqs].sort((a, b) => b - a)).toEqual(seqs);
    expect(threaded.progress.at(-1)).toEqual({ type: "progress", done: 700, total: 700 });
  });

  it("stops its grading threads when the reader stops early", async () => {
    const events = previewImpact(o.ctx("engineer"), draft, { limit: "all", batchSize: 20, threads: 2 });
    await events.next();
    await events.next();
    // return() runs the generator's cleanup, which ends the threads still working.
    await expect(events.return(undefined)).resolves.toEqual({ done: true, value: undefined });
    // The next threaded preview starts clean and gets the whole answer.
    const next = await run(o, draft, { limit: "all", batchSize: 50, threads: 2 });
    expect(next.summary.total).toBe(700);
    expect(next.summary).toEqual((await run(o, draft, { limit: "all", threads: 0 })).summary);
  });

  it("can take only the newest N tests", async () => {
    const { summary } = await run(o, draft, { limit: 100, batchSize: 30 });
    expect(summary.total).toBe(100);
    const want = expected(tests.slice(-100), ospTemplate(), draft);
    expect(flatten(summary)).toEqual(want.matrix);
  });

  it("keeps to the chosen period", async () => {
    // storeHistory puts test i at end - (700 - i) minutes: this window holds tests 400..499.
    const from = new Date(end.getTime() - 300 * 60_000);
    const to = new Date(end.getTime() - 200 * 60_000);
    const { summary } = await run(o, draft, { from, to, limit: "all" });
    expect(summary.total).toBe(100);
    expect(flatten(summary)).toEqual(expected(tests.slice(400, 500), ospTemplate(), draft).matrix);
  });

  it("grading under an unchanged copy of the stored profile changes nothing", async () => {
    const { summary } = await run(o, { ...ospTemplate(), slug: "copy", version: 1 }, { limit: "all" });
    expect(summary.changed).toBe(0);
    expect(summary.unchanged).toBe(700);
  });

  it("is for profile editors only, and rejects a nonsense range", async () => {
    const it = previewImpact(o.ctx("auditor"), draft, {});
    await expect(it.next()).rejects.toBeInstanceOf(ForbiddenError);
    await expect(previewImpact(o.ctx("engineer"), draft, { limit: 0 }).next()).rejects.toThrow(/whole number/);
  });

  it("defaults to the newest 1,000 tests, and takes every test when asked", async () => {
    await storeHistory(o.org.id, 400, { seed: 12, end: new Date(end.getTime() + 1000 * 60_000) });
    const byDefault = await run(o, draft, {});
    expect(byDefault.summary.total).toBe(1000);
    const all = await run(o, draft, { limit: "all" });
    expect(all.summary.total).toBe(1100);
  });

  it("compares like with like by default: only tests graded under the profile or its template", async () => {
    await storeHistory(o.org.id, 50, { seed: 13, profile: findTemplate("tia-568-3-d-singlemode-isp")!, end: new Date(end.getTime() + 2000 * 60_000) });
    expect(await relatedProfileSlugs(o.ctx("engineer"), "tight-splices")).toEqual(["tight-splices", ospTemplate().slug]);
    const related = await run(o, draft, { limit: "all", profileSlugs: await relatedProfileSlugs(o.ctx("engineer"), "tight-splices") });
    expect(related.summary.total).toBe(1100);
    const every = await run(o, draft, { limit: "all" });
    expect(every.summary.total).toBe(1150);
  });
});
