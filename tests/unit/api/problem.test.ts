import { describe, expect, it } from "vitest";
import { PROBLEMS, problemResponse, problemType } from "@/lib/api/problem";

// RFC 9457 section 3: a problem body has type, title, status, detail, instance; media type application/problem+json.
describe("problem+json (RFC 9457)", () => {
  it("builds a body with the status from the code table and the RFC media type", async () => {
    const res = problemResponse("validation_failed", "2 fields are invalid", {
      instance: "/api/v1/gradings",
      requestId: "req_1",
      errors: [{ pointer: "/link/fibreType", message: "Invalid option" }],
    });
    expect(res.status).toBe(422);
    expect(res.headers.get("content-type")).toBe("application/problem+json");
    expect(res.headers.get("x-request-id")).toBe("req_1");
    const body = await res.json();
    expect(body).toMatchObject({
      type: "https://glassgrade.dev/problems/validation-failed",
      title: "Request failed validation",
      status: 422,
      code: "validation_failed",
      instance: "/api/v1/gradings",
      requestId: "req_1",
    });
    expect(body.errors).toEqual([{ pointer: "/link/fibreType", message: "Invalid option" }]);
  });

  it("gives every code a distinct type URI and an HTTP error status", () => {
    const codes = Object.keys(PROBLEMS) as (keyof typeof PROBLEMS)[];
    expect(new Set(codes.map(problemType)).size).toBe(codes.length);
    for (const c of codes) expect(PROBLEMS[c].status).toBeGreaterThanOrEqual(400);
  });
});
