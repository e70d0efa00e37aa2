// API-key reads and bookkeeping for request authentication (creation and revocation live in lib/keys/manage).
import { eq, sql } from "drizzle-orm";
import type { Database } from "@/db";
import { apiKeys, organisations } from "@/db/schema";

export interface KeyRecord {
  id: string;
  organisationId: string;
  environment: "live" | "sandbox";
  scopes: string[];
  expiresAt: Date | null;
  revokedAt: Date | null;
  lastUsedAt: Date | null;
  rateLimitPerMinute: number;
  defaultProfile: string;
}

// Prepared once per connection pool (named statements are kept per connection by PostgreSQL), so the
// hot path skips parsing and planning.
function buildFindKey(db: Database) {
  return db
    .select({
      id: apiKeys.id,
      organisationId: apiKeys.organisationId,
      environment: apiKeys.environment,
      scopes: apiKeys.scopes,
      expiresAt: apiKeys.expiresAt,
      revokedAt: apiKeys.revokedAt,
      lastUsedAt: apiKeys.lastUsedAt,
      rateLimitPerMinute: apiKeys.rateLimitPerMinute,
      defaultProfile: organisations.defaultProfile,
    })
    .from(apiKeys)
    .innerJoin(organisations, eq(organisations.id, apiKeys.organisationId))
    .where(eq(apiKeys.hash, sql.placeholder("hash")))
    .limit(1)
    .prepare("gg_find_key_by_hash");
}
const findKeyStatements = new WeakMap<Database, ReturnType<typeof buildFindKey>>();

/** One indexed lookup (unique index on hash) that also brings the organisation's default profile. */
export async function findKeyByHash(db: Database, hash: string): Promise<KeyRecord | null> {
  let stmt = findKeyStatements.get(db);
  if (!stmt) findKeyStatements.set(db, (stmt = buildFindKey(db)));
  const [row] = await stmt.execute({ hash });
  return row ?? null;
}

export async function setKeyLastUsed(db: Database, keyId: string, at: Date): Promise<void> {
  await db.update(apiKeys).set({ lastUsedAt: at }).where(eq(apiKeys.id, keyId));
}
