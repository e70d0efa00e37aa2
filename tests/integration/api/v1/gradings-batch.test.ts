import { count, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { POST } from "@/app/api/v1/gradings/batch/route";
import { closeDb, getDb } from "@/db";
import { tests, verdicts } from "@/db/schema";
import { BatchResultSchema } from "@/lib/api/schemas/gradings";
import { call } from "@/tests/helpers/api-request";
import { createApiKey, createOrganisation, type TestApiKey, type TestOrganisation } from "@/tests/helpers/factories";
import { failingTest, passingTest } from "./fixtures";

const PATH = "/api/v1/gradings/batch";
let org: TestOrganisation;
let key: TestApiKey;

beforeAll(async () => {
  org = await createOrganisation();
  key = await createApiKey(org, { scopes: ["grade"] });
});
afterAll(async () => {
  await closeDb();
});

describe("POST /api/v1/gradings/batch", () => {
  it("grades and stores the good items and reports each bad item with its own pointers", async () => {
    const bad = passingTest("B-BAD") as any;
    bad.measurements[0].wavelengthNm = 850; // not a single-mode wavelength
    const res = await call(POST, PATH, {
      key: key.secret,
      body: { tests: [passingTest("B-1"), bad, failingTest("B-2"), { link: "nonsense" }] },
    });
    expect(res.status).toBe(201);
    const body = BatchResultSchema.parse(res.json);
    expect(body.graded).toBe(2);
    expect(body.invalid).toBe(2);
    expect(body.counts).toEqual({ pass: 1, marginal: 0, fail: 1 });
    expect(body.items.map((i) => [i.index, i.status])).toEqual([
      [0, "graded"],
      [1, "invalid"],
      [2, "graded"],
      [3, "invalid"],
    ]);
    const badItem = body.items[1];
    if (badItem.status !== "invalid") throw new Error("expected invalid");
    expect(badItem.errors.map((e) => e.pointer)).toContain("/tests/1/measurements/0/wavelengthNm");
    const nonsense = body.items[3];
    if (nonsense.status !== "invalid") throw new Error("expected invalid");
    expect(nonsense.errors.every((e) => e.pointer.startsWith("/tests/3/"))).toBe(true);

    const failed = body.items[2];
    if (failed.status !== "graded") throw new Error("expected graded");
    expect(failed.verdict.verdict).toBe("fail");
    expect(failed.verdict.reasonCodes).toContain("loss.over-budget");
    // A summary: the full reasons are one GET away.
    expect(res.json.items[2].verdict.reasons).toBeUndefined();

    const [n] = await getDb().select({ n: count() }).from(verdicts).where(eq(verdicts.organisationId, org.id));
    expect(n.n).toBe(2);
    const [t] = await getDb().select({ n: count() }).from(tests).where(eq(tests.organisationId, org.id));
    expect(t.n).toBe(2);
  });

  it("continues the chain through the batch in submission order", async () => {
    const res = await call(POST, PATH, { key: key.secret, body: { tests: [passingTest("C-1"), passingTest("C-2"), passingTest("C-3")] } });
    const vs = res.json.items.map((i: { verdict: { seq: number; digest: string; prevDigest: string; linkRef: string } }) => i.verdict);
    expect(vs.map((v: { linkRef: string }) => v.linkRef)).toEqual(["C-1", "C-2", "C-3"]);
    for (let i = 1; i < vs.length; i++) {
      expect(vs[i].seq).toBe(vs[i - 1].seq + 1);
      expect(vs[i].prevDigest).toBe(vs[i - 1].digest);
    }
  });

  it("answers 200 and stores nothing when every item is invalid", async () => {
    const [before] = await getDb().select({ n: count() }).from(verdicts).where(eq(verdicts.organisationId, org.id));
    const res = await call(POST, PATH, { key: key.secret, body: { tests: [{}, { link: {} }] } });
    expect(res.status).toBe(200);
    expect(res.json.graded).toBe(0);
    const [after] = await getDb().select({ n: count() }).from(verdicts).where(eq(verdicts.organisationId, org.id));
    expect(after.n).toBe(before.n);
  });

  it("takes 1,000 tests in one call", async () => {
    const many = Array.from({ length: 1000 }, (_, i) => passingTest(`BULK-${i}`));
    const res = await call(POST, PATH, { key: key.secret, body: { tests: many } });
    expect(res.status).toBe(201);
    expect(res.json.graded).toBe(1000);
  });

  it("422 for more than 1,000 tests or an empty list, pointing at /tests", async () => {
    const tooMany = await call(POST, PATH, { key: key.secret, body: { tests: Array.from({ length: 1001 }, () => ({})) } });
    expect(tooMany.status).toBe(422);
    expect(tooMany.json.errors[0].pointer).toBe("/tests");
    const empty = await call(POST, PATH, { key: key.secret, body: { tests: [] } });
    expect(empty.status).toBe(422);
  });

  it("403 for a key without the grade scope", async () => {
    const ro = await createApiKey(org, { scopes: ["verdicts:read"] });
    const res = await call(POST, PATH, { key: ro.secret, body: { tests: [passingTest()] } });
    expect(res.status).toBe(403);
  });
});
