import { describe, expect, it } from "vitest";
import { APP_URL } from "../helpers/test-env";

// Against the built app: real routes still win over the catch-all, and unknown paths get problem+json.
describe("routing under /api/v1 in the built app", () => {
  it("serves real routes and answers unknown paths with a problem+json 404", async () => {
    const health = await fetch(`${APP_URL}/api/v1/health`);
    expect(health.status).toBe(200);
    expect((await health.json()).database.status).toBe("up");

    const missing = await fetch(`${APP_URL}/api/v1/verdicts/extra/segments`, { method: "POST", body: "{}" });
    expect(missing.status).toBe(404);
    expect(missing.headers.get("content-type")).toBe("application/problem+json");
    expect((await missing.json()).code).toBe("not_found");
  });
});
