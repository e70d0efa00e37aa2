// The profile pages' server actions, each role allowed or denied, with the session stubbed to a factory
// member (the actions read it through requireMember) and Next's cache revalidation stubbed out.
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import type { Member } from "@/lib/auth/context";

let current: Member | null = null;
vi.mock("@/lib/auth/session", () => ({ getMember: async () => current, requireMember: async () => current }));
vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

const { closeDb } = await import("@/db");
const actions = await import("@/app/(console)/console/profiles/actions");
const { replayVerdictAction } = await import("@/app/(console)/console/verdicts/actions");
const { getProfileDetail } = await import("@/lib/profiles/read");
const { orgWithRoles, ospTemplate, storeHistory } = await import("../../helpers/profile-fixtures");
const { sql } = await import("drizzle-orm");
const { getDb } = await import("@/db");

type O = Awaited<ReturnType<typeof orgWithRoles>>;
const as = (o: O, role: keyof O["actors"]): Member => ({ ...o.actors[role], email: `${role}@t.example`, name: role, organisationName: o.org.name });

describe("profile and verdict server actions", () => {
  let o: O;
  beforeAll(async () => {
    o = await orgWithRoles();
    await storeHistory(o.org.id, 5, { seed: 51 });
  });
  afterAll(async () => {
    current = null;
    await closeDb();
  });

  it("refuses every profile change to auditors and developers, and changes nothing", async () => {
    for (const role of ["auditor", "developer"] as const) {
      current = as(o, role);
      const clone = await actions.cloneTemplateAction({ templateSlug: ospTemplate().slug, slug: `x-${role}`, name: "x" });
      expect(clone).toMatchObject({ ok: false, error: expect.stringMatching(/may not/) });
      for (const r of [
        await actions.saveDraftAction("anything", ospTemplate().limits),
        await actions.publishDraftAction("anything", "a note"),
        await actions.openDraftAction("anything"),
        await actions.discardDraftAction("anything"),
        await actions.setDefaultProfileAction(ospTemplate().slug),
      ]) {
        expect(r).toMatchObject({ ok: false, error: expect.stringMatching(/may not/) });
      }
    }
    const n = await getDb().execute(sql`select count(*)::int as n from profiles where organisation_id = ${o.org.id}`);
    expect(n.rows[0]).toEqual({ n: 0 });
  });

  it("lets an engineer clone, save, publish and set the default, and returns every field issue", async () => {
    current = as(o, "engineer");
    expect(await actions.cloneTemplateAction({ templateSlug: ospTemplate().slug, slug: "act-osp", name: "Actions OSP" })).toEqual({ ok: true, data: { slug: "act-osp" } });
    const bad = structuredClone(ospTemplate().limits);
    bad.spliceLossDb.value = -1;
    bad.connectorLossDb.value = 9;
    const refused = await actions.saveDraftAction("act-osp", bad);
    expect(refused.ok).toBe(false);
    if (!refused.ok) expect(refused.issues.map((i) => i.path).sort()).toEqual(["connectorLossDb.value", "spliceLossDb.value"]);
    const good = structuredClone(ospTemplate().limits);
    good.spliceLossDb.value = 0.2;
    expect((await actions.saveDraftAction("act-osp", good)).ok).toBe(true);
    const noNote = await actions.publishDraftAction("act-osp", "");
    expect(noNote).toMatchObject({ ok: false, issues: [{ path: "note" }] });
    expect(await actions.publishDraftAction("act-osp", "Splices to 0.2 dB")).toEqual({ ok: true, data: { version: 1 } });
    current = as(o, "admin");
    expect(await actions.setDefaultProfileAction("act-osp@1")).toEqual({ ok: true, data: { ref: "act-osp@1" } });
    const detail = await getProfileDetail({ db: getDb(), actor: o.actors.admin }, "act-osp");
    expect(detail.defaultRef).toBe("act-osp@1");
  });

  it("lets auditors replay a verdict but not developers", async () => {
    const row = await getDb().execute<{ id: string }>(sql`select id from verdicts where organisation_id = ${o.org.id} order by seq limit 1`);
    current = as(o, "auditor");
    expect(await replayVerdictAction(row.rows[0].id)).toMatchObject({ ok: true, data: { status: "reproduced" } });
    current = as(o, "developer");
    expect(await replayVerdictAction(row.rows[0].id)).toMatchObject({ ok: false });
  });
});
