// Once per run: start the private cluster, create the test database fresh, migrate and seed it.
import { execFileSync } from "node:child_process";
import path from "node:path";
import { TEST_DATABASE_URL, TEST_DB_NAME } from "./test-env";

const ROOT = path.resolve(import.meta.dirname, "../..");
const marker = "__glassgradeTestDbReady";

export default async function setup() {
  const g = globalThis as Record<string, unknown>;
  if (g[marker]) return;
  g[marker] = true;
  const pg = path.join(ROOT, "scripts/pg.sh");
  execFileSync(pg, ["start"], { stdio: "inherit" });
  execFileSync(pg, ["dropdb", TEST_DB_NAME], { stdio: "ignore" });
  execFileSync(pg, ["createdb", TEST_DB_NAME], { stdio: "inherit" });
  process.env.DATABASE_URL = TEST_DATABASE_URL;
  const { runMigrations } = await import("../../db/migrate");
  const { seed } = await import("../../db/seed");
  const { getDb, closeDb } = await import("../../db");
  await runMigrations();
  await seed(getDb());
  await closeDb();
}
