// preview_inputs, the compact copy of each stored test that impact previews read: the SQL packing
// (db/migrations/0005_preview_input_packing.sql) and the decoder (lib/verdicts/packed-input.ts) must give
// back exactly the input the tests table stores, for every shape of input, or a preview would grade
// something other than what was submitted.
import fc from "fast-check";
import { sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, getDb } from "@/db";
import { grade } from "@/lib/grading";
import type { LinkTest } from "@/lib/grading/schema";
import { verdictDigest } from "@/lib/verdicts/digest";
import { gradeAndStore } from "@/lib/verdicts/grade";
import { unpackTestInput } from "@/lib/verdicts/packed-input";
import { orgWithRoles, ospTemplate, type OrgWithRoles } from "../../helpers/profile-fixtures";
import { arbLinkTest } from "../../unit/grading/arbitraries";

/** Packs `input` as stored jsonb would be, and returns the packed text with the jsonb read back. */
async function packInSql(inputs: unknown[]): Promise<{ stored: unknown; packed: string }[]> {
  const res = await getDb().execute<{ stored: unknown; packed: string }>(sql`
    select x.v as stored, glassgrade_pack_test_input(x.v) as packed
    from jsonb_array_elements(${JSON.stringify(inputs)}::jsonb) with ordinality as x(v, o) order by o`);
  return res.rows;
}

const edgeCases: LinkTest[] = [
  // Nothing optional at all.
  { link: { ref: "E-1", fibreType: "OS2" }, measurements: [{ wavelengthNm: 1310 }] },
  // Present but empty lists stay empty lists, absent stays absent.
  { link: { ref: "E-2", fibreType: "OS2", splitters: [] }, measurements: [{ wavelengthNm: 1550, insertionLossDb: 0 }], events: [], inspections: [] },
  // Every field, strings that need escaping, unicode, negative and fractional numbers.
  {
    link: { ref: 'Ruelle "Nord" \\ 7 — ß', fibreType: "OS2", designLengthM: 1234.5, connectorPairs: 3, splices: 12, splitters: [{ ratio: "1x8" }, { ratio: "1x4" }], polish: "APC", application: "10GBASE-LR", ponClass: "N1" },
    measurements: [{ wavelengthNm: 1310, direction: "BA", method: "three-cord", insertionLossDb: -0.05, orlDb: 45.25, lengthM: 1240 }],
    events: [{ wavelengthNm: 1310, direction: "AB", positionM: 0.5, kind: "reflective", lossDb: 1e-7, reflectanceDb: -45.123456789 }],
    powerReadings: [{ wavelengthNm: 1490, dbm: -19.75 }],
    inspections: [{ location: "patch panel 3, port 12 ✓", result: "fail" }],
  },
];

describe("preview inputs", () => {
  let o: OrgWithRoles;
  beforeAll(async () => {
    o = await orgWithRoles();
  });
  afterAll(async () => {
    await closeDb();
  });

  it("decodes to exactly the stored input, for hand-picked edge cases", async () => {
    for (const { stored, packed } of await packInSql(edgeCases)) expect(unpackTestInput(packed)).toStrictEqual(stored);
    // And the stored jsonb is the submitted test, so the copy is too.
    const rows = await packInSql(edgeCases);
    rows.forEach((r, i) => expect(unpackTestInput(r.packed)).toStrictEqual(edgeCases[i]));
  });

  it("decodes to exactly the stored input, for 300 generated tests", async () => {
    const inputs = fc.sample(arbLinkTest({ withPon: true }), { numRuns: 300, seed: 20261201 });
    const rows = await packInSql(inputs);
    expect(rows).toHaveLength(300);
    for (const { stored, packed } of rows) expect(unpackTestInput(packed)).toStrictEqual(stored);
  });

  it("is written for every verdict stored, whatever the input, and grading the copy reproduces the stored digest", async () => {
    const tests = [...edgeCases, ...fc.sample(arbLinkTest({ withPon: true }), { numRuns: 60, seed: 7 })];
    const stored = await gradeAndStore({ db: getDb(), organisationId: o.org.id }, ospTemplate(), tests.map((test) => ({ test })));
    const res = await getDb().execute<{ verdict_id: string; seq: string; verdict: string; headroom_db: number | null; profile_slug: string; profile_version: number; packed: string }>(sql`
      select verdict_id, seq, verdict, headroom_db, profile_slug, profile_version, packed from preview_inputs where organisation_id = ${o.org.id} order by seq`);
    expect(res.rows).toHaveLength(stored.length);
    res.rows.forEach((row, i) => {
      const v = stored[i];
      expect({ id: row.verdict_id, seq: Number(row.seq), verdict: row.verdict, slug: row.profile_slug, version: row.profile_version }).toEqual({
        id: v.id,
        seq: v.seq,
        verdict: v.verdict,
        slug: v.profileSlug,
        version: v.profileVersion,
      });
      const input = unpackTestInput(row.packed);
      expect(input.link.ref).toBe(v.linkRef);
      expect(verdictDigest(grade(input, ospTemplate()))).toBe(v.digest);
    });
  });

  it("cannot be changed once written", async () => {
    await expect(getDb().execute(sql`update preview_inputs set verdict = 'pass' where organisation_id = ${o.org.id}`)).rejects.toMatchObject({
      cause: { message: "preview_inputs rows are immutable" },
    });
  });
});
