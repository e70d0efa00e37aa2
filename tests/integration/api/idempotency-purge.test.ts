import { eq } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { closeDb, getDb } from "@/db";
import { purgeIdempotencyKeys } from "@/db/queries/idempotency";
import { idempotencyKeys } from "@/db/schema";
import { IDEMPOTENCY_TTL_MS } from "@/lib/api/idempotency";
import { createApiKey, createOrganisation } from "../../helpers/factories";

// The IETF Idempotency-Key draft lets a server forget keys after a stated window; ours is 24 hours.
describe("Idempotency-Key records past their replay window", () => {
  afterAll(async () => {
    await closeDb();
  });

  it("are purged, while records inside the window stay", async () => {
    const org = await createOrganisation();
    const key = await createApiKey(org);
    const now = new Date();
    const row = (k: string, ageMs: number) => ({
      apiKeyId: key.id, key: k, organisationId: org.id, route: "/api/v1/gradings", requestHash: "h", completed: true,
      createdAt: new Date(now.getTime() - ageMs),
    });
    await getDb().insert(idempotencyKeys).values([row("old", IDEMPOTENCY_TTL_MS + 60_000), row("fresh", 60_000)]);
    const removed = await purgeIdempotencyKeys(getDb(), new Date(now.getTime() - IDEMPOTENCY_TTL_MS));
    expect(removed).toBeGreaterThanOrEqual(1);
    const left = await getDb().select({ key: idempotencyKeys.key }).from(idempotencyKeys).where(eq(idempotencyKeys.apiKeyId, key.id));
    expect(left.map((r) => r.key)).toEqual(["fresh"]);
  });
});
