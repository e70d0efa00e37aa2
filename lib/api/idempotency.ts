// Idempotency-Key (IETF httpapi draft): the first request with a key runs and its successful response is
// kept; a retry with the same key and body gets that response again and creates nothing; the same key
// with another body is refused (422); a retry while the first is still running gets 409.
import { createHash } from "node:crypto";
import type { Database } from "@/db";
import {
  completeIdempotencyKey,
  deleteIdempotencyKey,
  findIdempotencyKey,
  reserveIdempotencyKey,
} from "@/db/queries/idempotency";
import { ApiError } from "./problem";

export const IDEMPOTENCY_TTL_MS = 24 * 60 * 60 * 1000;
// A reservation that never completed (its process died) stops blocking retries after this long.
export const IDEMPOTENCY_ABANDONED_MS = 60 * 1000;
const REPLAYED_HEADERS = ["content-type", "location"];

/** Accepts the draft's quoted sf-string form and a bare token. */
export function parseIdempotencyKey(raw: string | null): string | null {
  if (raw === null) return null;
  const v = raw.trim().replace(/^"(.*)"$/, "$1");
  if (v.length < 1 || v.length > 255 || !/^[\x21-\x7e]+$/.test(v)) {
    throw new ApiError("bad_request", "Idempotency-Key must be 1 to 255 visible ASCII characters.");
  }
  return v;
}

export function requestFingerprint(route: string, body: string): string {
  return createHash("sha256").update(route).update("\n").update(body).digest("hex");
}

export type Reservation = { kind: "reserved" } | { kind: "replay"; response: Response };

export async function reserve(
  db: Database,
  args: { apiKeyId: string; organisationId: string; key: string; route: string; body: string },
  now: Date,
): Promise<Reservation> {
  const requestHash = requestFingerprint(args.route, args.body);
  const row = { apiKeyId: args.apiKeyId, key: args.key, organisationId: args.organisationId, route: args.route, requestHash };
  for (let attempt = 0; attempt < 2; attempt++) {
    if (await reserveIdempotencyKey(db, row)) return { kind: "reserved" };
    const existing = await findIdempotencyKey(db, args.apiKeyId, args.key);
    if (!existing) continue; // deleted between our insert and read: try once more
    const age = now.getTime() - existing.createdAt.getTime();
    const stale = age > IDEMPOTENCY_TTL_MS || (!existing.completed && age > IDEMPOTENCY_ABANDONED_MS);
    if (stale) {
      await deleteIdempotencyKey(db, args.apiKeyId, args.key, existing.createdAt);
      continue;
    }
    if (existing.requestHash !== requestHash) {
      throw new ApiError("idempotency_key_reused", "This Idempotency-Key was already used with a different request body or route.");
    }
    if (!existing.completed) {
      throw new ApiError("idempotency_in_flight", "The first request with this Idempotency-Key is still being processed; retry shortly.", {
        headers: { "Retry-After": "1" },
      });
    }
    const headers = new Headers((existing.responseHeaders as Record<string, string> | null) ?? {});
    headers.set("Idempotent-Replayed", "true");
    return { kind: "replay", response: new Response(existing.responseBody, { status: existing.responseStatus ?? 200, headers }) };
  }
  throw new ApiError("idempotency_in_flight", "This Idempotency-Key is being taken by another request; retry shortly.", {
    headers: { "Retry-After": "1" },
  });
}

/** Keeps a successful response for replay; drops the reservation otherwise, so nothing of a rejected request stays. */
export async function settle(db: Database, apiKeyId: string, key: string, response: Response): Promise<void> {
  if (response.status >= 200 && response.status < 300) {
    const headers: Record<string, string> = {};
    for (const h of REPLAYED_HEADERS) {
      const v = response.headers.get(h);
      if (v !== null) headers[h] = v;
    }
    const body = await response.clone().text();
    await completeIdempotencyKey(db, apiKeyId, key, { status: response.status, headers, body });
  } else {
    await deleteIdempotencyKey(db, apiKeyId, key);
  }
}
