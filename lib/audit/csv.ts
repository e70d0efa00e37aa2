// RFC 4180 CSV. Text cells that a spreadsheet would run as a formula get a leading apostrophe
// (OWASP "CSV injection"); numbers, including negative ones, are written as they are.
export type Cell = string | number | boolean | null | undefined;

export function csvCell(value: Cell): string {
  if (value === null || value === undefined) return "";
  if (typeof value === "number" || typeof value === "boolean") return String(value);
  let s = value;
  if (/^[=+\-@\t\r]/.test(s) && !/^[+-]?\d+(\.\d+)?$/.test(s)) s = "'" + s;
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export function csvRow(cells: Cell[]): string {
  return cells.map(csvCell).join(",") + "\r\n";
}
