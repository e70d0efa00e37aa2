// Audit pack: the verdicts of a time range and the tests behind them, as JSON lines and CSV, plus a
// manifest with each file's SHA-256 and a SHA256SUMS file that `sha256sum -c` checks without Glassgrade.
// Files are written to a temporary folder batch by batch (flat memory), then streamed out as one tar.
import { createHash } from "node:crypto";
import { mkdir, mkdtemp, open, readFile, rm, writeFile, type FileHandle } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { countVerdicts, streamVerdicts } from "@/db/queries/verdict-stream";
import { ENGINE_VERSION } from "@/lib/grading";
import { authorise, InvalidInputError, NotFoundError } from "@/lib/profiles/access";
import type { ProfileContext } from "@/lib/profiles/context";
import { csvRow } from "./csv";
import { tarStream, type TarEntry } from "./tar";

export const PACK_FORMAT = "glassgrade-audit-pack/1";

interface PackFile {
  name: string;
  handle: FileHandle;
  hash: ReturnType<typeof createHash>;
  bytes: number;
  rows: number;
}

async function openPackFile(dir: string, name: string): Promise<PackFile> {
  return { name, handle: await open(path.join(dir, name), "w"), hash: createHash("sha256"), bytes: 0, rows: 0 };
}

async function append(f: PackFile, text: string, rows: number): Promise<void> {
  if (!text) return;
  const buf = Buffer.from(text, "utf8");
  await f.handle.write(buf);
  f.hash.update(buf);
  f.bytes += buf.length;
  f.rows += rows;
}

export interface PackManifest {
  format: string;
  organisationId: string;
  range: { from: string | null; to: string | null };
  generatedAt: string;
  generatedByUserId: string;
  engineVersion: string;
  counts: { verdicts: number; tests: number };
  chain: { firstSeq: number | null; lastSeq: number | null; firstPrevDigest: string | null; lastDigest: string | null };
  files: { name: string; sha256: string; bytes: number; rows: number }[];
}

export interface BuiltPack {
  dir: string;
  manifest: PackManifest;
  entries: TarEntry[];
  /** Removes the temporary folder. */
  cleanup(): Promise<void>;
}

const VERDICT_CSV_HEADER = ["id", "seq", "created_at", "link_ref", "verdict", "headroom_db", "profile", "engine_version", "reason_codes", "digest", "prev_digest", "test_id"];
const TEST_CSV_HEADER = ["id", "created_at", "link_ref", "input_json"];

/** Packs are built into `<tmp>/glassgrade-pack-<token>`; the token is what the console downloads by. */
export const PACK_TOKEN = /^[0-9a-f]{32}$/;

export function packDir(token: string): string {
  if (!PACK_TOKEN.test(token)) throw new InvalidInputError([{ path: "token", message: "Not an audit pack token" }]);
  return path.join(tmpdir(), `glassgrade-pack-${token}`);
}

export async function buildAuditPack(
  ctx: ProfileContext,
  range: { from?: Date; to?: Date; batchSize?: number },
  onProgress?: (done: number, total: number) => void,
  build: { now?: () => Date; token?: string } = {},
): Promise<BuiltPack> {
  const now = build.now ?? (() => new Date());
  authorise(ctx.actor, "audit:export");
  if (range.from && range.to && range.from >= range.to) throw new InvalidInputError([{ path: "to", message: "The end must come after the start" }]);
  const opts = { organisationId: ctx.actor.organisationId, from: range.from, to: range.to, order: "chain" as const, withTest: true, withResult: true, batchSize: range.batchSize ?? 1000 };
  const total = await countVerdicts(ctx.db, opts);
  const dir = build.token ? packDir(build.token) : await mkdtemp(path.join(tmpdir(), "glassgrade-pack-"));
  if (build.token) await mkdir(dir, { mode: 0o700 });
  const cleanup = () => rm(dir, { recursive: true, force: true });
  try {
    const files = {
      verdictsJsonl: await openPackFile(dir, "verdicts.jsonl"),
      testsJsonl: await openPackFile(dir, "tests.jsonl"),
      verdictsCsv: await openPackFile(dir, "verdicts.csv"),
      testsCsv: await openPackFile(dir, "tests.csv"),
    };
    await append(files.verdictsCsv, csvRow(VERDICT_CSV_HEADER), 0);
    await append(files.testsCsv, csvRow(TEST_CSV_HEADER), 0);
    const chain: PackManifest["chain"] = { firstSeq: null, lastSeq: null, firstPrevDigest: null, lastDigest: null };
    const seenTests = new Set<string>();
    let done = 0;
    onProgress?.(0, total);
    for await (const batch of streamVerdicts(ctx.db, opts)) {
      let vj = "", vc = "", tj = "", tc = "";
      let newTests = 0;
      for (const row of batch) {
        if (chain.firstSeq === null) {
          chain.firstSeq = row.seq;
          chain.firstPrevDigest = row.prevDigest;
        }
        chain.lastSeq = row.seq;
        chain.lastDigest = row.digest;
        const result = row.result as { reasons?: { code: string }[] };
        const reasonCodes = [...new Set((result.reasons ?? []).map((r) => r.code))];
        const createdAt = row.createdAt.toISOString();
        vj += JSON.stringify({
          id: row.id, seq: row.seq, createdAt, testId: row.testId, linkRef: row.linkRef, verdict: row.verdict,
          profile: { slug: row.profileSlug, version: row.profileVersion }, engineVersion: row.engineVersion,
          digest: row.digest, prevDigest: row.prevDigest, result: row.result,
        }) + "\n";
        vc += csvRow([row.id, row.seq, createdAt, row.linkRef, row.verdict, row.headroomDb, `${row.profileSlug}@${row.profileVersion}`, row.engineVersion, reasonCodes.join(";"), row.digest, row.prevDigest, row.testId]);
        if (!seenTests.has(row.testId)) {
          seenTests.add(row.testId);
          newTests++;
          const testCreated = (row.testCreatedAt ?? row.createdAt).toISOString();
          tj += JSON.stringify({ id: row.testId, createdAt: testCreated, linkRef: row.linkRef, input: row.input }) + "\n";
          tc += csvRow([row.testId, testCreated, row.linkRef, JSON.stringify(row.input)]);
        }
      }
      await append(files.verdictsJsonl, vj, batch.length);
      await append(files.verdictsCsv, vc, batch.length);
      await append(files.testsJsonl, tj, newTests);
      await append(files.testsCsv, tc, newTests);
      done += batch.length;
      onProgress?.(done, total);
    }
    const list = Object.values(files);
    for (const f of list) await f.handle.close();
    const manifest: PackManifest = {
      format: PACK_FORMAT,
      organisationId: ctx.actor.organisationId,
      range: { from: range.from?.toISOString() ?? null, to: range.to?.toISOString() ?? null },
      generatedAt: now().toISOString(),
      generatedByUserId: ctx.actor.userId,
      engineVersion: ENGINE_VERSION,
      counts: { verdicts: done, tests: seenTests.size },
      chain,
      files: list.map((f) => ({ name: f.name, sha256: f.hash.digest("hex"), bytes: f.bytes, rows: f.rows })),
    };
    const manifestText = JSON.stringify(manifest, null, 2) + "\n";
    await writeFile(path.join(dir, "manifest.json"), manifestText);
    const sums = [...manifest.files.map((f) => `${f.sha256}  ${f.name}`), `${createHash("sha256").update(manifestText).digest("hex")}  manifest.json`].join("\n") + "\n";
    await writeFile(path.join(dir, "SHA256SUMS"), sums);
    const names = ["manifest.json", "SHA256SUMS", ...manifest.files.map((f) => f.name)];
    return { dir, manifest, entries: names.map((n) => ({ name: `audit-pack/${n}`, path: path.join(dir, n) })), cleanup };
  } catch (err) {
    await cleanup();
    throw err;
  }
}

/** The pack as a tar stream; the temporary folder is removed once the stream ends or fails. */
export function packTarStream(pack: BuiltPack) {
  const stream = tarStream(pack.entries, new Date(pack.manifest.generatedAt));
  const done = () => void pack.cleanup();
  stream.once("close", done);
  return stream;
}

/**
 * Reopens a pack built earlier in this machine's temporary folder, for the member who built it only
 * (another organisation's token reads as not found).
 */
export async function openBuiltPack(ctx: ProfileContext, token: string): Promise<BuiltPack> {
  authorise(ctx.actor, "audit:export");
  const dir = packDir(token);
  let manifest: PackManifest;
  try {
    manifest = JSON.parse(await readFile(path.join(dir, "manifest.json"), "utf8")) as PackManifest;
  } catch {
    throw new NotFoundError("Audit pack");
  }
  if (manifest.organisationId !== ctx.actor.organisationId || manifest.generatedByUserId !== ctx.actor.userId) throw new NotFoundError("Audit pack");
  const names = ["manifest.json", "SHA256SUMS", ...manifest.files.map((f) => f.name)];
  return { dir, manifest, entries: names.map((n) => ({ name: `audit-pack/${n}`, path: path.join(dir, n) })), cleanup: () => rm(dir, { recursive: true, force: true }) };
}

/** Removes packs nobody downloaded; called before each new build so the temporary folder stays small. */
export async function sweepStalePacks(maxAgeMs = 60 * 60 * 1000): Promise<void> {
  const { readdir, stat } = await import("node:fs/promises");
  const root = tmpdir();
  for (const name of await readdir(root).catch(() => [] as string[])) {
    if (!/^glassgrade-pack-/.test(name)) continue;
    const full = path.join(root, name);
    const info = await stat(full).catch(() => null);
    if (info && Date.now() - info.mtimeMs > maxAgeMs) await rm(full, { recursive: true, force: true });
  }
}
