import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { POST as GRADE } from "@/app/api/v1/gradings/route";
import { POST as REPLAY } from "@/app/api/v1/verdicts/[id]/replay/route";
import { GET as LIST_PROFILES } from "@/app/api/v1/profiles/route";
import { GET as GET_PROFILE } from "@/app/api/v1/profiles/[slug]/route";
import { GET as GET_VERSION } from "@/app/api/v1/profiles/[slug]/versions/[version]/route";
import { closeDb, getDb } from "@/db";
import { findTemplate } from "@/lib/grading";
import { ReplayResultSchema } from "@/lib/api/schemas/verdicts";
import { ProfileDetailSchema, ProfileListSchema, ProfileVersionSchema } from "@/lib/api/schemas/profiles";
import { cloneTemplate, saveDraft } from "@/lib/profiles/drafts";
import { publishDraft } from "@/lib/profiles/publish";
import { call } from "@/tests/helpers/api-request";
import { createApiKey, createOrganisation, createUser, type TestApiKey, type TestOrganisation } from "@/tests/helpers/factories";
import { passingTest } from "./fixtures";

let org: TestOrganisation;
let key: TestApiKey;
let outsiderKey: TestApiKey;
let verdictId: string;

// An organisation profile "strict-osp": v1 = the TIA single-mode OSP template's limits, v2 = the same with
// a design margin of -2.5 dB, so the 3.1 dB budget of the passing fixture shrinks to 0.6 dB (< 1.2 measured).
beforeAll(async () => {
  org = await createOrganisation();
  key = await createApiKey(org);
  outsiderKey = await createApiKey(await createOrganisation());
  const engineer = await createUser(org, "engineer");
  const ctx = { db: getDb(), actor: { userId: engineer.id, organisationId: org.id, role: "engineer" as const } };
  await cloneTemplate(ctx, { templateSlug: "tia-568-3-d-singlemode-osp", slug: "strict-osp", name: "Strict OSP" });
  await publishDraft(ctx, "strict-osp", { note: "as the template" });
  const limits = structuredClone(findTemplate("tia-568-3-d-singlemode-osp")!.limits);
  limits.designMarginDb = { value: -2.5, source: "common practice: operator demands 2.5 dB headroom" };
  await saveDraft(ctx, "strict-osp", limits);
  await publishDraft(ctx, "strict-osp", { note: "demand 2.5 dB headroom" });

  const res = await call(GRADE, "/api/v1/gradings", { key: key.secret, body: { test: passingTest("R-1"), profile: "strict-osp@1" } });
  expect(res.status).toBe(201);
  expect(res.json.verdict).toBe("pass");
  verdictId = res.json.id;
});
afterAll(async () => {
  await closeDb();
});

describe("POST /api/v1/verdicts/{id}/replay", () => {
  it("reproduces the stored digest under the stored profile version", async () => {
    const res = await call(REPLAY, `/api/v1/verdicts/${verdictId}/replay`, { method: "POST", key: key.secret, params: { id: verdictId } });
    expect(res.status).toBe(200);
    const r = ReplayResultSchema.parse(res.json);
    expect(r.reproduced).toBe(true);
    expect(r.replayDigest).toBe(r.storedDigest);
    expect(r.replayed.profile).toEqual({ slug: "strict-osp", version: 1 });
    expect(r.comparison).toBeUndefined();
  });

  it("shows what would change under another profile version", async () => {
    const res = await call(REPLAY, `/api/v1/verdicts/${verdictId}/replay`, { key: key.secret, params: { id: verdictId }, body: { profile: "strict-osp@2" } });
    expect(res.status).toBe(200);
    expect(res.json.reproduced).toBe(true);
    expect(res.json.comparison).toMatchObject({ profile: { slug: "strict-osp", version: 2 }, verdict: "fail", changed: true });
    expect(res.json.comparison.reasonsAdded.length).toBeGreaterThan(0);
  });

  it("grading with the bare slug uses the latest published version", async () => {
    const res = await call(GRADE, "/api/v1/gradings", { key: key.secret, body: { test: passingTest("R-2"), profile: "strict-osp" } });
    expect(res.json.profile).toEqual({ slug: "strict-osp", version: 2 });
    expect(res.json.verdict).toBe("fail");
  });

  it("404 for another organisation's verdict and for unknown ids", async () => {
    const other = await call(REPLAY, `/api/v1/verdicts/${verdictId}/replay`, { method: "POST", key: outsiderKey.secret, params: { id: verdictId } });
    expect(other.status).toBe(404);
    const unknown = crypto.randomUUID();
    expect((await call(REPLAY, `/api/v1/verdicts/${unknown}/replay`, { method: "POST", key: key.secret, params: { id: unknown } })).status).toBe(404);
  });

  it("422 for a comparison profile that does not exist", async () => {
    const res = await call(REPLAY, `/api/v1/verdicts/${verdictId}/replay`, { key: key.secret, params: { id: verdictId }, body: { profile: "strict-osp@9" } });
    expect(res.status).toBe(422);
    expect(res.json.errors[0].pointer).toBe("/profile");
  });
});

describe("profiles", () => {
  it("lists the organisation's profiles, the templates and the default", async () => {
    const res = await call(LIST_PROFILES, "/api/v1/profiles", { key: key.secret });
    expect(res.status).toBe(200);
    const body = ProfileListSchema.parse(res.json);
    expect(body.defaultProfile).toBe("tia-568-3-d-singlemode-osp");
    expect(body.data[0]).toMatchObject({ slug: "strict-osp", kind: "organisation", latestVersion: 2, isDefault: false });
    expect(body.data.find((p) => p.slug === "tia-568-3-d-singlemode-osp")).toMatchObject({ kind: "template", isDefault: true });
    const outsider = await call(LIST_PROFILES, "/api/v1/profiles", { key: outsiderKey.secret });
    expect(outsider.json.data.some((p: { slug: string }) => p.slug === "strict-osp")).toBe(false);
  });

  it("shows one profile's versions, newest first, and a template's single version", async () => {
    const own = await call(GET_PROFILE, "/api/v1/profiles/strict-osp", { key: key.secret, params: { slug: "strict-osp" } });
    const body = ProfileDetailSchema.parse(own.json);
    expect(body.versions.map((v) => v.version)).toEqual([2, 1]);
    expect(body.basedOn).toBe("tia-568-3-d-singlemode-osp@1");
    const t = await call(GET_PROFILE, "/api/v1/profiles/tia-568-3-d-multimode", { key: key.secret, params: { slug: "tia-568-3-d-multimode" } });
    expect(t.json).toMatchObject({ kind: "template", versions: [{ version: 1, publishedAt: null }] });
  });

  it("shows a version's limits", async () => {
    const res = await call(GET_VERSION, "/api/v1/profiles/strict-osp/versions/2", { key: key.secret, params: { slug: "strict-osp", version: "2" } });
    expect(res.status).toBe(200);
    const v = ProfileVersionSchema.parse(res.json);
    expect(v.limits.designMarginDb.value).toBe(-2.5);
    expect(v.note).toBe("demand 2.5 dB headroom");
  });

  it("404 for another organisation's profile, unknown slugs and versions", async () => {
    const cases: [typeof GET_PROFILE | typeof GET_VERSION, string, Record<string, string>, TestApiKey][] = [
      [GET_PROFILE, "/api/v1/profiles/strict-osp", { slug: "strict-osp" }, outsiderKey],
      [GET_PROFILE, "/api/v1/profiles/nope", { slug: "nope" }, key],
      [GET_VERSION, "/api/v1/profiles/strict-osp/versions/3", { slug: "strict-osp", version: "3" }, key],
      [GET_VERSION, "/api/v1/profiles/strict-osp/versions/x", { slug: "strict-osp", version: "x" }, key],
      [GET_VERSION, "/api/v1/profiles/strict-osp/versions/1", { slug: "strict-osp", version: "1" }, outsiderKey],
    ];
    for (const [h, path, params, k] of cases) {
      const res = await call(h, path, { key: k.secret, params });
      expect(res.status, path).toBe(404);
      expect(res.json.code).toBe("not_found");
    }
  });

  it("403 for a key without profiles:read", async () => {
    const g = await createApiKey(org, { scopes: ["grade"] });
    expect((await call(LIST_PROFILES, "/api/v1/profiles", { key: g.secret })).status).toBe(403);
  });
});
