import { execFileSync } from "node:child_process";
import { mkdtemp, readFile, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { csvCell, csvRow } from "@/lib/audit/csv";
import { tarChunks } from "@/lib/audit/tar";

describe("CSV cells (RFC 4180 section 2)", () => {
  it("quotes fields with commas, quotes and line breaks, doubling inner quotes (RFC 4180 2.6, 2.7)", () => {
    expect(csvCell('a "b", c')).toBe('"a ""b"", c"');
    expect(csvCell("two\nlines")).toBe('"two\nlines"');
    expect(csvRow(["x", 1.5, null, -0.25])).toBe("x,1.5,,-0.25\r\n");
  });

  it("defuses text that a spreadsheet would run as a formula (OWASP CSV injection), but keeps negative numbers", () => {
    expect(csvCell("=HYPERLINK(1)")).toBe("'=HYPERLINK(1)");
    expect(csvCell("@cmd")).toBe("'@cmd");
    expect(csvCell("-0.4")).toBe("-0.4");
  });
});

describe("tar writer, read back by GNU tar (POSIX ustar)", () => {
  let dir: string;
  beforeAll(async () => {
    dir = await mkdtemp(path.join(tmpdir(), "gg-tar-"));
  });
  afterAll(async () => {
    await rm(dir, { recursive: true, force: true });
  });

  it("produces an archive that tar lists and extracts byte for byte", async () => {
    const files = { "a.txt": "hello\n", "b.jsonl": "x".repeat(1300) + "\n", "empty.csv": "" };
    for (const [n, body] of Object.entries(files)) await writeFile(path.join(dir, n), body);
    const chunks: Buffer[] = [];
    for await (const c of tarChunks(Object.keys(files).map((n) => ({ name: `pack/${n}`, path: path.join(dir, n) })), new Date("2026-01-02T03:04:05Z"))) chunks.push(c);
    const archive = Buffer.concat(chunks);
    expect(archive.length % 512).toBe(0);
    const tarPath = path.join(dir, "out.tar");
    await writeFile(tarPath, archive);
    const listing = execFileSync("tar", ["-tvf", tarPath], { encoding: "utf8" });
    expect(listing).toContain("pack/b.jsonl");
    expect(listing).toContain("2026-01-02");
    const out = path.join(dir, "out");
    execFileSync("mkdir", ["-p", out]);
    execFileSync("tar", ["-xf", tarPath, "-C", out]);
    for (const [n, body] of Object.entries(files)) expect(await readFile(path.join(out, "pack", n), "utf8")).toBe(body);
  });
});
