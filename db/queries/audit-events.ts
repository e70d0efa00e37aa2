import type { Database } from "../index";
import { auditEvents } from "../schema";

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];

/** Records a console change inside the caller's transaction, so the change and its trail commit together. */
export async function recordAudit(
  tx: Database | Tx,
  e: {
    organisationId: string;
    actorUserId: string | null;
    action: string;
    entity: string;
    entityId: string;
    before?: unknown;
    after?: unknown;
    requestId?: string | null;
  },
) {
  await tx.insert(auditEvents).values({
    organisationId: e.organisationId,
    actorUserId: e.actorUserId,
    action: e.action,
    entity: e.entity,
    entityId: e.entityId,
    before: e.before ?? null,
    after: e.after ?? null,
    requestId: e.requestId ?? null,
  });
}
