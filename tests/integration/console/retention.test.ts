import { and, eq, sql } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { ZodError } from "zod";
import { closeDb, getDb } from "@/db";
import { auditEvents, callLog } from "@/db/schema";
import { purgeExpiredCallLog, setRetention, UNATTRIBUTED_CALL_RETENTION_DAYS } from "@/lib/retention/call-log";
import { orgWithEveryRole } from "./support";

const DAY = 86_400_000;

async function logCall(organisationId: string | null, ageDays: number, now: Date) {
  const requestId = `req_ret_${crypto.randomUUID()}`;
  await getDb().insert(callLog).values({
    organisationId, method: "GET", route: "/api/v1/verdicts", path: "/api/v1/verdicts", status: 200, latencyMs: 1, requestId,
    createdAt: new Date(now.getTime() - ageDays * DAY),
  });
  return requestId;
}
const exists = async (requestId: string) => (await getDb().select().from(callLog).where(eq(callLog.requestId, requestId))).length === 1;

describe("call-log retention", () => {
  afterAll(async () => {
    await closeDb();
  });

  it("an admin sets it within bounds, and the change is audited", async () => {
    const { org, members } = await orgWithEveryRole();
    await expect(setRetention({ actor: members.admin }, { callLogDays: 12 })).rejects.toBeInstanceOf(ZodError);
    await expect(setRetention({ actor: members.admin }, { callLogDays: 4000 })).rejects.toBeInstanceOf(ZodError);
    await expect(setRetention({ actor: members.admin }, { callLogDays: "180" })).resolves.toEqual({ callLogDays: 180 });
    const [event] = await getDb().select().from(auditEvents).where(and(eq(auditEvents.organisationId, org.id), eq(auditEvents.action, "retention.changed")));
    expect(event.after).toEqual({ callLogDays: 180 });
    expect(event.actorUserId).toBe(members.admin.userId);
  });

  it("removes only calls older than each organisation's own retention, and old unattributed calls", async () => {
    const now = new Date();
    const a = await orgWithEveryRole();
    const b = await orgWithEveryRole();
    await setRetention({ actor: a.members.admin }, { callLogDays: 30 });
    await setRetention({ actor: b.members.admin }, { callLogDays: 365 });
    const aOld = await logCall(a.org.id, 31, now);
    const aRecent = await logCall(a.org.id, 29, now);
    const bSameAge = await logCall(b.org.id, 31, now);
    const bOld = await logCall(b.org.id, 366, now);
    const strayOld = await logCall(null, UNATTRIBUTED_CALL_RETENTION_DAYS + 1, now);
    const strayRecent = await logCall(null, 1, now);

    const verdictCount = async () => (await getDb().execute<{ n: number }>(sql`select count(*)::int as n from verdicts`)).rows[0].n;
    const verdictsBefore = await verdictCount();
    const removed = await purgeExpiredCallLog(getDb(), now);
    expect(removed).toBeGreaterThanOrEqual(3);
    expect(await exists(aOld)).toBe(false);
    expect(await exists(aRecent)).toBe(true);
    expect(await exists(bSameAge)).toBe(true);
    expect(await exists(bOld)).toBe(false);
    expect(await exists(strayOld)).toBe(false);
    expect(await exists(strayRecent)).toBe(true);
    // Verdicts are never touched by retention (the seed stored some, so there is something to lose).
    expect(verdictsBefore).toBeGreaterThan(0);
    expect(await verdictCount()).toBe(verdictsBefore);
  });
});
