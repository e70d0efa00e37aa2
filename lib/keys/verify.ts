// Turns an Authorization header into a key record, or the reason it is refused. One indexed query.
import type { Database } from "@/db";
import { findKeyByHash, setKeyLastUsed, type KeyRecord } from "@/db/queries/api-keys";
import { hashApiKey, isWellFormedKey, type ApiScope } from "./api-key";

export type KeyCheck =
  | { ok: true; key: KeyRecord }
  | { ok: false; code: "unauthorized" | "forbidden"; detail: string; key?: KeyRecord };

export function bearerToken(authorization: string | null): string | null {
  if (!authorization) return null;
  const m = /^Bearer\s+(\S+)\s*$/i.exec(authorization);
  return m ? m[1] : null;
}

export async function verifyApiKey(
  db: Database,
  authorization: string | null,
  scope: ApiScope | null,
  now: Date,
): Promise<KeyCheck> {
  if (!authorization) return { ok: false, code: "unauthorized", detail: "Send an API key as `Authorization: Bearer <key>`." };
  const secret = bearerToken(authorization);
  if (!secret) return { ok: false, code: "unauthorized", detail: "The Authorization header must use the Bearer scheme." };
  // A malformed key cannot match any hash, so skip the query: cheap rejection of junk traffic.
  if (!isWellFormedKey(secret)) return { ok: false, code: "unauthorized", detail: "The API key is malformed." };
  const key = await findKeyByHash(db, hashApiKey(secret));
  // Unknown, revoked and expired keys get the same answer so a caller learns nothing about which it was.
  if (!key || key.revokedAt || (key.expiresAt && key.expiresAt.getTime() <= now.getTime())) {
    return { ok: false, code: "unauthorized", detail: "The API key is unknown, revoked or expired." };
  }
  if (scope && !key.scopes.includes(scope)) {
    return { ok: false, code: "forbidden", detail: `This key lacks the \`${scope}\` scope.`, key };
  }
  return { ok: true, key };
}

// last_used_at is bookkeeping: at most one write per key per interval per process, and its failure never
// turns a valid call into an error.
const LAST_USED_INTERVAL_MS = 60_000;
const lastWritten = new Map<string, number>();

export function shouldTouchLastUsed(key: Pick<KeyRecord, "id" | "lastUsedAt">, now: Date): boolean {
  const seen = Math.max(lastWritten.get(key.id) ?? 0, key.lastUsedAt?.getTime() ?? 0);
  return now.getTime() - seen >= LAST_USED_INTERVAL_MS;
}

export function touchLastUsed(db: Database, key: Pick<KeyRecord, "id" | "lastUsedAt">, now: Date): void {
  if (!shouldTouchLastUsed(key, now)) return;
  lastWritten.set(key.id, now.getTime());
  setKeyLastUsed(db, key.id, now).catch((err: unknown) => {
    console.error("[keys] last_used_at update failed:", err instanceof Error ? err.message : err);
  });
}
