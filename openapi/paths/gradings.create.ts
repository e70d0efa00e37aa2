import type { RouteConfig } from "@asteasolutions/zod-to-openapi";
import { GradingRequestSchema } from "@/lib/api/schemas/gradings";
import { VerdictResourceSchema } from "@/lib/api/schemas/verdicts";
import { exampleTest, exampleVerdict, EXAMPLE_PROFILE } from "../examples";
import { AUTH_PROBLEMS, IDEMPOTENCY_PROBLEMS, POST_PROBLEMS, idempotencyKeyHeader, problems, rateLimitHeaders } from "../responses";

export const gradingsCreate = (): RouteConfig => ({
  method: "post",
  path: "/api/v1/gradings",
  operationId: "createGrading",
  tags: ["Gradings"],
  summary: "Grade one link test",
  description:
    "Grades the test under the named profile (or your organisation's default), stores the test and its verdict in your organisation's audit chain, and answers with the verdict. Needs the `grade` scope.",
  security: [{ apiKey: [] }],
  request: {
    headers: idempotencyKeyHeader,
    body: { required: true, content: { "application/json": { schema: GradingRequestSchema, example: { profile: EXAMPLE_PROFILE, test: exampleTest } } } },
  },
  responses: {
    201: {
      description: "Graded and stored. `Location` points at the new verdict.",
      headers: rateLimitHeaders,
      content: { "application/json": { schema: VerdictResourceSchema, example: exampleVerdict() } },
    },
    ...problems(...POST_PROBLEMS, ...IDEMPOTENCY_PROBLEMS, "conflict", ...AUTH_PROBLEMS),
  },
});
