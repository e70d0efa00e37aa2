// The console's profile, verdict and audit routes, called in-process with the session stubbed to a
// factory member: what they stream, and how they refuse.
import { execFileSync } from "node:child_process";
import { mkdtemp, readFile, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import type { Member } from "@/lib/auth/context";

let current: Member | null = null;
vi.mock("@/lib/auth/session", () => ({ getMember: async () => current, requireMember: async () => current }));

const { closeDb } = await import("@/db");
const previewRoute = await import("@/app/api/console/profiles/preview/route");
const diffRoute = await import("@/app/api/console/profiles/diff/route");
const verdictsRoute = await import("@/app/api/console/verdicts/route");
const chainRoute = await import("@/app/api/console/audit/chain/route");
const replayRoute = await import("@/app/api/console/audit/replay/route");
const exportRoute = await import("@/app/api/console/audit/export/route");
const { cloneTemplate, saveDraft } = await import("@/lib/profiles/drafts");
const { publishDraft } = await import("@/lib/profiles/publish");
const { orgWithRoles, ospTemplate, storeHistory } = await import("../../helpers/profile-fixtures");

type O = Awaited<ReturnType<typeof orgWithRoles>>;
const as = (o: O, role: keyof O["actors"]): Member => ({ ...o.actors[role], email: `${role}@t.example`, name: role, organisationName: o.org.name });
const post = (url: string, body: unknown) => new Request(`http://t${url}`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
const lines = async (res: Response) => (await res.text()).trim().split("\n").map((l) => JSON.parse(l));

describe("console routes for profiles, verdicts and audit", () => {
  let o: O;
  beforeAll(async () => {
    o = await orgWithRoles();
    await storeHistory(o.org.id, 120, { seed: 41 });
    await cloneTemplate(o.ctx("engineer"), { templateSlug: ospTemplate().slug, slug: "route-osp", name: "Route OSP" });
  });
  afterAll(async () => {
    current = null;
    await closeDb();
  });

  it("answers 401 problem+json without a session", async () => {
    current = null;
    const res = await previewRoute.POST(post("/api/console/profiles/preview", { slug: "route-osp" }));
    expect(res.status).toBe(401);
    expect(res.headers.get("content-type")).toBe("application/problem+json");
  });

  it("streams an impact preview as NDJSON for an engineer, with unsaved limits", async () => {
    current = as(o, "engineer");
    const limits = structuredClone(ospTemplate().limits);
    limits.spliceLossDb.value = 0.1;
    const res = await previewRoute.POST(post("/api/console/profiles/preview", { slug: "route-osp", limits, limit: 100 }));
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/application\/x-ndjson/);
    const events = await lines(res);
    expect(events[0]).toEqual({ type: "progress", done: 0, total: 100 });
    const result = events.at(-1);
    expect(result.type).toBe("result");
    expect(result.summary.total).toBe(100);
    expect(result.summary.changed).toBeGreaterThan(0);
  });

  it("refuses the preview to an auditor (403) and marks impossible limits (422 with the field)", async () => {
    current = as(o, "auditor");
    expect((await previewRoute.POST(post("/api/console/profiles/preview", { slug: "route-osp" }))).status).toBe(403);
    current = as(o, "engineer");
    const limits = structuredClone(ospTemplate().limits);
    limits.spliceLossDb.value = -1;
    const res = await previewRoute.POST(post("/api/console/profiles/preview", { slug: "route-osp", limits }));
    expect(res.status).toBe(422);
    const body = await res.json();
    // RFC 6901 pointer into the request body.
    expect(body.errors[0].pointer).toBe("/limits/spliceLossDb/value");
  });

  it("diffs two published versions", async () => {
    current = as(o, "engineer");
    await publishDraft(o.ctx("engineer"), "route-osp", { note: "as cloned" });
    const next = structuredClone(ospTemplate().limits);
    next.macrobendThresholdDb.value = 0.9;
    await saveDraft(o.ctx("engineer"), "route-osp", next);
    await publishDraft(o.ctx("engineer"), "route-osp", { note: "looser macrobend threshold" });
    current = as(o, "developer");
    const res = await diffRoute.GET(new Request("http://t/api/console/profiles/diff?slug=route-osp&from=1&to=2"));
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.changes).toEqual([{ path: "macrobendThresholdDb.value", kind: "changed", before: ospTemplate().limits.macrobendThresholdDb.value, after: 0.9 }]);
    expect((await diffRoute.GET(new Request("http://t/api/console/profiles/diff?slug=route-osp&from=1&to=x"))).status).toBe(422);
  });

  it("lists verdicts by reason code, newest first, with a cursor that pages without overlap", async () => {
    current = as(o, "developer");
    const first = await (await verdictsRoute.GET(new Request("http://t/api/console/verdicts?reasonCode=event.splice-loss&limit=10&facets=1"))).json();
    expect(first.data).toHaveLength(10);
    expect(first.facets.reasonCodes).toContain("event.splice-loss");
    for (const r of first.data) expect(r.reasonCodes).toContain("event.splice-loss");
    const seqs = first.data.map((r: { seq: number }) => r.seq);
    expect([...seqs].sort((a: number, b: number) => b - a)).toEqual(seqs);
    const second = await (await verdictsRoute.GET(new Request(`http://t/api/console/verdicts?reasonCode=event.splice-loss&limit=10&cursor=${first.nextCursor}`))).json();
    expect(Math.max(...second.data.map((r: { seq: number }) => r.seq))).toBeLessThan(Math.min(...seqs));
    const bad = await verdictsRoute.GET(new Request("http://t/api/console/verdicts?verdict=excellent"));
    expect(bad.status).toBe(422);
  });

  it("streams the chain check and the bulk replay", async () => {
    current = as(o, "auditor");
    const chain = await lines(await chainRoute.POST(post("/api/console/audit/chain", {})));
    expect(chain.at(-1)).toMatchObject({ type: "result", report: { intact: true, checked: 120 } });
    const replay = await lines(await replayRoute.POST(post("/api/console/audit/replay", {})));
    expect(replay.at(-1)).toMatchObject({ type: "result", summary: { total: 120, reproduced: 120, changed: 0 } });
    current = as(o, "developer");
    expect((await chainRoute.POST(post("/api/console/audit/chain", {}))).status).toBe(403);
    current = as(o, "auditor");
    expect((await replayRoute.POST(post("/api/console/audit/replay", { from: "2026-02-01T00:00:00Z", to: "2026-01-01T00:00:00Z" }))).status).toBe(422);
  });

  it("builds an audit pack with progress, downloads it once, and only for the member who built it", async () => {
    current = as(o, "auditor");
    const events = await lines(await exportRoute.POST(post("/api/console/audit/export", {})));
    expect(events[0]).toMatchObject({ type: "progress", done: 0, total: 120 });
    const result = events.at(-1);
    expect(result.type).toBe("result");
    expect(result.manifest.counts.verdicts).toBe(120);

    current = as(o, "admin");
    expect((await exportRoute.GET(new Request(`http://t${result.download}`))).status).toBe(404);

    current = as(o, "auditor");
    const res = await exportRoute.GET(new Request(`http://t${result.download}`));
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/x-tar");
    const dir = await mkdtemp(path.join(tmpdir(), "gg-route-pack-"));
    try {
      await writeFile(path.join(dir, "p.tar"), Buffer.from(await res.arrayBuffer()));
      execFileSync("tar", ["-xf", "p.tar"], { cwd: dir });
      execFileSync("sha256sum", ["-c", "SHA256SUMS"], { cwd: path.join(dir, "audit-pack") });
      const manifest = JSON.parse(await readFile(path.join(dir, "audit-pack", "manifest.json"), "utf8"));
      expect(manifest.counts.verdicts).toBe(120);
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
    await new Promise((r) => setTimeout(r, 50));
    expect((await exportRoute.GET(new Request(`http://t${result.download}`))).status).toBe(404);

    current = as(o, "engineer");
    expect((await exportRoute.POST(post("/api/console/audit/export", {}))).status).toBe(403);
  });
});
