// CSV export follows RFC 4180 (quoting of commas, quotes and line breaks; CRLF line ends) and defuses
// spreadsheet formulas, the injection OWASP describes under "CSV Injection".
import { describe, expect, it } from "vitest";
import { CSV_COLUMNS, csvField, csvHeader, csvRow } from "@/lib/calllog/csv";

describe("call-log CSV", () => {
  it("quotes fields holding commas, quotes or line breaks (RFC 4180 section 2, rules 6 and 7)", () => {
    expect(csvField("a,b")).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField("two\nlines")).toBe('"two\nlines"');
    expect(csvField("plain")).toBe("plain");
    expect(csvField(null)).toBe("");
    expect(csvField(404)).toBe("404");
  });

  it("prefixes text that a spreadsheet would run as a formula", () => {
    expect(csvField("=HYPERLINK(\"http://x\")")).toBe("\"'=HYPERLINK(\"\"http://x\"\")\"");
    expect(csvField("+1")).toBe("'+1");
    expect(csvField("@SUM(A1)")).toBe("'@SUM(A1)");
    expect(csvField(-3)).toBe("-3"); // numbers stay numbers
  });

  it("writes a header and one CRLF-terminated line per call in column order", () => {
    expect(csvHeader()).toBe(CSV_COLUMNS.join(",") + "\r\n");
    const line = csvRow({
      id: 7, createdAt: "2026-12-01T10:00:00.000Z", method: "POST", route: "/api/v1/gradings", path: "/api/v1/gradings", status: 422,
      latencyMs: 12.5, requestId: "req_1", verdictId: null, problemType: "https://glassgrade.dev/problems/validation-failed",
      apiKeyId: null, keyName: "Work orders, north", keyStart: "gg_live_AbCd…", userName: null,
    });
    expect(line).toBe('2026-12-01T10:00:00.000Z,POST,/api/v1/gradings,/api/v1/gradings,422,12.5,req_1,"Work orders, north",gg_live_AbCd…,,,https://glassgrade.dev/problems/validation-failed\r\n');
  });
});
