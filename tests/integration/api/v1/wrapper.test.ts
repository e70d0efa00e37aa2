import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { closeDb, getDb } from "@/db";
import { callLog } from "@/db/schema";
import { withApiKey } from "@/lib/api/with-api-key";
import { call } from "@/tests/helpers/api-request";
import { createApiKey, createOrganisation, type TestApiKey } from "@/tests/helpers/factories";

let key: TestApiKey;
beforeAll(async () => {
  key = await createApiKey(await createOrganisation(), { scopes: ["grade"] });
});
afterAll(async () => {
  await closeDb();
});

describe("withApiKey: unexpected errors", () => {
  it("answers 500 with a fixed text and the request id, logs the real error, and still writes the call-log row", async () => {
    const route = withApiKey(
      async () => {
        throw new Error('relation "secret_table" does not exist at SELECT * FROM secret_table');
      },
      { route: "/api/v1/test-only", scope: "grade" },
    );
    const logged = vi.spyOn(console, "error").mockImplementation(() => undefined);
    const res = await call(route, "/api/v1/test-only", { key: key.secret });
    expect(res.status).toBe(500);
    expect(res.headers.get("content-type")).toBe("application/problem+json");
    expect(res.json.code).toBe("internal_error");
    expect(res.text).not.toMatch(/secret_table|SELECT|at /);
    expect(res.json.detail).toContain(res.json.requestId);
    expect(logged.mock.calls.some((c) => String(c[0]).includes(res.json.requestId))).toBe(true);
    logged.mockRestore();
    const rows = await getDb().select().from(callLog).where(eq(callLog.requestId, res.json.requestId));
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ status: 500, problemType: "internal_error", route: "/api/v1/test-only" });
  });
});
