import { describe, expect, it } from "vitest";
import { fillDays, lastDays } from "@/lib/overview/days";

describe("overview day buckets", () => {
  it("lists the last n UTC days ending today, across a month end", () => {
    expect(lastDays(3, new Date("2026-12-01T00:30:00Z"))).toEqual(["2026-11-29", "2026-11-30", "2026-12-01"]);
  });

  it("fills missing days with zeros and ignores rows outside the range", () => {
    const days = ["2026-11-30", "2026-12-01"];
    const out = fillDays(days, ["pass", "fail"] as const, [
      { day: "2026-12-01", key: "fail", n: 2 },
      { day: "2026-12-01", key: "pass", n: 5 },
      { day: "2026-11-01", key: "pass", n: 9 },
    ]);
    expect(out).toEqual([
      { day: "2026-11-30", pass: 0, fail: 0 },
      { day: "2026-12-01", pass: 5, fail: 2 },
    ]);
  });
});
