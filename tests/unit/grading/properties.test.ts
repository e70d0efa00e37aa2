// Property tests: the engine's answers behave the way any acceptance rule must.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { canonicalJson, grade, GradingResultSchema, resultDigest, type GradingResult, type LinkTest } from "@/lib/grading";
import { arbLinkTest, arbTemplate, tighten } from "./arbitraries";

const RANK = { pass: 0, marginal: 1, fail: 2 } as const;
const RUNS = 400;

/** The result without pointers into the submitted event array, which move when events are reordered. */
function withoutEventIndex(r: GradingResult): unknown {
  return { ...r, reasons: r.reasons.map(({ eventIndex: _eventIndex, ...rest }) => rest) };
}

function wavelengthRank(test: LinkTest, nm: number): number {
  return [...new Set(test.measurements.map((m) => m.wavelengthNm))].sort((a, b) => a - b).indexOf(nm);
}

describe("grading properties", () => {
  it("random valid inputs never throw and give a result that matches the result schema", () => {
    fc.assert(
      fc.property(arbLinkTest({ withPon: true }), arbTemplate(), (test, profile) => {
        const r = grade(test, profile);
        expect(GradingResultSchema.safeParse(r).success).toBe(true);
        expect(["pass", "marginal", "fail"]).toContain(r.verdict);
      }),
      { numRuns: RUNS },
    );
  });

  it("the same input gives the same canonical output and digest", () => {
    fc.assert(
      fc.property(arbLinkTest({ withPon: true }), arbTemplate(), (test, profile) => {
        const a = grade(test, profile);
        const b = grade(structuredClone(test), structuredClone(profile));
        expect(canonicalJson(b)).toBe(canonicalJson(a));
        expect(resultDigest(b)).toBe(resultDigest(a));
      }),
      { numRuns: RUNS },
    );
  });

  it("the order of the events does not change the result", () => {
    fc.assert(
      fc.property(arbLinkTest({ withPon: true }), arbTemplate(), fc.integer(), (test, profile, seed) => {
        const events = test.events ?? [];
        // Deterministic shuffle from the seed (Fisher-Yates with a small LCG).
        const shuffled = [...events];
        let s = seed >>> 0;
        for (let i = shuffled.length - 1; i > 0; i--) {
          s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
          const j = s % (i + 1);
          [shuffled[i], shuffled[j]] = [shuffled[j], shuffled[i]];
        }
        const a = grade(test, profile);
        const b = grade({ ...test, events: shuffled }, profile);
        expect(canonicalJson(withoutEventIndex(b))).toBe(canonicalJson(withoutEventIndex(a)));
      }),
      { numRuns: RUNS },
    );
  });

  // PON classes are left out: below a class's minimum loss, more loss is better (receiver overload).
  // Added loss never falls with wavelength, as no loss mechanism in these windows does so steeply
  // that a spectral (macrobend) rule would be cleared by it; see docs/grading.md.
  it("more loss anywhere never improves the verdict or the headroom", () => {
    fc.assert(
      fc.property(
        arbLinkTest({ withPon: false }),
        arbTemplate(false),
        // Mostly small steps, comparable to the guard bands, where a wrong decision rule would show.
        fc.oneof({ arbitrary: fc.integer({ min: 0, max: 30 }), weight: 3 }, { arbitrary: fc.integer({ min: 0, max: 300 }), weight: 1 }).map((x) => x / 100),
        fc.integer({ min: 0, max: 30 }).map((x) => x / 100),
        fc.array(fc.boolean(), { minLength: 12, maxLength: 12 }),
        fc.boolean(),
        (test, profile, base, slope, pickSite, touchIl) => {
          const extra = (nm: number) => Math.round((base + slope * wavelengthRank(test, nm)) * 100) / 100;
          const positions = [...new Set((test.events ?? []).map((e) => e.positionM))].sort((a, b) => a - b);
          const worse: LinkTest = {
            ...test,
            measurements: test.measurements.map((m) =>
              touchIl && m.insertionLossDb !== undefined ? { ...m, insertionLossDb: m.insertionLossDb + extra(m.wavelengthNm) } : m,
            ),
            events: (test.events ?? []).map((e) =>
              pickSite[positions.indexOf(e.positionM) % 12] && e.lossDb !== undefined ? { ...e, lossDb: e.lossDb + extra(e.wavelengthNm) } : e,
            ),
          };
          const a = grade(test, profile);
          const b = grade(worse, profile);
          expect(RANK[b.verdict]).toBeGreaterThanOrEqual(RANK[a.verdict]);
          if (a.headroomDb !== null) expect(b.headroomDb!).toBeLessThanOrEqual(a.headroomDb);
          for (const wa of a.wavelengths) {
            const wb = b.wavelengths.find((w) => w.wavelengthNm === wa.wavelengthNm)!;
            expect(wb.headroomDb).toBeLessThanOrEqual(wa.headroomDb);
            expect(RANK[wb.verdict]).toBeGreaterThanOrEqual(RANK[wa.verdict]);
          }
        },
      ),
      { numRuns: RUNS },
    );
  });

  it("tighter limits never improve the verdict or the headroom", () => {
    fc.assert(
      fc.property(
        arbLinkTest({ withPon: true }),
        arbTemplate(),
        fc.integer({ min: 0, max: 1000 }).map((x) => x / 1000),
        fc.integer({ min: 0, max: 500 }).map((x) => x / 100),
        (test, profile, factor, step) => {
          const a = grade(test, profile);
          const b = grade(test, tighten(profile, factor, step));
          expect(RANK[b.verdict]).toBeGreaterThanOrEqual(RANK[a.verdict]);
          if (a.headroomDb !== null) expect(b.headroomDb!).toBeLessThanOrEqual(a.headroomDb);
        },
      ),
      { numRuns: RUNS },
    );
  });
});
