import { createHash } from "node:crypto";
import canonicalize from "canonicalize";
import { and, count, eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { POST } from "@/app/api/v1/gradings/route";
import { GET as GET_VERDICT } from "@/app/api/v1/verdicts/[id]/route";
import { closeDb, getDb } from "@/db";
import { callLog, idempotencyKeys, tests, verdicts } from "@/db/schema";
import { VerdictResourceSchema } from "@/lib/api/schemas/verdicts";
import { resetRateLimits } from "@/lib/api/with-api-key";
import { call } from "@/tests/helpers/api-request";
import { createApiKey, createOrganisation, type TestApiKey, type TestOrganisation } from "@/tests/helpers/factories";
import { failingTest, passingTest } from "./fixtures";

const PATH = "/api/v1/gradings";
let org: TestOrganisation;
let key: TestApiKey;

async function countRows(table: typeof tests | typeof verdicts, orgId: string) {
  const [r] = await getDb().select({ n: count() }).from(table).where(eq(table.organisationId, orgId));
  return r.n;
}

beforeAll(async () => {
  org = await createOrganisation();
  key = await createApiKey(org, { scopes: ["grade", "verdicts:read"] });
});
beforeEach(() => resetRateLimits());
afterAll(async () => {
  await closeDb();
});

describe("POST /api/v1/gradings: success", () => {
  it("grades, stores and answers 201 with the verdict and a Location", async () => {
    const res = await call(POST, PATH, { key: key.secret, body: { test: passingTest() } });
    expect(res.status).toBe(201);
    const v = VerdictResourceSchema.parse(res.json);
    expect(v.verdict).toBe("pass");
    expect(v.profile).toEqual({ slug: "tia-568-3-d-singlemode-osp", version: 1 });
    expect(res.headers.get("location")).toBe(`/api/v1/verdicts/${v.id}`);
    expect(res.headers.get("x-request-id")).toMatch(/^req_/);
    expect(res.headers.get("ratelimit-limit")).toBe("600");
    // Only public fields: no test id, key id or organisation id.
    expect(Object.keys(res.json).sort()).toEqual(
      ["createdAt", "digest", "engineVersion", "headroomDb", "id", "linkRef", "prevDigest", "profile", "reasons", "seq", "verdict", "wavelengths"],
    );
    const fetched = await call(GET_VERDICT, `/api/v1/verdicts/${v.id}`, { key: key.secret, params: { id: v.id } });
    expect(fetched.status).toBe(200);
    expect(fetched.json).toEqual(res.json);
  });

  it("grades a failing link as fail with a loss reason", async () => {
    const res = await call(POST, PATH, { key: key.secret, body: { test: failingTest(), profile: "tia-568-3-d-singlemode-osp@1" } });
    expect(res.status).toBe(201);
    expect(res.json.verdict).toBe("fail");
    expect(res.json.headroomDb).toBeLessThan(0);
    expect(res.json.reasons.some((r: { severity: string }) => r.severity === "fail")).toBe(true);
  });

  it("digests the result with RFC 8785 canonical JSON and SHA-256 (checked with the reference canonicalize package)", async () => {
    const res = await call(POST, PATH, { key: key.secret, body: { test: passingTest("T-DIGEST") } });
    const [row] = await getDb().select().from(verdicts).where(eq(verdicts.id, res.json.id));
    const expected = createHash("sha256").update(canonicalize(row.result)!, "utf8").digest("hex");
    expect(res.json.digest).toBe(expected);
  });

  it("chains each verdict to the previous one of the organisation", async () => {
    const a = await call(POST, PATH, { key: key.secret, body: { test: passingTest("T-CHAIN-A") } });
    const b = await call(POST, PATH, { key: key.secret, body: { test: passingTest("T-CHAIN-B") } });
    expect(b.json.seq).toBe(a.json.seq + 1);
    expect(b.json.prevDigest).toBe(a.json.digest);
  });

  it("keeps seq gapless and the chain unbroken under concurrent calls", async () => {
    const other = await createOrganisation();
    const k = await createApiKey(other, { scopes: ["grade"] });
    const results = await Promise.all(
      Array.from({ length: 12 }, (_, i) => call(POST, PATH, { key: k.secret, body: { test: passingTest(`T-CONC-${i}`) } })),
    );
    expect(results.map((r) => r.status)).toEqual(Array(12).fill(201));
    const rows = await getDb().select().from(verdicts).where(eq(verdicts.organisationId, other.id)).orderBy(verdicts.seq);
    expect(rows.map((r) => r.seq)).toEqual(Array.from({ length: 12 }, (_, i) => i + 1));
    expect(rows[0].prevDigest).toBeNull();
    for (let i = 1; i < rows.length; i++) expect(rows[i].prevDigest).toBe(rows[i - 1].digest);
  });
  it("starts a missing chain head from the verdicts already stored (e.g. after a restore)", async () => {
    const { verdictChainHeads } = await import("@/db/schema");
    const a = await call(POST, PATH, { key: key.secret, body: { test: passingTest("T-HEAD-A") } });
    await getDb().delete(verdictChainHeads).where(eq(verdictChainHeads.organisationId, org.id));
    const b = await call(POST, PATH, { key: key.secret, body: { test: passingTest("T-HEAD-B") } });
    expect(b.status).toBe(201);
    expect(b.json.seq).toBe(a.json.seq + 1);
    expect(b.json.prevDigest).toBe(a.json.digest);
  });
});

describe("POST /api/v1/gradings: bad input", () => {
  it("400 for a body that is not JSON, and stores nothing", async () => {
    const before = await countRows(tests, org.id);
    const res = await call(POST, PATH, { key: key.secret, rawBody: "{not json", headers: { "content-type": "application/json" } });
    expect(res.status).toBe(400);
    expect(res.headers.get("content-type")).toBe("application/problem+json");
    expect(res.json).toMatchObject({ code: "bad_request", status: 400, type: "https://glassgrade.dev/problems/bad-request", instance: PATH });
    expect(res.json.requestId).toBe(res.headers.get("x-request-id"));
    expect(await countRows(tests, org.id)).toBe(before);
  });

  it("400 for an empty body", async () => {
    const res = await call(POST, PATH, { key: key.secret, rawBody: "", headers: { "content-type": "application/json" } });
    expect(res.status).toBe(400);
    expect(res.json.code).toBe("bad_request");
  });

  it("415 for a body that is not declared JSON", async () => {
    const res = await call(POST, PATH, { key: key.secret, rawBody: "fibre=OS2", headers: { "content-type": "application/x-www-form-urlencoded" } });
    expect(res.status).toBe(415);
    expect(res.json.code).toBe("unsupported_media_type");
  });

  it("413 for a body over the route's cap", async () => {
    const huge = JSON.stringify({ test: passingTest(), pad: "x".repeat(1024 * 1024) });
    const res = await call(POST, PATH, { key: key.secret, rawBody: huge, headers: { "content-type": "application/json" } });
    expect(res.status).toBe(413);
    expect(res.json.code).toBe("payload_too_large");
  });

  it("reads a body with a declared Content-Length, and refuses a declared length over the cap before reading", async () => {
    const body = JSON.stringify({ test: passingTest("T-CL") });
    const ok = await call(POST, PATH, { key: key.secret, rawBody: body, headers: { "content-type": "application/json", "content-length": String(Buffer.byteLength(body)) } });
    expect(ok.status).toBe(201);
    const big = await call(POST, PATH, { key: key.secret, rawBody: body, headers: { "content-type": "application/json", "content-length": String(2 * 1024 * 1024) } });
    expect(big.status).toBe(413);
  });

  it("422 with a JSON pointer and message for every bad field, and stores nothing", async () => {
    const before = await countRows(verdicts, org.id);
    const t = passingTest() as any;
    t.link.fibreType = "OM9";
    t.measurements[0].insertionLossDb = "lots";
    const res = await call(POST, PATH, { key: key.secret, body: { test: t, colour: "blue" } });
    expect(res.status).toBe(422);
    expect(res.json.code).toBe("validation_failed");
    const pointers = res.json.errors.map((e: { pointer: string }) => e.pointer).sort();
    expect(pointers).toEqual(["/colour", "/test/link/fibreType", "/test/measurements/0/insertionLossDb"]);
    for (const e of res.json.errors) expect(e.message.length).toBeGreaterThan(0);
    expect(await countRows(verdicts, org.id)).toBe(before);
  });

  it("422 for physically impossible input (reflectance above 0 dB), naming the field", async () => {
    const t = passingTest();
    t.events = [{ wavelengthNm: 1310, positionM: 10, kind: "connector", lossDb: 0.2, reflectanceDb: 3 }];
    const res = await call(POST, PATH, { key: key.secret, body: { test: t } });
    expect(res.status).toBe(422);
    expect(res.json.errors[0].pointer).toBe("/test/events/0/reflectanceDb");
    expect(res.json.errors[0].message).toMatch(/reflectanceDb/);
  });

  it("422 pointing at /profile for a profile that does not exist", async () => {
    const res = await call(POST, PATH, { key: key.secret, body: { test: passingTest(), profile: "no-such-profile" } });
    expect(res.status).toBe(422);
    expect(res.json.errors).toEqual([{ pointer: "/profile", message: expect.stringContaining("no-such-profile") }]);
    const wrongVersion = await call(POST, PATH, { key: key.secret, body: { test: passingTest(), profile: "tia-568-3-d-singlemode-osp@7" } });
    expect(wrongVersion.status).toBe(422);
  });

  it("409 when the organisation's default profile cannot be resolved", async () => {
    const broken = await createOrganisation({ defaultProfile: "retired-profile" });
    const k = await createApiKey(broken, { scopes: ["grade"] });
    const res = await call(POST, PATH, { key: k.secret, body: { test: passingTest() } });
    expect(res.status).toBe(409);
    expect(res.json.code).toBe("conflict");
  });
});

describe("POST /api/v1/gradings: keys", () => {
  it("401 without a key, with WWW-Authenticate", async () => {
    const res = await call(POST, PATH, { body: { test: passingTest() } });
    expect(res.status).toBe(401);
    expect(res.json.code).toBe("unauthorized");
    expect(res.headers.get("www-authenticate")).toMatch(/^Bearer/);
  });

  it("401 for a non-Bearer scheme, a malformed key and an unknown key", async () => {
    for (const authorization of ["Basic dXNlcjpwYXNz", "Bearer not-a-key", `Bearer gg_sbx_${"A".repeat(43)}`]) {
      const res = await call(POST, PATH, { body: { test: passingTest() }, headers: { authorization } });
      expect(res.status, authorization).toBe(401);
      expect(res.json.code).toBe("unauthorized");
    }
  });

  it("401 for revoked and expired keys", async () => {
    const revoked = await createApiKey(org, { revoked: true });
    const expired = await createApiKey(org, { expiresAt: new Date(Date.now() - 1000) });
    for (const k of [revoked, expired]) {
      const res = await call(POST, PATH, { key: k.secret, body: { test: passingTest() } });
      expect(res.status).toBe(401);
    }
    const future = await createApiKey(org, { expiresAt: new Date(Date.now() + 3600_000) });
    expect((await call(POST, PATH, { key: future.secret, body: { test: passingTest() } })).status).toBe(201);
  });

  it("403 for a key without the grade scope", async () => {
    const readOnly = await createApiKey(org, { scopes: ["verdicts:read"] });
    const res = await call(POST, PATH, { key: readOnly.secret, body: { test: passingTest() } });
    expect(res.status).toBe(403);
    expect(res.json.code).toBe("forbidden");
    expect(res.json.detail).toMatch(/grade/);
  });

  it("429 with Retry-After once the key's per-minute allowance is spent", async () => {
    const slow = await createApiKey(org, { rateLimitPerMinute: 2 });
    const statuses: number[] = [];
    let last;
    for (let i = 0; i < 3; i++) {
      last = await call(POST, PATH, { key: slow.secret, body: { test: passingTest(`T-RATE-${i}`) } });
      statuses.push(last.status);
    }
    expect(statuses).toEqual([201, 201, 429]);
    expect(last!.json.code).toBe("rate_limited");
    expect(Number(last!.headers.get("retry-after"))).toBeGreaterThanOrEqual(1);
    expect(last!.headers.get("ratelimit-remaining")).toBe("0");
    expect(last!.headers.get("ratelimit-policy")).toBe("2;w=60");
  });

  it("records last_used_at for the key", async () => {
    const fresh = await createApiKey(org);
    await call(POST, PATH, { key: fresh.secret, body: { test: passingTest() } });
    // The write is best-effort and not awaited by the request; give it a moment.
    await new Promise((r) => setTimeout(r, 200));
    const { apiKeys } = await import("@/db/schema");
    const [row] = await getDb().select({ at: apiKeys.lastUsedAt }).from(apiKeys).where(eq(apiKeys.id, fresh.id));
    expect(row.at).toBeInstanceOf(Date);
  });
});

describe("POST /api/v1/gradings: Idempotency-Key", () => {
  it("replays the first response for the same key and body and creates nothing more", async () => {
    const body = { test: passingTest("T-IDEM-1") };
    const headers = { "idempotency-key": "idem-" + crypto.randomUUID() };
    const first = await call(POST, PATH, { key: key.secret, body, headers });
    const before = await countRows(verdicts, org.id);
    const again = await call(POST, PATH, { key: key.secret, body, headers });
    expect(again.status).toBe(201);
    expect(again.text).toBe(first.text);
    expect(again.headers.get("location")).toBe(first.headers.get("location"));
    expect(again.headers.get("idempotent-replayed")).toBe("true");
    expect(await countRows(verdicts, org.id)).toBe(before);
  });

  it("accepts the draft's quoted form of the header", async () => {
    const id = crypto.randomUUID();
    const body = { test: passingTest("T-IDEM-Q") };
    const a = await call(POST, PATH, { key: key.secret, body, headers: { "idempotency-key": `"${id}"` } });
    const b = await call(POST, PATH, { key: key.secret, body, headers: { "idempotency-key": id } });
    expect(b.json.id).toBe(a.json.id);
  });

  it("422 idempotency_key_reused for the same key with another body", async () => {
    const headers = { "idempotency-key": "idem-" + crypto.randomUUID() };
    await call(POST, PATH, { key: key.secret, body: { test: passingTest("T-IDEM-2") }, headers });
    const res = await call(POST, PATH, { key: key.secret, body: { test: passingTest("T-IDEM-3") }, headers });
    expect(res.status).toBe(422);
    expect(res.json.code).toBe("idempotency_key_reused");
  });

  it("409 idempotency_in_flight while the first request is still running", async () => {
    const idem = "idem-" + crypto.randomUUID();
    const body = { test: passingTest("T-IDEM-4") };
    // The reservation a running request holds, written the way the wrapper writes it.
    const { requestFingerprint } = await import("@/lib/api/idempotency");
    await getDb().insert(idempotencyKeys).values({
      apiKeyId: key.id,
      key: idem,
      organisationId: org.id,
      route: PATH,
      requestHash: requestFingerprint(PATH, JSON.stringify(body)),
      completed: false,
    });
    const res = await call(POST, PATH, { key: key.secret, body, headers: { "idempotency-key": idem } });
    expect(res.status).toBe(409);
    expect(res.json.code).toBe("idempotency_in_flight");
  });

  it("does not keep a rejected request, so a corrected retry with the same key goes through", async () => {
    const headers = { "idempotency-key": "idem-" + crypto.randomUUID() };
    const bad = await call(POST, PATH, { key: key.secret, body: { test: { link: {} } }, headers });
    expect(bad.status).toBe(422);
    const [left] = await getDb()
      .select({ n: count() })
      .from(idempotencyKeys)
      .where(and(eq(idempotencyKeys.apiKeyId, key.id), eq(idempotencyKeys.key, headers["idempotency-key"])));
    expect(left.n).toBe(0);
    const good = await call(POST, PATH, { key: key.secret, body: { test: passingTest("T-IDEM-5") }, headers });
    expect(good.status).toBe(201);
  });
});

describe("call log", () => {
  it("writes exactly one row per request, good or bad, with its request id, status and verdict id", async () => {
    const ok = await call(POST, PATH, { key: key.secret, body: { test: passingTest("T-LOG") } });
    const bad = await call(POST, PATH, { key: key.secret, rawBody: "nope", headers: { "content-type": "application/json" } });
    const anon = await call(POST, PATH, { body: { test: passingTest() } });
    for (const [res, status] of [[ok, 201], [bad, 400], [anon, 401]] as const) {
      const rid = res.headers.get("x-request-id")!;
      const rows = await getDb().select().from(callLog).where(eq(callLog.requestId, rid));
      expect(rows).toHaveLength(1);
      expect(rows[0]).toMatchObject({ status, method: "POST", route: PATH, path: PATH });
      expect(rows[0].latencyMs).toBeGreaterThan(0);
    }
    const [okRow] = await getDb().select().from(callLog).where(eq(callLog.requestId, ok.headers.get("x-request-id")!));
    expect(okRow).toMatchObject({ verdictId: ok.json.id, organisationId: org.id, apiKeyId: key.id, problemType: null });
    const [badRow] = await getDb().select().from(callLog).where(eq(callLog.requestId, bad.headers.get("x-request-id")!));
    expect(badRow.problemType).toBe("bad_request");
    const [anonRow] = await getDb().select().from(callLog).where(eq(callLog.requestId, anon.headers.get("x-request-id")!));
    expect(anonRow).toMatchObject({ organisationId: null, apiKeyId: null, problemType: "unauthorized" });
  });

  it("keeps a caller's well-formed X-Request-Id and replaces a malformed one", async () => {
    const mine = await call(POST, PATH, { key: key.secret, body: { test: passingTest() }, headers: { "x-request-id": "oss-run-2026-000123" } });
    expect(mine.headers.get("x-request-id")).toBe("oss-run-2026-000123");
    const junk = await call(POST, PATH, { key: key.secret, body: { test: passingTest() }, headers: { "x-request-id": "bad id\nwith newline" .replace("\n", " ") } });
    expect(junk.headers.get("x-request-id")).toMatch(/^req_/);
  });
});

describe("database unreachable", () => {
  it("answers 503 problem+json without internal text", async () => {
    const saved = process.env.DATABASE_URL;
    await closeDb();
    process.env.DATABASE_URL = "postgres://postgres@127.0.0.1:9/nowhere";
    try {
      const res = await call(POST, PATH, { key: key.secret, body: { test: passingTest() } });
      expect(res.status).toBe(503);
      expect(res.headers.get("content-type")).toBe("application/problem+json");
      expect(res.json.code).toBe("database_unavailable");
      expect(res.text).not.toMatch(/ECONNREFUSED|127\.0\.0\.1|stack|at /);
    } finally {
      await closeDb();
      process.env.DATABASE_URL = saved;
    }
  });
});
