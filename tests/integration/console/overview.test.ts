// Overview figures computed from rows written straight into verdicts and call_log.
import { describe, expect, it } from "vitest";
import { getDb } from "@/db";
import { callLog, tests, verdicts } from "@/db/schema";
import { getOverview } from "@/lib/overview/queries";
import { orgWithEveryRole } from "./support";

const NOW = new Date("2026-12-01T12:00:00Z");

describe("overview", () => {
  it("counts verdicts per day, ranks reason codes of non-passing links and lists recent failures", async () => {
    const { org, members } = await orgWithEveryRole();
    const other = await orgWithEveryRole();
    // [link, verdict, reasons as code:severity, time]
    const spec: [string, "pass" | "marginal" | "fail", string[], string][] = [
      ["L-1", "pass", ["loss.within-budget:info"], "2026-11-30T09:00:00Z"],
      ["L-2", "fail", ["loss.over-budget:fail", "loss.over-budget:fail", "orl.below-minimum:fail", "loss.within-budget:info"], "2026-11-30T10:00:00Z"],
      ["L-3", "marginal", ["loss.over-budget:marginal", "orl.inconsistent:info"], "2026-12-01T08:00:00Z"],
      ["L-4", "pass", ["length.note:info"], "2026-12-01T09:00:00Z"],
      ["L-5", "fail", ["event.break:fail"], "2026-10-01T09:00:00Z"], // outside 30 days: not counted, still "recent"
    ];
    let seq = 0;
    for (const [ref, verdict, reasonSpecs, at] of spec) {
      const reasons = reasonSpecs.map((x) => ({ code: x.split(":")[0], severity: x.split(":")[1] }));
      const codes = [...new Set(reasons.map((r) => r.code))];
      for (const o of [org, other.org]) {
        const [t] = await getDb().insert(tests).values({ organisationId: o.id, linkRef: ref, input: {} }).returning();
        await getDb().insert(verdicts).values({
          organisationId: o.id, seq: ++seq, testId: t.id, linkRef: ref, verdict, profileSlug: "demo", profileVersion: 1,
          engineVersion: "test", reasonCodes: codes, result: { reasons }, digest: `d${seq}`, createdAt: new Date(at),
        });
      }
    }
    await getDb().insert(callLog).values([
      { organisationId: org.id, method: "POST", route: "/api/v1/gradings", path: "/api/v1/gradings", status: 201, latencyMs: 5, requestId: "r1", createdAt: new Date("2026-12-01T08:00:00Z") },
      { organisationId: org.id, method: "POST", route: "/api/v1/gradings", path: "/api/v1/gradings", status: 422, latencyMs: 5, requestId: "r2", createdAt: new Date("2026-12-01T08:01:00Z") },
      { organisationId: org.id, method: "GET", route: "/api/v1/verdicts", path: "/api/v1/verdicts", status: 503, latencyMs: 5, requestId: "r3", createdAt: new Date("2026-11-29T08:00:00Z") },
    ]);

    const o = await getOverview({ actor: members.auditor }, { now: NOW });
    expect(o.verdictsPerDay).toHaveLength(30);
    expect(o.verdictsPerDay.at(-1)).toEqual({ day: "2026-12-01", pass: 1, marginal: 1, fail: 0 });
    expect(o.verdictsPerDay.at(-2)).toEqual({ day: "2026-11-30", pass: 1, marginal: 0, fail: 1 });
    expect(o.totals).toEqual({ pass: 2, marginal: 1, fail: 1 });
    // Informational reasons are left out, even on failed links; a code repeated in one verdict counts once.
    expect(o.topReasons).toEqual([
      { code: "loss.over-budget", n: 2 },
      { code: "orl.below-minimum", n: 1 },
    ]);
    expect(o.recentFailures.map((f) => f.linkRef)).toEqual(["L-3", "L-2", "L-5"]);
    expect(o.recentFailures[0].profile).toBe("demo@1");
    expect(o.callsPerDay.at(-1)).toEqual({ day: "2026-12-01", "2xx": 1, "4xx": 1, "5xx": 0 });
    expect(o.callsPerDay.at(-3)).toEqual({ day: "2026-11-29", "2xx": 0, "4xx": 0, "5xx": 1 });
    expect(o.callsOwnOnly).toBe(false);

    // A developer sees the same verdicts but only calls of their own keys (none here).
    const d = await getOverview({ actor: members.developer }, { now: NOW });
    expect(d.totals).toEqual(o.totals);
    expect(d.callsOwnOnly).toBe(true);
    expect(d.callsPerDay.every((x) => x["2xx"] + x["4xx"] + x["5xx"] === 0)).toBe(true);
  });
});
