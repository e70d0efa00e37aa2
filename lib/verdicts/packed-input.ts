// Reads the compact copy of a stored test's input (preview_inputs.packed), written by the SQL function
// glassgrade_pack_test_input() in db/migrations/0005_preview_input_packing.sql, which documents the
// layout. Impact previews decode hundreds of thousands of these, so objects are built with plain
// property stores and no schema pass: the values were validated when the test was submitted, and the
// packing only moves them. A field the input does not carry is left off, never set to undefined, so a
// decoded test equals the stored one.
import type { LinkEvent, LinkTest, Measurement } from "@/lib/grading/schema";

export const PACKED_INPUT_VERSION = 1;

/** The input fields the packed layout carries, in packed order; a test pins them to the zod schema. */
export const PACKED_FIELDS = {
  link: ["ref", "fibreType", "designLengthM", "connectorPairs", "splices", "splitters", "polish", "application", "ponClass"],
  measurement: ["wavelengthNm", "direction", "method", "insertionLossDb", "orlDb", "lengthM"],
  event: ["wavelengthNm", "direction", "positionM", "kind", "lossDb", "reflectanceDb"],
  powerReading: ["wavelengthNm", "dbm"],
  inspection: ["location", "result"],
  test: ["link", "measurements", "events", "powerReadings", "inspections"],
} as const;

type Packed = unknown[];

function measurement(m: Packed): Measurement {
  const out = { wavelengthNm: m[0] } as Measurement;
  if (m[1] !== null) out.direction = m[1] as Measurement["direction"];
  if (m[2] !== null) out.method = m[2] as Measurement["method"];
  if (m[3] !== null) out.insertionLossDb = m[3] as number;
  if (m[4] !== null) out.orlDb = m[4] as number;
  if (m[5] !== null) out.lengthM = m[5] as number;
  return out;
}

function event(e: Packed): LinkEvent {
  const out = { wavelengthNm: e[0], positionM: e[2], kind: e[3] } as LinkEvent;
  if (e[1] !== null) out.direction = e[1] as LinkEvent["direction"];
  if (e[4] !== null) out.lossDb = e[4] as number;
  if (e[5] !== null) out.reflectanceDb = e[5] as number;
  return out;
}

export function unpackTestInput(text: string): LinkTest {
  const p = JSON.parse(text) as Packed;
  if (p[0] !== PACKED_INPUT_VERSION) throw new Error(`packed test input version ${String(p[0])} is not known`);
  const l = p[1] as Packed;
  const link = { ref: l[0], fibreType: l[1] } as LinkTest["link"];
  if (l[2] !== null) link.designLengthM = l[2] as number;
  if (l[3] !== null) link.connectorPairs = l[3] as number;
  if (l[4] !== null) link.splices = l[4] as number;
  if (l[5] !== null) link.splitters = (l[5] as string[]).map((ratio) => ({ ratio }));
  if (l[6] !== null) link.polish = l[6] as LinkTest["link"]["polish"];
  if (l[7] !== null) link.application = l[7] as string;
  if (l[8] !== null) link.ponClass = l[8] as string;
  const test = { link, measurements: (p[2] as Packed[]).map(measurement) } as LinkTest;
  if (p[3] !== null) test.events = (p[3] as Packed[]).map(event);
  if (p[4] !== null) test.powerReadings = (p[4] as Packed[]).map((r) => ({ wavelengthNm: r[0] as number, dbm: r[1] as number }));
  if (p[5] !== null) test.inspections = (p[5] as Packed[]).map((i) => ({ location: i[0] as string, result: i[1] as "pass" | "fail" }));
  return test;
}
