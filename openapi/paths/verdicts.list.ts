import type { RouteConfig } from "@asteasolutions/zod-to-openapi";
import { VerdictListQuerySchema, VerdictListSchema } from "@/lib/api/schemas/verdicts";
import { exampleVerdict } from "../examples";
import { AUTH_PROBLEMS, problems, rateLimitHeaders } from "../responses";

export const verdictsList = (): RouteConfig => {
  const v = exampleVerdict();
  return {
    method: "get",
    path: "/api/v1/verdicts",
    operationId: "listVerdicts",
    tags: ["Verdicts"],
    summary: "List verdicts",
    description:
      "Newest first. Pages are cut by chain position, so verdicts stored while you page never shift or repeat rows: follow `nextCursor` until it is null. Needs `verdicts:read`.",
    security: [{ apiKey: [] }],
    request: { query: VerdictListQuerySchema },
    responses: {
      200: {
        description: "One page of verdicts",
        headers: rateLimitHeaders,
        content: { "application/json": { schema: VerdictListSchema, example: { data: v ? [v] : [], nextCursor: "eyJzIjoxMDQyfQ" } } },
      },
      ...problems("validation_failed", ...AUTH_PROBLEMS),
    },
  };
};
