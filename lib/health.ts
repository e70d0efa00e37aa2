import { sql } from "drizzle-orm";
import type { Database } from "@/db";

export interface HealthReport {
  status: "ok" | "degraded";
  version: string;
  database: { status: "up" | "down"; latencyMs?: number };
}

// Health is "degraded" only for the database: everything else in this process is answering by definition.
export async function checkHealth(db: Database, version: string): Promise<HealthReport> {
  const started = performance.now();
  try {
    await db.execute(sql`select 1`);
    const latencyMs = Math.round((performance.now() - started) * 100) / 100;
    return { status: "ok", version, database: { status: "up", latencyMs } };
  } catch {
    return { status: "degraded", version, database: { status: "down" } };
  }
}
