import { execFileSync } from "node:child_process";
import { createHash } from "node:crypto";
import { createWriteStream } from "node:fs";
import { mkdtemp, readFile, readdir, rm, stat } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { pipeline } from "node:stream/promises";
import canonicalize from "canonicalize";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db";
import { ForbiddenError } from "@/lib/auth/errors";
import { buildAuditPack, packTarStream, PACK_FORMAT, type PackManifest } from "@/lib/audit/export";
import { orgWithRoles, storeHistory, type OrgWithRoles } from "../../helpers/profile-fixtures";

// Reads CSV by RFC 4180 rules, independently of the writer: quoted fields may hold commas, quotes, newlines.
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let cell = "";
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') { cell += '"'; i++; }
      else if (c === '"') quoted = false;
      else cell += c;
    } else if (c === '"') quoted = true;
    else if (c === ",") { row.push(cell); cell = ""; }
    else if (c === "\r" && text[i + 1] === "\n") { row.push(cell); rows.push(row); row = []; cell = ""; i++; }
    else cell += c;
  }
  return rows;
}

describe("audit pack export", () => {
  let o: OrgWithRoles;
  let work: string;
  const end = new Date("2026-11-25T08:00:00Z");
  beforeAll(async () => {
    o = await orgWithRoles();
    await storeHistory(o.org.id, 300, { end, seed: 31 });
    work = await mkdtemp(path.join(tmpdir(), "gg-pack-test-"));
  });
  afterAll(async () => {
    await rm(work, { recursive: true, force: true });
    await closeDb();
  });

  it("writes a tar that GNU tar extracts and sha256sum verifies, for the chosen time range only", async () => {
    // Tests sit one minute apart ending at `end`: this window holds the 120 verdicts with seq 101..220.
    const from = new Date(end.getTime() - 200 * 60_000);
    const to = new Date(end.getTime() - 80 * 60_000);
    const seen: number[] = [];
    const pack = await buildAuditPack(o.ctx("auditor"), { from, to, batchSize: 50 }, (done) => seen.push(done));
    expect(seen).toEqual([0, 50, 100, 120]);
    const tarPath = path.join(work, "pack.tar");
    await pipeline(packTarStream(pack), createWriteStream(tarPath));
    // The temporary folder goes once the stream is done.
    await new Promise((r) => setTimeout(r, 50));
    await expect(stat(pack.dir)).rejects.toThrow();

    execFileSync("tar", ["-xf", tarPath, "-C", work]);
    const dir = path.join(work, "audit-pack");
    expect((await readdir(dir)).sort()).toEqual(["SHA256SUMS", "manifest.json", "tests.csv", "tests.jsonl", "verdicts.csv", "verdicts.jsonl"]);
    // coreutils checks every listed digest, the manifest's own included.
    const check = execFileSync("sha256sum", ["-c", "SHA256SUMS"], { cwd: dir, encoding: "utf8" });
    expect(check.trim().split("\n")).toHaveLength(5);
    expect(check).not.toMatch(/FAILED/);

    const manifest = JSON.parse(await readFile(path.join(dir, "manifest.json"), "utf8")) as PackManifest;
    expect(manifest.format).toBe(PACK_FORMAT);
    expect(manifest.counts).toEqual({ verdicts: 120, tests: 120 });
    expect(manifest.range).toEqual({ from: from.toISOString(), to: to.toISOString() });
    expect(manifest.chain.firstSeq).toBe(101);
    expect(manifest.chain.lastSeq).toBe(220);
    for (const f of manifest.files) {
      const body = await readFile(path.join(dir, f.name));
      expect(createHash("sha256").update(body).digest("hex")).toBe(f.sha256);
      expect(body.length).toBe(f.bytes);
    }

    const verdictLines = (await readFile(path.join(dir, "verdicts.jsonl"), "utf8")).trimEnd().split("\n").map((l) => JSON.parse(l));
    expect(verdictLines.map((v) => v.seq)).toEqual(Array.from({ length: 120 }, (_, i) => 101 + i));
    // Every verdict's digest re-derives from its result with the RFC 8785 reference implementation,
    // and each links to the one before it.
    verdictLines.forEach((v, i) => {
      expect(createHash("sha256").update(canonicalize(v.result)!).digest("hex")).toBe(v.digest);
      if (i > 0) expect(v.prevDigest).toBe(verdictLines[i - 1].digest);
    });
    expect(verdictLines[0].prevDigest).toBe(manifest.chain.firstPrevDigest);

    const testLines = (await readFile(path.join(dir, "tests.jsonl"), "utf8")).trimEnd().split("\n").map((l) => JSON.parse(l));
    expect(testLines.map((t) => t.id)).toEqual(verdictLines.map((v) => v.testId));
    expect(testLines[0].input.link.ref).toBe(verdictLines[0].linkRef);

    const vcsv = parseCsv(await readFile(path.join(dir, "verdicts.csv"), "utf8"));
    expect(vcsv[0]).toEqual(["id", "seq", "created_at", "link_ref", "verdict", "headroom_db", "profile", "engine_version", "reason_codes", "digest", "prev_digest", "test_id"]);
    expect(vcsv).toHaveLength(121);
    expect(vcsv[1][0]).toBe(verdictLines[0].id);
    expect(vcsv[1][9]).toBe(verdictLines[0].digest);
    const tcsv = parseCsv(await readFile(path.join(dir, "tests.csv"), "utf8"));
    expect(tcsv).toHaveLength(121);
    expect(JSON.parse(tcsv[5][3])).toEqual(testLines[4].input);
  });

  it("is for admins and auditors only", async () => {
    await expect(buildAuditPack(o.ctx("engineer"), {})).rejects.toBeInstanceOf(ForbiddenError);
    await expect(buildAuditPack(o.ctx("developer"), {})).rejects.toBeInstanceOf(ForbiddenError);
    const pack = await buildAuditPack(o.ctx("admin"), {});
    expect(pack.manifest.counts.verdicts).toBe(300);
    await pack.cleanup();
  });

  it("makes an empty but valid pack for a range with no verdicts", async () => {
    const pack = await buildAuditPack(o.ctx("auditor"), { from: new Date("2020-01-01T00:00:00Z"), to: new Date("2020-02-01T00:00:00Z") });
    expect(pack.manifest.counts).toEqual({ verdicts: 0, tests: 0 });
    expect(pack.manifest.chain.firstSeq).toBeNull();
    await pack.cleanup();
  });
});
