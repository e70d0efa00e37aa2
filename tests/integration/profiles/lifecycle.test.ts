import { and, eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, getDb } from "@/db";
import { auditEvents, organisations, profileVersions } from "@/db/schema";
import { ForbiddenError } from "@/lib/auth/errors";
import { ConflictError, InvalidInputError } from "@/lib/profiles/access";
import { setDefaultProfile } from "@/lib/profiles/default-profile";
import { cloneTemplate, discardDraft, openDraft, saveDraft } from "@/lib/profiles/drafts";
import { publishDraft } from "@/lib/profiles/publish";
import { diffVersions, getProfileDetail, listProfiles, loadLimits } from "@/lib/profiles/read";
import { resolveProfile } from "@/lib/profiles/resolve";
import type { Limits } from "@/lib/grading/schema";
import { OSP_TEMPLATE, orgWithRoles, ospTemplate, type OrgWithRoles } from "../../helpers/profile-fixtures";

async function issuesOf(p: Promise<unknown>): Promise<{ path: string; message: string }[]> {
  try {
    await p;
  } catch (err) {
    if (err instanceof InvalidInputError) return err.issues;
    throw err;
  }
  throw new Error("expected the call to be refused");
}

describe("limit profiles: clone, edit, publish, diff, default", () => {
  let o: OrgWithRoles;
  beforeAll(async () => {
    o = await orgWithRoles();
  });
  afterAll(async () => {
    await closeDb();
  });

  it("lets admins and engineers clone a template into a draft, and refuses auditors and developers", async () => {
    await expect(cloneTemplate(o.ctx("auditor"), { templateSlug: OSP_TEMPLATE, slug: "x-auditor", name: "x" })).rejects.toBeInstanceOf(ForbiddenError);
    await expect(cloneTemplate(o.ctx("developer"), { templateSlug: OSP_TEMPLATE, slug: "x-dev", name: "x" })).rejects.toBeInstanceOf(ForbiddenError);
    await cloneTemplate(o.ctx("admin"), { templateSlug: OSP_TEMPLATE, slug: "admin-copy", name: "Admin copy" });
    await cloneTemplate(o.ctx("engineer"), { templateSlug: OSP_TEMPLATE, slug: "northmere-osp", name: "Northmere OSP" });

    const detail = await getProfileDetail(o.ctx("auditor"), "northmere-osp");
    expect(detail.basedOn).toBe(`${OSP_TEMPLATE}@${ospTemplate().version}`);
    expect(detail.draft).toEqual(ospTemplate().limits);
    expect(detail.versions).toEqual([]);
    const list = await listProfiles(o.ctx("developer"));
    expect(list.profiles.map((p) => p.slug)).toEqual(["admin-copy", "northmere-osp"]);
    expect(list.templates.map((t) => t.slug)).toContain(OSP_TEMPLATE);
  });

  it("refuses a slug that is taken or that a template uses, naming the field", async () => {
    expect(await issuesOf(cloneTemplate(o.ctx("engineer"), { templateSlug: OSP_TEMPLATE, slug: "northmere-osp", name: "again" }))).toEqual([
      { path: "slug", message: "Your organisation already has a profile with this slug" },
    ]);
    expect((await issuesOf(cloneTemplate(o.ctx("engineer"), { templateSlug: OSP_TEMPLATE, slug: OSP_TEMPLATE, name: "shadow" })))[0].path).toBe("slug");
    expect((await issuesOf(cloneTemplate(o.ctx("engineer"), { templateSlug: OSP_TEMPLATE, slug: "Bad Slug!", name: "x" })))[0].path).toBe("slug");
  });

  it("rejects impossible limits with a message on the field and keeps the stored draft", async () => {
    const draft = (await getProfileDetail(o.ctx("engineer"), "northmere-osp")).draft as Limits;
    const negative = structuredClone(draft);
    negative.connectorLossDb.value = -0.1;
    const issues = await issuesOf(saveDraft(o.ctx("engineer"), "northmere-osp", negative));
    expect(issues).toEqual([{ path: "connectorLossDb.value", message: expect.stringMatching(/at least 0/) }]);

    // 850 nm is a multimode window: single-mode OS2 has no 850 nm limit to speak of.
    const wrongWavelength = structuredClone(draft);
    const row = wrongWavelength.attenuation.findIndex((r) => r.fibreTypes.includes("OS2"));
    wrongWavelength.attenuation[row].wavelengthNm = 850;
    const wl = await issuesOf(saveDraft(o.ctx("engineer"), "northmere-osp", wrongWavelength));
    expect(wl.map((i) => i.path)).toContain(`attenuation.${row}.wavelengthNm`);
    expect(wl.find((i) => i.path === `attenuation.${row}.wavelengthNm`)!.message).toMatch(/850 nm is not a wavelength/);

    expect((await getProfileDetail(o.ctx("engineer"), "northmere-osp")).draft).toEqual(draft);
  });

  it("publishes the draft as version 1 with a change note, then refuses to publish nothing", async () => {
    const draft = (await getProfileDetail(o.ctx("engineer"), "northmere-osp")).draft as Limits;
    const tighter = structuredClone(draft);
    tighter.spliceLossDb = { value: 0.2, source: "Northmere acceptance practice (common practice)" };
    await saveDraft(o.ctx("engineer"), "northmere-osp", tighter);

    expect((await issuesOf(publishDraft(o.ctx("engineer"), "northmere-osp", { note: "" })))[0].path).toBe("note");
    await expect(publishDraft(o.ctx("auditor"), "northmere-osp", { note: "sneaky" })).rejects.toBeInstanceOf(ForbiddenError);

    expect(await publishDraft(o.ctx("engineer"), "northmere-osp", { note: "Splices to 0.2 dB for the new fusion splicers" })).toEqual({ slug: "northmere-osp", version: 1 });
    const detail = await getProfileDetail(o.ctx("engineer"), "northmere-osp");
    expect(detail.draft).toBeNull();
    expect(detail.versions.map((v) => [v.version, v.note])).toEqual([[1, "Splices to 0.2 dB for the new fusion splicers"]]);
    await expect(publishDraft(o.ctx("engineer"), "northmere-osp", { note: "again" })).rejects.toBeInstanceOf(ConflictError);

    // An unchanged draft is not a new version.
    await openDraft(o.ctx("engineer"), "northmere-osp");
    await expect(publishDraft(o.ctx("engineer"), "northmere-osp", { note: "no change" })).rejects.toThrow(/identical to version 1/);
    await discardDraft(o.ctx("engineer"), "northmere-osp");
  });

  it("keeps version 1 frozen while version 2 is drafted and published, and diffs them limit by limit", async () => {
    const v1Before = await loadLimits(o.ctx("engineer"), "northmere-osp", 1);
    const draft = await openDraft(o.ctx("engineer"), "northmere-osp");
    const next = structuredClone(draft);
    next.connectorLossDb = { ...next.connectorLossDb, value: 0.5 };
    next.macrobendThresholdDb = { ...next.macrobendThresholdDb, value: 0.4 };
    await saveDraft(o.ctx("engineer"), "northmere-osp", next);
    expect(await loadLimits(o.ctx("engineer"), "northmere-osp", 1)).toEqual(v1Before);
    expect(await publishDraft(o.ctx("admin"), "northmere-osp", { note: "Connectors to 0.5 dB" })).toEqual({ slug: "northmere-osp", version: 2 });

    const diff = await diffVersions(o.ctx("auditor"), "northmere-osp", 1, 2);
    expect(diff).toEqual([
      { path: "connectorLossDb.value", kind: "changed", before: v1Before.connectorLossDb.value, after: 0.5 },
      { path: "macrobendThresholdDb.value", kind: "changed", before: v1Before.macrobendThresholdDb.value, after: 0.4 },
    ]);
    const fromTemplate = await diffVersions(o.ctx("auditor"), "northmere-osp", "template", 2);
    // Against the template both versions' edits show, the splice limit's new source included.
    expect(fromTemplate.map((c) => c.path)).toEqual(expect.arrayContaining(["connectorLossDb.value", "spliceLossDb.value", "spliceLossDb.source"]));
    expect(fromTemplate.find((c) => c.path === "spliceLossDb.value")).toEqual({ path: "spliceLossDb.value", kind: "changed", before: ospTemplate().limits.spliceLossDb.value, after: 0.2 });
  });

  it("has no way to change a published version: the database refuses UPDATE on profile_versions", async () => {
    const db = getDb();
    const [v1] = await db.select().from(profileVersions).where(and(eq(profileVersions.organisationId, o.org.id), eq(profileVersions.version, 1)));
    await expect(db.update(profileVersions).set({ note: "rewritten history" }).where(eq(profileVersions.id, v1.id))).rejects.toThrow();
    await expect(db.execute(sql`update profile_versions set limits = '{}'::jsonb where id = ${v1.id}`)).rejects.toThrow();
    const [again] = await db.select().from(profileVersions).where(eq(profileVersions.id, v1.id));
    expect(again).toEqual(v1);
  });

  it("switches the organisation default between pinned, latest and template refs, and the resolver follows", async () => {
    await expect(setDefaultProfile(o.ctx("auditor"), "northmere-osp")).rejects.toBeInstanceOf(ForbiddenError);
    expect((await issuesOf(setDefaultProfile(o.ctx("engineer"), "northmere-osp@9")))[0].message).toMatch(/Version 9/);
    expect((await issuesOf(setDefaultProfile(o.ctx("engineer"), "nothing-here")))[0].path).toBe("ref");
    // A profile that was never published cannot be the default.
    expect((await issuesOf(setDefaultProfile(o.ctx("engineer"), "admin-copy")))[0].message).toMatch(/Publish/);

    expect(await setDefaultProfile(o.ctx("engineer"), "northmere-osp@1")).toEqual({ ref: "northmere-osp@1" });
    const read = async () => (await getDb().select({ d: organisations.defaultProfile }).from(organisations).where(eq(organisations.id, o.org.id)))[0].d;
    expect(await read()).toBe("northmere-osp@1");
    const pinned = await resolveProfile(getDb(), o.org.id, await read());
    expect(pinned.ok && pinned.profile.limits.spliceLossDb.value).toBe(0.2);
    expect(pinned.ok && pinned.profile.version).toBe(1);

    await setDefaultProfile(o.ctx("admin"), "northmere-osp");
    const latest = await resolveProfile(getDb(), o.org.id, await read());
    expect(latest.ok && latest.profile.version).toBe(2);

    await setDefaultProfile(o.ctx("engineer"), OSP_TEMPLATE);
    expect(await read()).toBe(OSP_TEMPLATE);

    const trail = await getDb().select({ action: auditEvents.action }).from(auditEvents).where(eq(auditEvents.organisationId, o.org.id));
    const actions = trail.map((t) => t.action);
    expect(actions.filter((a) => a === "profile.published")).toHaveLength(2);
    expect(actions.filter((a) => a === "organisation.default_profile_set")).toHaveLength(3);
  });

  it("never shows another organisation's profiles", async () => {
    const other = await orgWithRoles();
    expect((await listProfiles(other.ctx("admin"))).profiles).toEqual([]);
    await expect(getProfileDetail(other.ctx("admin"), "northmere-osp")).rejects.toThrow(/not found/);
    await expect(publishDraft(other.ctx("admin"), "northmere-osp", { note: "not yours" })).rejects.toThrow(/not found/);
  });
});
