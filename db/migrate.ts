// Applies the committed SQL migrations in db/migrations to DATABASE_URL.
import path from "node:path";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { closeDb, getDb } from "./index";

export async function runMigrations(): Promise<void> {
  await migrate(getDb(), { migrationsFolder: path.join(process.cwd(), "db", "migrations") });
}

if (process.argv[1] && /db[\\/]migrate\.ts$/.test(process.argv[1])) {
  runMigrations()
    .then(() => console.log("[db] migrations applied"))
    .catch((err) => {
      console.error("[db] migration failed:", err);
      process.exitCode = 1;
    })
    .finally(() => closeDb());
}
