import { eq } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { GET, POST } from "@/app/api/v1/[...path]/route";
import { closeDb, getDb } from "@/db";
import { callLog } from "@/db/schema";

// RFC 9457: every error under /api/v1 is problem+json, including paths that have no route.
describe("unknown /api/v1 paths", () => {
  afterAll(async () => {
    await closeDb();
  });

  for (const [method, handler] of [["GET", GET], ["POST", POST]] as const) {
    it(`${method} answers 404 problem+json and writes its call-log row`, async () => {
      const res = await handler(new Request("http://t/api/v1/gradingz", { method, body: method === "POST" ? "{}" : undefined }));
      expect(res.status).toBe(404);
      expect(res.headers.get("content-type")).toBe("application/problem+json");
      const body = await res.json();
      expect(body).toMatchObject({ status: 404, code: "not_found", instance: "/api/v1/gradingz" });
      expect(body.detail).toContain("/api/v1/openapi.json");
      const requestId = res.headers.get("x-request-id")!;
      expect(body.requestId).toBe(requestId);
      const rows = await getDb().select().from(callLog).where(eq(callLog.requestId, requestId));
      expect(rows).toHaveLength(1);
      expect(rows[0]).toMatchObject({ method, route: "/api/v1/*", path: "/api/v1/gradingz", status: 404, problemType: "not_found" });
    });
  }
});
