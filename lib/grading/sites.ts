// Groups the submitted events into sites: one physical feature of the link seen at several wavelengths
// and from one or both ends. Positions are always measured from end A, so the same splice seen from A
// and from B lands in one site. The grouping sorts first, so the order of the submitted events does not
// change the outcome.
import type { EventKind, LinkEvent } from "./schema";

export interface SiteReading {
  wavelengthNm: number;
  /** Loss per direction (worst of duplicates); undefined when that direction did not report one. */
  ab?: number;
  ba?: number;
  /** Worst (highest) reflectance over both directions. */
  reflectanceDb?: number;
  /** Lowest submitted index among the events at this wavelength, for pointing back at the input. */
  eventIndex: number;
}

export interface Site {
  positionM: number;
  kind: EventKind;
  firstIndex: number;
  /** One reading per wavelength, in ascending wavelength order. */
  readings: SiteReading[];
}

// When one feature is labelled differently per wavelength or direction, the most telling label wins:
// a break outranks everything, a splitter or connector outranks a splice, and a splice outranks a bend
// (a bend seen only at the longer wavelength is caught by the macrobend rule anyway).
const KIND_PRIORITY: Record<EventKind, number> = {
  break: 9,
  splitter: 8,
  connector: 7,
  reflective: 6,
  splice: 5,
  "non-reflective": 4,
  bend: 3,
  unknown: 2,
  end: 1,
};

function compareEvents(a: LinkEvent, b: LinkEvent): number {
  return (
    a.positionM - b.positionM ||
    a.wavelengthNm - b.wavelengthNm ||
    cmp(a.direction ?? "AB", b.direction ?? "AB") ||
    cmp(a.kind, b.kind) ||
    (a.lossDb ?? -99) - (b.lossDb ?? -99) ||
    (a.reflectanceDb ?? -999) - (b.reflectanceDb ?? -999)
  );
}

function cmp(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

export function groupSites(events: readonly LinkEvent[], toleranceM: number): Site[] {
  const order = events.map((_, i) => i);
  // Instruments usually list events in position order already; sorting is then skipped, which
  // gives the same order the sort would (ties keep their submitted order either way).
  let sorted = true;
  for (let k = 1; k < events.length && sorted; k++) sorted = compareEvents(events[k - 1], events[k]) <= 0;
  if (!sorted) order.sort((i, j) => compareEvents(events[i], events[j]) || i - j);
  const sites: Site[] = [];
  let current: Site | undefined;
  for (const i of order) {
    const e = events[i];
    if (!current || e.positionM - current.positionM > toleranceM) {
      current = { positionM: e.positionM, kind: e.kind, firstIndex: i, readings: [] };
      sites.push(current);
    }
    if (KIND_PRIORITY[e.kind] > KIND_PRIORITY[current.kind]) current.kind = e.kind;
    if (i < current.firstIndex) current.firstIndex = i;
    const r = readingAt(current.readings, e.wavelengthNm, i);
    if (i < r.eventIndex) r.eventIndex = i;
    if (e.lossDb !== undefined) {
      if (e.direction === "BA") r.ba = r.ba === undefined ? e.lossDb : Math.max(r.ba, e.lossDb);
      else r.ab = r.ab === undefined ? e.lossDb : Math.max(r.ab, e.lossDb);
    }
    if (e.reflectanceDb !== undefined) {
      r.reflectanceDb = r.reflectanceDb === undefined ? e.reflectanceDb : Math.max(r.reflectanceDb, e.reflectanceDb);
    }
  }
  return sites;
}

/** The reading for one wavelength, created in wavelength order if missing (a site has only a few). */
function readingAt(readings: SiteReading[], wavelengthNm: number, index: number): SiteReading {
  let k = 0;
  while (k < readings.length && readings[k].wavelengthNm < wavelengthNm) k++;
  if (k < readings.length && readings[k].wavelengthNm === wavelengthNm) return readings[k];
  const r: SiteReading = { wavelengthNm, eventIndex: index };
  readings.splice(k, 0, r);
  return r;
}

export function readingFor(site: Site, wavelengthNm: number): SiteReading | undefined {
  for (const r of site.readings) if (r.wavelengthNm === wavelengthNm) return r;
  return undefined;
}

/**
 * The loss to judge at one wavelength: the mean of both directions when both were measured (the
 * bidirectional average cancels backscatter-coefficient differences, IEC 61746 / ITU-T G.650.3
 * practice), otherwise the one direction given.
 */
export function siteLoss(r: SiteReading): number | undefined {
  if (r.ab !== undefined && r.ba !== undefined) return (r.ab + r.ba) / 2;
  return r.ab ?? r.ba;
}

export function isConnectorLike(site: Site): boolean {
  if (site.kind === "connector" || site.kind === "reflective") return true;
  if (site.kind !== "unknown") return false;
  for (const r of site.readings) if (r.reflectanceDb !== undefined) return true;
  return false;
}

export function isSpliceLike(site: Site): boolean {
  return site.kind === "splice" || site.kind === "non-reflective" || site.kind === "bend" || (site.kind === "unknown" && !isConnectorLike(site));
}
