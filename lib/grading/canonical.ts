// RFC 8785 JSON Canonicalization Scheme (JCS) and the result digest. Written without node:crypto so
// that the engine also runs in the browser (the console previews grading client-side).
import { sha256Hex } from "./sha256";

/**
 * Serialise a JSON value canonically (RFC 8785): object keys sorted by UTF-16 code units, no
 * whitespace, numbers in ECMAScript Number-to-String form, strings escaped as JSON.stringify does.
 * Members whose value is undefined are dropped, as JSON.stringify drops them.
 */
export function canonicalJson(value: unknown): string {
  switch (typeof value) {
    case "string":
      return JSON.stringify(value);
    case "number":
      if (!Number.isFinite(value)) throw new TypeError("canonicalJson: non-finite numbers have no JSON form");
      return JSON.stringify(value);
    case "boolean":
      return value ? "true" : "false";
    case "object": {
      if (value === null) return "null";
      if (Array.isArray(value)) {
        return "[" + value.map((v) => (v === undefined || typeof v === "function" ? "null" : canonicalJson(v))).join(",") + "]";
      }
      const toJSON = (value as { toJSON?: () => unknown }).toJSON;
      if (typeof toJSON === "function") return canonicalJson(toJSON.call(value));
      const obj = value as Record<string, unknown>;
      const keys = Object.keys(obj).sort();
      const parts: string[] = [];
      for (const k of keys) {
        const v = obj[k];
        if (v === undefined || typeof v === "function") continue;
        parts.push(JSON.stringify(k) + ":" + canonicalJson(v));
      }
      return "{" + parts.join(",") + "}";
    }
    default:
      throw new TypeError(`canonicalJson: cannot serialise a ${typeof value}`);
  }
}

/** SHA-256 (hex) of the canonical JSON of a grading result; equal results give equal digests. */
export function resultDigest(result: unknown): string {
  return sha256Hex(canonicalJson(result));
}
