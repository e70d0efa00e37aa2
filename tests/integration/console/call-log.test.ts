// Call-log filters, sorting and keyset paging over rows written straight into call_log.
import { sql } from "drizzle-orm";
import { describe, expect, it, beforeAll } from "vitest";
import { getDb } from "@/db";
import { callLog } from "@/db/schema";
import type { Member } from "@/lib/auth/context";
import { allCalls, callLogFacets, listCalls } from "@/lib/calllog/query";
import { createKey } from "@/lib/keys/manage";
import { orgWithEveryRole } from "./support";

describe("call log queries", () => {
  let m: Record<string, Member>;
  let engKey: string;
  let devKey: string;
  const base = Date.parse("2026-11-20T08:00:00Z");

  beforeAll(async () => {
    const env = await orgWithEveryRole();
    m = env.members;
    engKey = (await createKey({ actor: m.engineer }, { name: "eng", environment: "sandbox", scopes: ["grade"] })).id;
    devKey = (await createKey({ actor: m.developer }, { name: "dev", environment: "sandbox", scopes: ["grade"] })).id;
    const rows = Array.from({ length: 30 }, (_, i) => ({
      organisationId: env.org.id,
      apiKeyId: i % 3 === 0 ? devKey : engKey,
      method: i % 2 ? "GET" : "POST",
      route: i % 2 ? "/api/v1/verdicts" : "/api/v1/gradings",
      path: i % 2 ? "/api/v1/verdicts" : "/api/v1/gradings",
      status: i % 5 === 0 ? 422 : i % 7 === 0 ? 500 : 200,
      latencyMs: (i * 7) % 30 + 0.5,
      requestId: `req_${i}`,
      // Rows of a minute share a timestamp (the id tie-breaker is exercised) except one, which sits a few
      // microseconds later: a cursor rounded to milliseconds would skip it.
      createdAt: sql`${new Date(base + Math.floor(i / 3) * 60_000).toISOString()}::timestamptz + ${i % 3 === 2 ? i : 0} * interval '1 microsecond'` as unknown as Date,
    }));
    await getDb().insert(callLog).values(rows);
  });

  it("pages through everything with a cursor, without gaps or repeats, for every sort", async () => {
    for (const sort of ["createdAt", "status", "latencyMs", "route"] as const) {
      for (const dir of ["asc", "desc"] as const) {
        const seen: string[] = [];
        let cursor: string | undefined;
        let pages = 0;
        do {
          const page = await listCalls({ actor: m.admin }, { sort, dir, limit: 7, cursor });
          seen.push(...page.items.map((r) => r.requestId));
          cursor = page.nextCursor ?? undefined;
          pages++;
        } while (cursor && pages < 20);
        expect(seen).toHaveLength(30);
        expect(new Set(seen).size).toBe(30);
        expect(pages).toBe(5);
      }
    }
  });

  it("sorts by the chosen column", async () => {
    const page = await listCalls({ actor: m.admin }, { sort: "latencyMs", dir: "desc", limit: 30 });
    const lat = page.items.map((r) => r.latencyMs);
    expect(lat).toEqual([...lat].sort((a, b) => b - a));
  });

  it("filters by status class, route, key and time range", async () => {
    const errors = await listCalls({ actor: m.admin }, { status: "4xx", limit: 100 });
    expect(errors.items.length).toBe(6);
    expect(errors.items.every((r) => r.status === 422)).toBe(true);
    const fives = await listCalls({ actor: m.admin }, { status: "5xx", limit: 100 });
    expect(fives.items.every((r) => r.status >= 500)).toBe(true);
    const route = await listCalls({ actor: m.admin }, { route: "/api/v1/verdicts", limit: 100 });
    expect(route.items).toHaveLength(15);
    const key = await listCalls({ actor: m.admin }, { keyId: devKey, limit: 100 });
    expect(key.items).toHaveLength(10);
    const window = await listCalls({ actor: m.admin }, { from: "2026-11-20T08:01:00Z", to: "2026-11-20T08:03:00Z", limit: 100 });
    expect(window.items.map((r) => r.requestId).sort()).toEqual(["req_3", "req_4", "req_5", "req_6", "req_7", "req_8"]);
  });

  it("shows developers and engineers only the calls of their own keys", async () => {
    const dev = await listCalls({ actor: m.developer }, { limit: 100 });
    expect(dev.items).toHaveLength(10);
    expect(dev.items.every((r) => r.apiKeyId === devKey)).toBe(true);
    const eng = await listCalls({ actor: m.engineer }, { limit: 100 });
    expect(eng.items).toHaveLength(20);
    const aud = await listCalls({ actor: m.auditor }, { limit: 100 });
    expect(aud.items).toHaveLength(30);
    const facets = await callLogFacets({ actor: m.developer });
    expect(facets.keys.map((k) => k.id)).toEqual([devKey]);
  });

  it("the export walks the whole filtered set", async () => {
    const rows: string[] = [];
    for await (const r of allCalls({ actor: m.admin }, { route: "/api/v1/gradings" })) rows.push(r.requestId);
    expect(rows).toHaveLength(15);
    expect(new Set(rows).size).toBe(15);
  });

  it("refuses a forged cursor", async () => {
    await expect(listCalls({ actor: m.admin }, { cursor: "not-a-cursor" })).rejects.toMatchObject({ name: "InputError" });
  });
});
