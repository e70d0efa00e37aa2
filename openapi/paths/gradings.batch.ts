import type { RouteConfig } from "@asteasolutions/zod-to-openapi";
import { BatchRequestSchema, BatchResultSchema, MAX_BATCH_ITEMS } from "@/lib/api/schemas/gradings";
import { exampleTest, exampleVerdict, EXAMPLE_PROFILE } from "../examples";
import { AUTH_PROBLEMS, IDEMPOTENCY_PROBLEMS, POST_PROBLEMS, idempotencyKeyHeader, problems, rateLimitHeaders } from "../responses";

function summary(v: NonNullable<ReturnType<typeof exampleVerdict>>) {
  const { wavelengths: _w, reasons, ...rest } = v;
  return { ...rest, reasonCodes: [...new Set(reasons.map((r) => r.code))] };
}

export const gradingsBatch = (): RouteConfig => {
  const v = exampleVerdict();
  return {
    method: "post",
    path: "/api/v1/gradings/batch",
    operationId: "createGradingBatch",
    tags: ["Gradings"],
    summary: `Grade up to ${MAX_BATCH_ITEMS} link tests`,
    description:
      "Each test is validated on its own: valid tests are graded and stored together in one statement, invalid ones come back with their field errors and store nothing. Graded items carry a verdict summary (reason codes, not texts); `GET /api/v1/verdicts/{id}` has the full verdict. The body may be up to 16 MiB. Needs the `grade` scope.",
    security: [{ apiKey: [] }],
    request: {
      headers: idempotencyKeyHeader,
      body: {
        required: true,
        content: {
          "application/json": {
            schema: BatchRequestSchema,
            example: { profile: EXAMPLE_PROFILE, tests: [exampleTest, { ...exampleTest, link: { ...exampleTest.link, fibreType: "OM9" } }] },
          },
        },
      },
    },
    responses: {
      200: {
        description: "Every item was invalid; nothing was stored.",
        headers: rateLimitHeaders,
        content: {
          "application/json": {
            schema: BatchResultSchema,
            example: { graded: 0, invalid: 1, counts: { pass: 0, marginal: 0, fail: 0 }, items: [{ index: 0, status: "invalid", errors: [{ pointer: "/tests/0/measurements", message: "Invalid input: expected array, received undefined" }] }] },
          },
        },
      },
      201: {
        description: "At least one item was graded and stored.",
        headers: rateLimitHeaders,
        content: {
          "application/json": {
            schema: BatchResultSchema,
            example: v && {
              graded: 1,
              invalid: 1,
              counts: { pass: v.verdict === "pass" ? 1 : 0, marginal: v.verdict === "marginal" ? 1 : 0, fail: v.verdict === "fail" ? 1 : 0 },
              items: [
                { index: 0, status: "graded", verdict: summary(v) },
                { index: 1, status: "invalid", errors: [{ pointer: "/tests/1/link/fibreType", message: "Invalid option" }] },
              ],
            },
          },
        },
      },
      ...problems(...POST_PROBLEMS, ...IDEMPOTENCY_PROBLEMS, "conflict", ...AUTH_PROBLEMS),
    },
  };
};
