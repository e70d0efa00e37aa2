import type { CallRow } from "./query";

export const CSV_COLUMNS: (keyof CallRow)[] = [
  "createdAt", "method", "route", "path", "status", "latencyMs", "requestId", "keyName", "keyStart", "userName", "verdictId", "problemType",
];

/** RFC 4180 field: quoted when it holds a comma, quote or line break. Leading =+-@ are prefixed so a spreadsheet never runs them as formulas. */
export function csvField(v: unknown): string {
  if (v === null || v === undefined) return "";
  let s = String(v);
  if (/^[=+\-@\t\r]/.test(s) && typeof v === "string") s = "'" + s;
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export function csvLine(values: unknown[]): string {
  return values.map(csvField).join(",") + "\r\n";
}

export function csvHeader(): string {
  return csvLine(CSV_COLUMNS);
}

export function csvRow(r: CallRow): string {
  return csvLine(CSV_COLUMNS.map((c) => r[c]));
}
