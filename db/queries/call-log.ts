import type { Database } from "@/db";
import { callLog } from "@/db/schema";

export type CallLogEntry = typeof callLog.$inferInsert;

export async function insertCallLog(db: Database, entry: CallLogEntry): Promise<void> {
  await db.insert(callLog).values(entry);
}
