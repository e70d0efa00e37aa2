// Limit-by-limit comparison of two JSON documents (profile limits, or a stored and a replayed result).
// Pure: no database, so the console, replay and tests share it.

export type JsonValue = null | boolean | number | string | JsonValue[] | { [k: string]: JsonValue };

export interface LimitChange {
  /** Dotted path, array items named by their key field when they have one: `applications[10GBASE-SR].maxLossDb`. */
  path: string;
  kind: "added" | "removed" | "changed";
  before?: JsonValue;
  after?: JsonValue;
}

// Array items are matched by their identifying fields rather than by position, so inserting a row into
// a table does not show every following row as changed. An attenuation row is named by its fibre types and
// wavelength, an application row by its name and wavelength, a PON class by its class, and so on.
const KEY_FIELDS = ["slug", "id", "code", "application", "ponClass", "receiver", "fibreTypes", "fibreType", "polish", "wavelengthNm", "ratio", "name"];

function keyOf(item: JsonValue): string | undefined {
  if (item === null || typeof item !== "object" || Array.isArray(item)) return undefined;
  const parts: string[] = [];
  for (const k of KEY_FIELDS) {
    const v = item[k];
    if (typeof v === "string" || typeof v === "number") parts.push(k === "wavelengthNm" ? `${v} nm` : String(v));
    else if (Array.isArray(v) && v.every((x) => typeof x === "string")) parts.push(v.join("/"));
  }
  return parts.length ? parts.join(" ") : undefined;
}

function arrayEntries(arr: JsonValue[]): [string, JsonValue][] {
  const keys = arr.map(keyOf);
  const unique = keys.every((k) => k !== undefined) && new Set(keys).size === keys.length;
  return arr.map((v, i) => [unique ? keys[i]! : String(i), v]);
}

function join(base: string, part: string, inArray: boolean): string {
  if (inArray) return `${base}[${part}]`;
  return base ? `${base}.${part}` : part;
}

function isObject(v: unknown): v is { [k: string]: JsonValue } {
  return v !== null && typeof v === "object" && !Array.isArray(v);
}

function walk(a: JsonValue | undefined, b: JsonValue | undefined, path: string, out: LimitChange[]): void {
  if (a === undefined && b === undefined) return;
  if (a === undefined) return void out.push({ path, kind: "added", after: b });
  if (b === undefined) return void out.push({ path, kind: "removed", before: a });
  if (Array.isArray(a) && Array.isArray(b)) {
    const ea = new Map(arrayEntries(a));
    const eb = new Map(arrayEntries(b));
    for (const k of new Set([...ea.keys(), ...eb.keys()])) walk(ea.get(k), eb.get(k), join(path, k, true), out);
    return;
  }
  if (isObject(a) && isObject(b)) {
    for (const k of new Set([...Object.keys(a), ...Object.keys(b)])) walk(a[k], b[k], join(path, k, false), out);
    return;
  }
  if (a !== b) out.push({ path, kind: "changed", before: a, after: b });
}

export function diffJson(before: unknown, after: unknown): LimitChange[] {
  const out: LimitChange[] = [];
  walk(before as JsonValue, after as JsonValue, "", out);
  return out;
}
