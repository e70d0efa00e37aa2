import { sql } from "drizzle-orm";
import type { Database } from "@/db";
import { callLog } from "@/db/schema";

export type CallLogEntry = {
  organisationId: string | null;
  apiKeyId: string | null;
  method: string;
  route: string;
  path: string;
  status: number;
  latencyMs: number;
  requestId: string;
  verdictId: string | null;
  problemType: string | null;
};

// Every API request writes one row, so the insert is a prepared statement (one per pool).
function buildInsert(db: Database) {
  return db
    .insert(callLog)
    .values({
      organisationId: sql.placeholder("organisationId"),
      apiKeyId: sql.placeholder("apiKeyId"),
      method: sql.placeholder("method"),
      route: sql.placeholder("route"),
      path: sql.placeholder("path"),
      status: sql.placeholder("status"),
      latencyMs: sql.placeholder("latencyMs"),
      requestId: sql.placeholder("requestId"),
      verdictId: sql.placeholder("verdictId"),
      problemType: sql.placeholder("problemType"),
    })
    .prepare("gg_insert_call_log");
}
const inserts = new WeakMap<Database, ReturnType<typeof buildInsert>>();

export async function insertCallLog(db: Database, entry: CallLogEntry): Promise<void> {
  let stmt = inserts.get(db);
  if (!stmt) inserts.set(db, (stmt = buildInsert(db)));
  await stmt.execute(entry);
}
