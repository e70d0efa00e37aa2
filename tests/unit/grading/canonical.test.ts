// RFC 8785 canonical JSON checked against the `canonicalize` package (the RFC's reference
// implementation by its authors), and our SHA-256 against node:crypto.
import { createHash } from "node:crypto";
import canonicalize from "canonicalize";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { canonicalJson, resultDigest } from "@/lib/grading";
import { sha256Hex } from "@/lib/grading/sha256";

describe("canonical JSON (RFC 8785)", () => {
  it("matches the reference implementation on random JSON values", () => {
    fc.assert(
      fc.property(fc.jsonValue(), (v) => {
        expect(canonicalJson(v)).toBe(canonicalize(v));
      }),
      { numRuns: 2000 },
    );
  });

  it("matches the reference implementation on awkward numbers and strings", () => {
    fc.assert(
      fc.property(
        fc.dictionary(fc.string({ unit: "binary" }), fc.oneof(fc.double({ noNaN: true, noDefaultInfinity: true }), fc.string({ unit: "binary" }))),
        (v) => {
          expect(canonicalJson(v)).toBe(canonicalize(v));
        },
      ),
      { numRuns: 1000 },
    );
  });

  it("sorts keys by UTF-16 code units and prints numbers the ECMAScript way (RFC 8785 §3.2.3, §3.2.2.3)", () => {
    // Key order example in the spirit of RFC 8785 §3.2.3: "\u20ac" (U+20AC) sorts before "\ud83d\ude00" (surrogates D83D..)
    // but after "\u00e9"; numbers 1e21 and 0.000001 print as "1e+21" and "0.000001".
    expect(canonicalJson({ b: 1, a: [true, null, "x"], "\u20ac": 1e21, "\u00e9": 0.000001, "\ud83d\ude00": -0 })).toBe(
      '{"a":[true,null,"x"],"b":1,"\u00e9":0.000001,"\u20ac":1e+21,"\ud83d\ude00":0}',
    );
  });

  it("refuses values with no JSON form", () => {
    expect(() => canonicalJson({ x: Number.NaN })).toThrow(TypeError);
    expect(() => canonicalJson(Number.POSITIVE_INFINITY)).toThrow(TypeError);
  });
});

describe("SHA-256 (FIPS 180-4)", () => {
  it("gives the FIPS 180-4 test vectors for 'abc' and the empty string", () => {
    // FIPS 180-4 / NIST CSRC example values (well known; also what node:crypto returns)
    expect(sha256Hex("abc")).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
    expect(sha256Hex("")).toBe("e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855");
  });

  it("agrees with node:crypto on random strings of any length", () => {
    fc.assert(
      fc.property(fc.string({ unit: "binary", maxLength: 300 }), (s) => {
        expect(sha256Hex(s)).toBe(createHash("sha256").update(s, "utf8").digest("hex"));
      }),
      { numRuns: 1000 },
    );
  });

  it("digests a result as the SHA-256 of its canonical JSON", () => {
    const v = { verdict: "pass", headroomDb: 1.25, reasons: [] };
    expect(resultDigest(v)).toBe(createHash("sha256").update(canonicalize(v)!, "utf8").digest("hex"));
  });
});

describe("message number formatting", () => {
  it("prints the same digits as String(Math.round(x * 1000) / 1000)", async () => {
    const { fmt } = await import("@/lib/grading/context");
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (x) => {
        const expected = String(Math.round(x * 1000) / 1000 + 0);
        expect(fmt(x)).toBe(expected === "-0" ? "0" : expected);
      }),
      { numRuns: 5000 },
    );
    expect(fmt(15.0515)).toBe("15.052");
    expect(fmt(-0.0004)).toBe("0");
    expect(fmt(2.1)).toBe("2.1");
  });
});
