import { and, desc, eq, isNull, type SQL } from "drizzle-orm";
import { getDb } from "@/db";
import { apiKeys, users } from "@/db/schema";
import { assertCan, type ActorContext, type Member } from "@/lib/auth/context";
import { ForbiddenError, NotFoundError } from "@/lib/auth/errors";
import { can } from "@/lib/auth/roles";
import { recordAudit } from "@/db/queries/audit-events";
import { generateApiKey } from "./api-key";
import { createKeySchema, revokeKeySchema } from "./manage-schemas";

// Key management for the console. Admins manage every key of their organisation; engineers and
// developers only the keys they created; developers only sandbox keys. Lists never select the hash.

export interface KeySummary {
  id: string;
  name: string;
  environment: "live" | "sandbox";
  start: string;
  scopes: string[];
  createdAt: string;
  createdBy: string | null;
  expiresAt: string | null;
  lastUsedAt: string | null;
  revokedAt: string | null;
  status: "active" | "expired" | "revoked";
}

export interface CreatedKey extends KeySummary {
  /** The plaintext key. Returned once, here, and never again. */
  secret: string;
}

function scopeFor(actor: Member): SQL {
  return can(actor.role, "keys:manage-all")
    ? eq(apiKeys.organisationId, actor.organisationId)
    : and(eq(apiKeys.organisationId, actor.organisationId), eq(apiKeys.createdByUserId, actor.userId))!;
}

function statusOf(k: { revokedAt: Date | null; expiresAt: Date | null }, now = new Date()): KeySummary["status"] {
  if (k.revokedAt) return "revoked";
  if (k.expiresAt && k.expiresAt <= now) return "expired";
  return "active";
}

const summaryColumns = {
  id: apiKeys.id,
  name: apiKeys.name,
  environment: apiKeys.environment,
  start: apiKeys.start,
  scopes: apiKeys.scopes,
  createdAt: apiKeys.createdAt,
  createdBy: users.name,
  expiresAt: apiKeys.expiresAt,
  lastUsedAt: apiKeys.lastUsedAt,
  revokedAt: apiKeys.revokedAt,
};

interface SummaryRow {
  id: string; name: string; environment: "live" | "sandbox"; start: string; scopes: string[]; createdAt: Date;
  createdBy: string | null; expiresAt: Date | null; lastUsedAt: Date | null; revokedAt: Date | null;
}

function toSummary(r: SummaryRow): KeySummary {
  return {
    id: r.id,
    name: r.name,
    environment: r.environment,
    start: r.start,
    scopes: r.scopes,
    createdAt: r.createdAt.toISOString(),
    createdBy: r.createdBy,
    expiresAt: r.expiresAt?.toISOString() ?? null,
    lastUsedAt: r.lastUsedAt?.toISOString() ?? null,
    revokedAt: r.revokedAt?.toISOString() ?? null,
    status: statusOf(r),
  };
}

export async function listKeys({ actor }: ActorContext): Promise<KeySummary[]> {
  assertCan(actor, "keys:manage-own");
  const rows = await getDb()
    .select(summaryColumns)
    .from(apiKeys)
    .leftJoin(users, eq(users.id, apiKeys.createdByUserId))
    .where(scopeFor(actor))
    .orderBy(desc(apiKeys.createdAt));
  return rows.map(toSummary);
}

export async function createKey({ actor }: ActorContext, input: unknown): Promise<CreatedKey> {
  assertCan(actor, "keys:manage-own");
  const v = createKeySchema.parse(input);
  if (v.environment === "live" && !can(actor.role, "keys:create-live")) {
    throw new ForbiddenError(`The ${actor.role} role may create sandbox keys only.`);
  }
  const key = generateApiKey(v.environment);
  const expiresAt = v.expiresOn ? new Date(`${v.expiresOn}T23:59:59.999Z`) : null;
  const row = await getDb().transaction(async (tx) => {
    const [r] = await tx
      .insert(apiKeys)
      .values({
        organisationId: actor.organisationId,
        name: v.name,
        environment: v.environment,
        start: key.start,
        hash: key.hash,
        scopes: [...new Set(v.scopes)],
        createdByUserId: actor.userId,
        expiresAt,
      })
      .returning();
    await recordAudit(tx, { organisationId: actor.organisationId, actorUserId: actor.userId, action: "api_key.created", entity: "api_key", entityId: r.id, after: { name: r.name, environment: r.environment, scopes: r.scopes, start: r.start, expiresAt: r.expiresAt } });
    return r;
  });
  return { ...toSummary({ ...row, createdBy: actor.name }), secret: key.secret };
}

export async function revokeKey({ actor }: ActorContext, input: unknown): Promise<KeySummary> {
  assertCan(actor, "keys:manage-own");
  const { keyId } = revokeKeySchema.parse(input);
  return getDb().transaction(async (tx) => {
    // Someone else's key looks the same as a missing one: no hint that the id exists.
    const [r] = await tx
      .update(apiKeys)
      .set({ revokedAt: new Date() })
      .where(and(eq(apiKeys.id, keyId), scopeFor(actor), isNull(apiKeys.revokedAt)))
      .returning();
    if (!r) throw new NotFoundError("No active key with that id among the keys you manage.");
    await recordAudit(tx, { organisationId: actor.organisationId, actorUserId: actor.userId, action: "api_key.revoked", entity: "api_key", entityId: r.id, before: { start: r.start } });
    const [u] = r.createdByUserId ? await tx.select({ name: users.name }).from(users).where(eq(users.id, r.createdByUserId)) : [];
    return toSummary({ ...r, createdBy: u?.name ?? null });
  });
}
