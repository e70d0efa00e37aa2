import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { POST as GRADE } from "@/app/api/v1/gradings/route";
import { GET as LIST } from "@/app/api/v1/verdicts/route";
import { GET as ONE } from "@/app/api/v1/verdicts/[id]/route";
import { closeDb } from "@/db";
import { VerdictListSchema } from "@/lib/api/schemas/verdicts";
import { call } from "@/tests/helpers/api-request";
import { createApiKey, createOrganisation, type TestApiKey, type TestOrganisation } from "@/tests/helpers/factories";
import { failingTest, passingTest } from "./fixtures";

let org: TestOrganisation;
let key: TestApiKey;
let otherKey: TestApiKey;
const ids: string[] = [];

async function grade(ref: string, fail = false) {
  const res = await call(GRADE, "/api/v1/gradings", { key: key.secret, body: { test: fail ? failingTest(ref) : passingTest(ref) } });
  expect(res.status).toBe(201);
  return res.json.id as string;
}

beforeAll(async () => {
  org = await createOrganisation();
  key = await createApiKey(org);
  otherKey = await createApiKey(await createOrganisation());
  for (let i = 0; i < 5; i++) ids.push(await grade(`V-${i}`, i % 2 === 1));
});
afterAll(async () => {
  await closeDb();
});

describe("GET /api/v1/verdicts/{id}", () => {
  it("returns the organisation's verdict", async () => {
    const res = await call(ONE, `/api/v1/verdicts/${ids[0]}`, { key: key.secret, params: { id: ids[0] } });
    expect(res.status).toBe(200);
    expect(res.json.id).toBe(ids[0]);
    expect(res.json.linkRef).toBe("V-0");
  });

  it("404 for an unknown id, a malformed id and another organisation's verdict", async () => {
    for (const [id, k] of [
      [crypto.randomUUID(), key],
      ["not-a-uuid", key],
      [ids[0], otherKey],
    ] as const) {
      const res = await call(ONE, `/api/v1/verdicts/${id}`, { key: k.secret, params: { id } });
      expect(res.status).toBe(404);
      expect(res.json.code).toBe("not_found");
    }
  });

  it("403 for a key without verdicts:read", async () => {
    const g = await createApiKey(org, { scopes: ["grade"] });
    const res = await call(ONE, `/api/v1/verdicts/${ids[0]}`, { key: g.secret, params: { id: ids[0] } });
    expect(res.status).toBe(403);
  });
});

describe("GET /api/v1/verdicts", () => {
  it("lists newest first and only the key's organisation", async () => {
    const res = await call(LIST, "/api/v1/verdicts", { key: key.secret });
    expect(res.status).toBe(200);
    const page = VerdictListSchema.parse(res.json);
    expect(page.data.map((v) => v.id)).toEqual([...ids].reverse());
    expect(page.nextCursor).toBeNull();
    const other = await call(LIST, "/api/v1/verdicts", { key: otherKey.secret });
    expect(other.json.data).toEqual([]);
  });

  it("filters by verdict, link ref, profile and time range", async () => {
    const fails = await call(LIST, "/api/v1/verdicts", { key: key.secret, query: { verdict: "fail" } });
    expect(fails.json.data.map((v: { linkRef: string }) => v.linkRef).sort()).toEqual(["V-1", "V-3"]);
    const one = await call(LIST, "/api/v1/verdicts", { key: key.secret, query: { linkRef: "V-2" } });
    expect(one.json.data).toHaveLength(1);
    const prof = await call(LIST, "/api/v1/verdicts", { key: key.secret, query: { profile: "tia-568-3-d-singlemode-osp@1" } });
    expect(prof.json.data).toHaveLength(5);
    const otherProf = await call(LIST, "/api/v1/verdicts", { key: key.secret, query: { profile: "tia-568-3-d-multimode" } });
    expect(otherProf.json.data).toHaveLength(0);
    const future = await call(LIST, "/api/v1/verdicts", { key: key.secret, query: { from: new Date(Date.now() + 3600_000).toISOString() } });
    expect(future.json.data).toHaveLength(0);
    const past = await call(LIST, "/api/v1/verdicts", { key: key.secret, query: { to: new Date(Date.now() + 3600_000).toISOString() } });
    expect(past.json.data).toHaveLength(5);
  });

  it("keeps pages stable while new verdicts arrive", async () => {
    const seen: string[] = [];
    let cursor: string | null = null;
    let inserted = 0;
    do {
      const res = await call(LIST, "/api/v1/verdicts", { key: key.secret, query: { limit: "2", ...(cursor ? { cursor } : {}) } });
      expect(res.status).toBe(200);
      seen.push(...res.json.data.map((v: { id: string }) => v.id));
      cursor = res.json.nextCursor;
      // New verdicts land between page reads.
      if (inserted < 3) {
        await grade(`V-NEW-${inserted}`);
        inserted++;
      }
    } while (cursor);
    expect(seen).toEqual([...ids].reverse());
    expect(new Set(seen).size).toBe(seen.length);
  });

  it("422 for a bad filter, limit or cursor, with pointers", async () => {
    const bad = await call(LIST, "/api/v1/verdicts", { key: key.secret, query: { verdict: "maybe", limit: "0", colour: "red" } });
    expect(bad.status).toBe(422);
    expect(bad.json.errors.map((e: { pointer: string }) => e.pointer).sort()).toEqual(["/colour", "/limit", "/verdict"]);
    const cur = await call(LIST, "/api/v1/verdicts", { key: key.secret, query: { cursor: "garbage" } });
    expect(cur.status).toBe(422);
    expect(cur.json.errors[0].pointer).toBe("/cursor");
  });
});
