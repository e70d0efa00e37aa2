import { describe, expect, it } from "vitest";
import { z } from "zod";
import { describeDatabaseError, isDatabaseUnavailable } from "@/lib/api/db-errors";
import { parseIdempotencyKey, requestFingerprint } from "@/lib/api/idempotency";
import { ApiError, fieldErrorsFromIssues, jsonPointer } from "@/lib/api/problem";
import { TokenBucketLimiter, rateLimitHeaders } from "@/lib/api/rate-limit";
import { parseJsonText, validate } from "@/lib/api/read-body";
import { requestIdFor } from "@/lib/api/request-id";
import { bearerToken } from "@/lib/keys/verify";
import { decodeCursor, encodeCursor } from "@/lib/verdicts/read";

describe("JSON pointers (RFC 6901)", () => {
  it("escapes ~ as ~0 and / as ~1 (RFC 6901 section 3)", () => {
    expect(jsonPointer(["a/b", "m~n", 0])).toBe("/a~1b/m~0n/0");
    expect(jsonPointer([])).toBe("");
  });

  it("turns every zod issue into a pointer, one per unknown key", () => {
    const S = z.object({ a: z.number(), b: z.object({ c: z.string() }) }).strict();
    const r = S.safeParse({ a: "x", b: { c: 1 }, extra: 1, more: 2 });
    expect(r.success).toBe(false);
    const errs = fieldErrorsFromIssues(r.error!.issues, ["test"]);
    expect(errs.map((e) => e.pointer).sort()).toEqual(["/test/a", "/test/b/c", "/test/extra", "/test/more"]);
  });
});

describe("body parsing", () => {
  it("400 for text that is not JSON, 422 for JSON that fails the schema", () => {
    expect(() => parseJsonText("{")).toThrow(ApiError);
    try {
      parseJsonText("{");
    } catch (e) {
      expect((e as ApiError).status).toBe(400);
    }
    try {
      validate(z.object({ n: z.number() }), { n: "1" });
      expect.unreachable();
    } catch (e) {
      expect((e as ApiError).status).toBe(422);
      expect((e as ApiError).extra.errors).toEqual([{ pointer: "/n", message: expect.any(String) }]);
    }
  });
});

describe("token bucket", () => {
  it("allows the per-minute allowance, refuses the next, and refills with time", () => {
    const l = new TokenBucketLimiter();
    const t0 = 1_000_000;
    for (let i = 0; i < 3; i++) expect(l.take("k", 3, t0).allowed).toBe(true);
    const refused = l.take("k", 3, t0);
    expect(refused.allowed).toBe(false);
    expect(refused.remaining).toBe(0);
    // 3 per minute = one token every 20 s.
    expect(refused.retryAfterSeconds).toBe(20);
    expect(l.take("k", 3, t0 + 19_000).allowed).toBe(false);
    expect(l.take("k", 3, t0 + 20_001).allowed).toBe(true);
    // Buckets are per key.
    expect(l.take("other", 3, t0).allowed).toBe(true);
  });

  it("announces the policy in headers and adds Retry-After only when refused", () => {
    const l = new TokenBucketLimiter();
    const ok = rateLimitHeaders(l.take("k", 1, 0));
    expect(ok).toMatchObject({ "RateLimit-Limit": "1", "RateLimit-Remaining": "0", "RateLimit-Policy": "1;w=60" });
    expect(ok["Retry-After"]).toBeUndefined();
    const no = rateLimitHeaders(l.take("k", 1, 1000));
    expect(no["Retry-After"]).toBe("59");
  });
});

describe("Idempotency-Key header", () => {
  it("accepts bare and quoted (sf-string) forms and refuses junk", () => {
    expect(parseIdempotencyKey(null)).toBeNull();
    expect(parseIdempotencyKey("abc-123")).toBe("abc-123");
    expect(parseIdempotencyKey('"8e03978e-40d5-43e8-bc93-6894a57f9324"')).toBe("8e03978e-40d5-43e8-bc93-6894a57f9324");
    expect(() => parseIdempotencyKey("")).toThrow(ApiError);
    expect(() => parseIdempotencyKey("a b")).toThrow(ApiError);
    expect(() => parseIdempotencyKey("x".repeat(256))).toThrow(ApiError);
  });

  it("fingerprints route and body together", () => {
    expect(requestFingerprint("/a", "{}")).toBe(requestFingerprint("/a", "{}"));
    expect(requestFingerprint("/a", "{}")).not.toBe(requestFingerprint("/b", "{}"));
    expect(requestFingerprint("/a", "{}")).not.toBe(requestFingerprint("/a", "{ }"));
  });
});

describe("small pieces", () => {
  it("reads only the Bearer scheme", () => {
    expect(bearerToken("Bearer gg_sbx_abc")).toBe("gg_sbx_abc");
    expect(bearerToken("bearer   gg_sbx_abc ")).toBe("gg_sbx_abc");
    expect(bearerToken("Basic Zm9vOmJhcg==")).toBeNull();
    expect(bearerToken(null)).toBeNull();
  });

  it("round-trips cursors and rejects forged ones", () => {
    expect(decodeCursor(encodeCursor(1042))).toBe(1042);
    expect(decodeCursor("garbage")).toBeNull();
    expect(decodeCursor(Buffer.from('{"s":-1}').toString("base64url"))).toBeNull();
  });

  it("keeps a sane caller request id and replaces anything else", () => {
    expect(requestIdFor(new Request("http://t", { headers: { "x-request-id": "oss-00012345" } }))).toBe("oss-00012345");
    expect(requestIdFor(new Request("http://t", { headers: { "x-request-id": "<script>" } }))).toMatch(/^req_[A-Za-z0-9_-]{16}$/);
  });

  it("recognises an unreachable database through wrapped causes", () => {
    const refused = Object.assign(new Error("connect ECONNREFUSED"), { code: "ECONNREFUSED" });
    expect(isDatabaseUnavailable(new Error("Failed query", { cause: refused }))).toBe(true);
    expect(isDatabaseUnavailable(Object.assign(new Error("x"), { code: "57P01" }))).toBe(true);
    expect(isDatabaseUnavailable(Object.assign(new Error("duplicate key"), { code: "23505" }))).toBe(false);
    expect(isDatabaseUnavailable(new TypeError("undefined is not a function"))).toBe(false);
  });

  it("logs a database failure in the driver's words, without the query's parameters", () => {
    const refused = Object.assign(new Error("connect ECONNREFUSED 127.0.0.1:9"), { code: "ECONNREFUSED" });
    const wrapped = new Error('Failed query: select ... where "hash" = $1\nparams: 70bb2e5494', { cause: refused });
    const line = describeDatabaseError(wrapped);
    expect(line).toBe("ECONNREFUSED connect ECONNREFUSED 127.0.0.1:9");
    expect(line).not.toContain("70bb2e5494");
  });
});
