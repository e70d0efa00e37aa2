// Demo limit profile for Northmere Fibre: its feeder-route profile cloned from the single-mode outside
// plant template, with two published versions and change notes, so the console's profile pages, diff and
// impact preview have something to show. Goes through lib/profiles like a real engineer. Idempotent.
import { and, eq } from "drizzle-orm";
import type { Database } from "./index";
import { memberships, profiles } from "./schema";
import { cloneTemplate, openDraft, saveDraft } from "@/lib/profiles/drafts";
import { publishDraft } from "@/lib/profiles/publish";

export const DEMO_PROFILE_SLUG = "northmere-feeder";

export async function seedDemoProfiles(db: Database, organisationId: string): Promise<{ created: boolean }> {
  const [existing] = await db.select({ id: profiles.id }).from(profiles).where(and(eq(profiles.organisationId, organisationId), eq(profiles.slug, DEMO_PROFILE_SLUG)));
  if (existing) return { created: false };
  const [engineer] = await db.select({ userId: memberships.userId }).from(memberships).where(and(eq(memberships.organisationId, organisationId), eq(memberships.role, "engineer")));
  if (!engineer) return { created: false };
  const ctx = { db, actor: { userId: engineer.userId, organisationId, role: "engineer" as const } };

  await cloneTemplate(ctx, { templateSlug: "tia-568-3-d-singlemode-osp", slug: DEMO_PROFILE_SLUG, name: "Northmere feeder routes" });
  await publishDraft(ctx, DEMO_PROFILE_SLUG, { note: "Adopted the outside-plant template unchanged for the feeder rebuild." });
  const draft = await openDraft(ctx, DEMO_PROFILE_SLUG);
  const v2 = structuredClone(draft);
  v2.spliceLossDb = { value: 0.2, source: "Northmere acceptance practice for fusion splices (common practice)" };
  v2.macrobendThresholdDb = { ...v2.macrobendThresholdDb, value: Math.min(v2.macrobendThresholdDb.value, 0.4) };
  await saveDraft(ctx, DEMO_PROFILE_SLUG, v2);
  await publishDraft(ctx, DEMO_PROFILE_SLUG, { note: "Fusion splices to 0.2 dB now that every crew has a core-alignment splicer." });
  return { created: true };
}
