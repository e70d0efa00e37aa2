// Retention applies to the call log only. Tests and verdicts are the audit record: deleting them would break
// the organisation's digest chain, so they are kept for as long as the installation keeps its data.
import { eq, sql } from "drizzle-orm";
import { getDb, type Database } from "@/db";
import { recordAudit } from "@/db/queries/audit-events";
import { organisations } from "@/db/schema";
import { assertCan, type ActorContext } from "@/lib/auth/context";
import { retentionSchema } from "./schemas";

/** Calls that reached no organisation (unknown or malformed keys) are kept this long. */
export const UNATTRIBUTED_CALL_RETENTION_DAYS = 90;

export async function getRetention({ actor }: ActorContext, db: Database = getDb()): Promise<{ callLogDays: number }> {
  assertCan(actor, "retention:manage");
  const [row] = await db.select({ days: organisations.retentionDays }).from(organisations).where(eq(organisations.id, actor.organisationId));
  return { callLogDays: row.days };
}

export async function setRetention({ actor }: ActorContext, input: unknown, db: Database = getDb()): Promise<{ callLogDays: number }> {
  assertCan(actor, "retention:manage");
  const { callLogDays } = retentionSchema.parse(input);
  await db.transaction(async (tx) => {
    const [before] = await tx.select({ days: organisations.retentionDays }).from(organisations).where(eq(organisations.id, actor.organisationId)).for("update");
    await tx.update(organisations).set({ retentionDays: callLogDays }).where(eq(organisations.id, actor.organisationId));
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorUserId: actor.userId,
      action: "retention.changed",
      entity: "organisation",
      entityId: actor.organisationId,
      before: { callLogDays: before.days },
      after: { callLogDays },
    });
  });
  return { callLogDays };
}

/** Deletes call-log rows older than each organisation's retention; returns how many went. */
export async function purgeExpiredCallLog(db: Database, now: Date): Promise<number> {
  const at = now.toISOString();
  const owned = await db.execute(sql`
    delete from call_log c using organisations o
    where c.organisation_id = o.id and c.created_at < ${at}::timestamptz - make_interval(days => o.retention_days)`);
  const unattributed = await db.execute(sql`
    delete from call_log
    where organisation_id is null and created_at < ${at}::timestamptz - make_interval(days => ${UNATTRIBUTED_CALL_RETENTION_DAYS})`);
  return (owned.rowCount ?? 0) + (unattributed.rowCount ?? 0);
}
