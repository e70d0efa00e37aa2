import { execFileSync, spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";

// Exercises scripts/pg.sh on a throwaway cluster (own port and data folder) so the shared one is untouched.
const ROOT = path.resolve(import.meta.dirname, "../../..");
const PG = path.join(ROOT, "scripts/pg.sh");
const base = mkdtempSync("/var/tmp/gg-pgtest-");
const env = { ...process.env, GLASSGRADE_PG_PORT: "54359", GLASSGRADE_PGDATA: path.join(base, "pg") };
const pg = (...args: string[]) => spawnSync("bash", [PG, ...args], { env, encoding: "utf8" });
const postmasterPid = () => Number(readFileSync(path.join(env.GLASSGRADE_PGDATA, "postmaster.pid"), "utf8").split("\n")[0]);
const query = () =>
  execFileSync("bash", [PG, "psql", "-tAc", "select 40 + 2"], { env: { ...env, GLASSGRADE_DB: "postgres" }, encoding: "utf8" }).trim();

describe("scripts/pg.sh private cluster", () => {
  afterAll(() => {
    pg("stop");
    rmSync(base, { recursive: true, force: true });
  });

  it("initialises, starts on 127.0.0.1 over TCP and answers queries", () => {
    const r = pg("start");
    expect(r.status, r.stderr).toBe(0);
    expect(r.stderr).toContain("initialising a private cluster");
    expect(query()).toBe("42");
  }, 60_000);

  it("is idempotent: a second start leaves the running server alone", () => {
    const before = postmasterPid();
    const r = pg("start");
    expect(r.status, r.stderr).toBe(0);
    expect(r.stderr).toContain("already running");
    expect(postmasterPid()).toBe(before);
  }, 30_000);

  it("comes back after kill -9 of the server", () => {
    process.kill(postmasterPid(), "SIGKILL");
    const r = pg("start");
    expect(r.status, r.stderr).toBe(0);
    expect(query()).toBe("42");
  }, 60_000);

  it("starts despite a stale pid file whose pid belongs to another process", () => {
    const pidFile = path.join(env.GLASSGRADE_PGDATA, "postmaster.pid");
    process.kill(postmasterPid(), "SIGKILL");
    const lines = readFileSync(pidFile, "utf8").split("\n");
    lines[0] = String(process.pid); // alive, but not postgres
    writeFileSync(pidFile, lines.join("\n"));
    const r = pg("start");
    expect(r.status, r.stderr).toBe(0);
    expect(r.stderr).toContain("removing stale pid file");
    expect(query()).toBe("42");
  }, 60_000);

  it("stops, and reports not running afterwards", () => {
    expect(pg("stop").status).toBe(0);
    expect(pg("status").status).toBe(3);
  }, 30_000);
});
