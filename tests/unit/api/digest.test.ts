import { createHash } from "node:crypto";
import canonicalize from "canonicalize";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { findTemplate, grade, resultDigest } from "@/lib/grading";
import { verdictDigest } from "@/lib/verdicts/digest";
import { exampleTest } from "@/openapi/examples";

describe("verdict digest", () => {
  it("equals the engine's resultDigest for any JSON value (the server's fast path must not drift)", () => {
    fc.assert(
      fc.property(fc.jsonValue(), (v) => {
        expect(verdictDigest(v)).toBe(resultDigest(v));
      }),
      { numRuns: 300 },
    );
  });

  it("is SHA-256 of the RFC 8785 form given by the reference canonicalize package, for a real result", () => {
    const result = grade(exampleTest, findTemplate("tia-568-3-d-singlemode-osp")!);
    const reference = createHash("sha256").update(canonicalize(result)!, "utf8").digest("hex");
    expect(verdictDigest(result)).toBe(reference);
  });

  it("does not depend on key order", () => {
    expect(verdictDigest({ b: 1, a: [1, { d: 2, c: 3 }] })).toBe(verdictDigest({ a: [1, { c: 3, d: 2 }], b: 1 }));
  });
});
