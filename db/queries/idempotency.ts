// Idempotency-Key reservations: one row per (API key, Idempotency-Key), first reserved, then completed
// with the response to replay, or deleted when the request was rejected.
import { and, eq, sql } from "drizzle-orm";
import type { Database } from "@/db";
import { idempotencyKeys } from "@/db/schema";

export type IdempotencyRow = typeof idempotencyKeys.$inferSelect;

/** Inserts a reservation; returns false when one with the same (apiKeyId, key) already exists. */
export async function reserveIdempotencyKey(
  db: Database,
  v: { apiKeyId: string; key: string; organisationId: string; route: string; requestHash: string },
): Promise<boolean> {
  const rows = await db
    .insert(idempotencyKeys)
    .values({ ...v, completed: false })
    .onConflictDoNothing({ target: [idempotencyKeys.apiKeyId, idempotencyKeys.key] })
    .returning({ key: idempotencyKeys.key });
  return rows.length === 1;
}

export async function findIdempotencyKey(db: Database, apiKeyId: string, key: string): Promise<IdempotencyRow | undefined> {
  const [row] = await db
    .select()
    .from(idempotencyKeys)
    .where(and(eq(idempotencyKeys.apiKeyId, apiKeyId), eq(idempotencyKeys.key, key)));
  return row;
}

/** Deletes only the exact row that was read (same creation time), so a concurrent retake is never lost. */
export async function deleteIdempotencyKey(db: Database, apiKeyId: string, key: string, createdAt?: Date): Promise<void> {
  const cond = [eq(idempotencyKeys.apiKeyId, apiKeyId), eq(idempotencyKeys.key, key)];
  if (createdAt) cond.push(eq(idempotencyKeys.createdAt, createdAt));
  await db.delete(idempotencyKeys).where(and(...cond));
}

export async function completeIdempotencyKey(
  db: Database,
  apiKeyId: string,
  key: string,
  response: { status: number; headers: Record<string, string>; body: string },
): Promise<void> {
  await db
    .update(idempotencyKeys)
    .set({ completed: true, responseStatus: response.status, responseHeaders: response.headers, responseBody: response.body })
    .where(and(eq(idempotencyKeys.apiKeyId, apiKeyId), eq(idempotencyKeys.key, key)));
}

/** Retention: replays are promised for 24 hours. */
export async function purgeIdempotencyKeys(db: Database, olderThan: Date): Promise<number> {
  const res = await db.delete(idempotencyKeys).where(sql`${idempotencyKeys.createdAt} < ${olderThan}`);
  return res.rowCount ?? 0;
}
