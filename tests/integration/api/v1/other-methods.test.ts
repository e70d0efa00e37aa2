// RFC 9110 15.5.6 and RFC 9457: a method a route does not serve answers 405 problem+json with an Allow
// header naming the methods it does serve, and the call is logged like any other.
import { eq } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import * as gradings from "@/app/api/v1/gradings/route";
import * as health from "@/app/api/v1/health/route";
import * as replay from "@/app/api/v1/verdicts/[id]/replay/route";
import { closeDb, getDb } from "@/db";
import { callLog } from "@/db/schema";

describe("methods a route does not serve", () => {
  afterAll(async () => {
    await closeDb();
  });

  const cases = [
    { name: "DELETE /api/v1/gradings", handler: gradings.DELETE, method: "DELETE", path: "/api/v1/gradings", route: "/api/v1/gradings", allow: "POST, OPTIONS" },
    { name: "GET /api/v1/gradings", handler: gradings.GET, method: "GET", path: "/api/v1/gradings", route: "/api/v1/gradings", allow: "POST, OPTIONS" },
    { name: "POST /api/v1/health", handler: health.POST, method: "POST", path: "/api/v1/health", route: "/api/v1/health", allow: "GET, HEAD, OPTIONS" },
    { name: "PUT /api/v1/verdicts/{id}/replay", handler: replay.PUT, method: "PUT", path: "/api/v1/verdicts/abc/replay", route: "/api/v1/verdicts/{id}/replay", allow: "POST, OPTIONS" },
  ];
  for (const c of cases) {
    it(`${c.name} answers 405 problem+json with Allow, and is logged`, async () => {
      const res = await c.handler(new Request(`http://t${c.path}`, { method: c.method, body: c.method === "GET" ? undefined : "{}" }));
      expect(res.status).toBe(405);
      expect(res.headers.get("content-type")).toBe("application/problem+json");
      expect(res.headers.get("allow")).toBe(c.allow);
      const body = await res.json();
      expect(body).toMatchObject({ status: 405, code: "method_not_allowed", instance: c.path, type: "https://glassgrade.dev/problems/method-not-allowed" });
      expect(body.detail).toContain(c.method);
      const requestId = res.headers.get("x-request-id")!;
      const rows = await getDb().select().from(callLog).where(eq(callLog.requestId, requestId));
      expect(rows).toHaveLength(1);
      expect(rows[0]).toMatchObject({ method: c.method, route: c.route, status: 405, problemType: "method_not_allowed" });
    });
  }
});
