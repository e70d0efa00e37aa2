import { eq } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { closeDb, getDb } from "@/db";
import { organisations } from "@/db/schema";
import { DEMO_PROFILE_SLUG, seedDemoProfiles } from "@/db/seed-demo-profiles";
import { diffVersions, getProfileDetail } from "@/lib/profiles/read";
import { verifyChainReport } from "@/lib/audit/chain";
import { replayRange, type BulkReplaySummary } from "@/lib/audit/replay";

describe("demo profile seed", () => {
  afterAll(async () => {
    await closeDb();
  });

  it("gives Northmere a feeder profile with two published versions, and adds nothing the second time", async () => {
    const [org] = await getDb().select().from(organisations).where(eq(organisations.slug, "northmere"));
    const ctx = { db: getDb(), actor: { userId: "00000000-0000-0000-0000-000000000000", organisationId: org.id, role: "auditor" as const } };
    const detail = await getProfileDetail(ctx, DEMO_PROFILE_SLUG);
    expect(detail.versions.map((v) => v.version)).toEqual([2, 1]);
    expect(detail.draft).toBeNull();
    const diff = await diffVersions(ctx, DEMO_PROFILE_SLUG, 1, 2);
    expect(diff.find((c) => c.path === "spliceLossDb.value")).toMatchObject({ after: 0.2 });
    expect(await seedDemoProfiles(getDb(), org.id)).toEqual({ created: false });
    // The demo default stays on the template: the seed does not change what the API grades under.
    expect(org.defaultProfile).toBe("tia-568-3-d-singlemode-osp");
  });

  it("reproduces every seeded demo verdict on replay, and the demo chain is intact", async () => {
    const [org] = await getDb().select().from(organisations).where(eq(organisations.slug, "northmere"));
    const ctx = { db: getDb(), actor: { userId: "00000000-0000-0000-0000-000000000000", organisationId: org.id, role: "auditor" as const } };
    let summary: BulkReplaySummary | undefined;
    for await (const ev of replayRange(ctx, {})) if (ev.type === "result") summary = ev.summary;
    expect(summary!.total).toBeGreaterThan(50);
    expect(summary).toMatchObject({ reproduced: summary!.total, changed: 0, unavailable: 0 });
    expect(await verifyChainReport(ctx)).toMatchObject({ intact: true, checked: summary!.total });
  });
});
