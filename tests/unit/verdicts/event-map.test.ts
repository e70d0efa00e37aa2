import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { BudgetChart } from "@/components/verdicts/budget-chart";
import { buildMarkers, EventMap } from "@/components/verdicts/event-map";
import { niceStep, ticks } from "@/components/verdicts/scale";
import { findTemplate, grade } from "@/lib/grading";
import type { LinkTest } from "@/lib/grading/schema";

// Our own drawing rules (no outside source): checked by examples.
const test: LinkTest = {
  link: { ref: "NM-TEST-1", fibreType: "OS2", connectorPairs: 2, splices: 2, polish: "UPC" },
  measurements: [
    { wavelengthNm: 1310, insertionLossDb: 3.1, lengthM: 8000 },
    { wavelengthNm: 1550, insertionLossDb: 2.4, lengthM: 8000 },
  ],
  events: [
    { wavelengthNm: 1310, positionM: 0, kind: "connector", lossDb: 0.3, reflectanceDb: -55 },
    { wavelengthNm: 1550, positionM: 0, kind: "connector", lossDb: 0.3, reflectanceDb: -55 },
    { wavelengthNm: 1310, positionM: 2000, kind: "splice", lossDb: 0.9 },
    { wavelengthNm: 1550, positionM: 2000.3, kind: "splice", lossDb: 0.95 },
    { wavelengthNm: 1310, positionM: 6000, kind: "splice", lossDb: 0.05 },
    { wavelengthNm: 1310, positionM: 8000, kind: "end" },
  ],
};

describe("axis ticks", () => {
  it("steps by 1, 2 or 5 times a power of ten", () => {
    expect(niceStep(8000, 8)).toBe(1000);
    expect(niceStep(12_000, 8)).toBe(2000);
    expect(niceStep(3.3, 8)).toBe(0.5);
    expect(ticks(8000, 8)).toEqual([0, 1000, 2000, 3000, 4000, 5000, 6000, 7000, 8000]);
  });
});

describe("event map", () => {
  const result = grade(test, findTemplate("tia-568-3-d-singlemode-osp")!);

  it("merges one event's readings at several wavelengths into one marker and carries the worst severity", () => {
    const markers = buildMarkers(test, result);
    expect(markers.map((m) => [m.kind, m.positionM, m.lines.length])).toEqual([
      ["connector", 0, 2],
      ["splice", 2000, 2],
      ["splice", 6000, 1],
      ["end", 8000, 1],
    ]);
    // A 0.9 dB splice is over any splice limit the template has; a 0.05 dB one is not.
    expect(markers[1].severity).toBe("fail");
    expect(markers[2].severity).toBe("ok");
  });

  it("places markers in proportion to their distance from end A", () => {
    const svg = renderToStaticMarkup(createElement(EventMap, { test, result }));
    const xs = [...svg.matchAll(/class="ring" cx="([\d.]+)"/g)].map((m) => Number(m[1]));
    expect(xs).toHaveLength(4);
    const [a, s1, s2, b] = xs;
    expect((s1 - a) / (b - a)).toBeCloseTo(2000 / 8000, 6);
    expect((s2 - a) / (b - a)).toBeCloseTo(6000 / 8000, 6);
    expect(svg).toContain("Event map of NM-TEST-1");
  });

  it("says so instead of drawing when a test has no events", () => {
    const html = renderToStaticMarkup(createElement(EventMap, { test: { ...test, events: [] }, result }));
    expect(html).toContain("lists no events");
  });
});

describe("budget chart", () => {
  it("draws one row per wavelength and states the headroom, with a table of the same figures", () => {
    const result = grade(test, findTemplate("tia-568-3-d-singlemode-osp")!);
    const html = renderToStaticMarkup(createElement(BudgetChart, { result }));
    expect(result.wavelengths.length).toBe(2);
    for (const w of result.wavelengths) {
      expect(html).toContain(`data-wavelength="${w.wavelengthNm}"`);
      expect(html).toContain(`<td>${w.headroomDb.toFixed(2)}</td>`);
    }
  });
});
