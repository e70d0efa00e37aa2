import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import * as schema from "./schema";

export type Database = NodePgDatabase<typeof schema>;

export const DEFAULT_DATABASE_URL = "postgres://postgres@127.0.0.1:54329/glassgrade";

// One pool per process, created on first use so that importing this module (e.g. during `next build`)
// never opens a connection. Kept on globalThis so dev-server reloads do not leak pools.
const globalForDb = globalThis as unknown as { glassgradePool?: Pool; glassgradeDb?: Database };

export function getPool(): Pool {
  if (!globalForDb.glassgradePool) {
    globalForDb.glassgradePool = new Pool({
      connectionString: process.env.DATABASE_URL ?? DEFAULT_DATABASE_URL,
      max: Number(process.env.DATABASE_POOL_MAX ?? 10),
      connectionTimeoutMillis: 3000,
    });
    // An idle client losing its server (e.g. the cluster restarted) must not crash the process.
    globalForDb.glassgradePool.on("error", (err) => console.error("[db] idle client error:", err.message));
  }
  return globalForDb.glassgradePool;
}

export function getDb(): Database {
  if (!globalForDb.glassgradeDb) globalForDb.glassgradeDb = drizzle(getPool(), { schema });
  return globalForDb.glassgradeDb;
}

export async function closeDb(): Promise<void> {
  const pool = globalForDb.glassgradePool;
  globalForDb.glassgradePool = undefined;
  globalForDb.glassgradeDb = undefined;
  if (pool) await pool.end();
}

export { schema };
