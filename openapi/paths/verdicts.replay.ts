import type { RouteConfig } from "@asteasolutions/zod-to-openapi";
import { ReplayRequestSchema, ReplayResultSchema } from "@/lib/api/schemas/verdicts";
import { AUTH_PROBLEMS, IDEMPOTENCY_PROBLEMS, POST_PROBLEMS, idempotencyKeyHeader, problems, rateLimitHeaders } from "../responses";
import { verdictIdParams } from "./verdicts.get";

const digest = "9c1f0e5b7a2d4c6e8f0a1b3c5d7e9f1a2b4c6d8e0f1a3b5c7d9e1f2a4b6c8d0e";

export const verdictsReplay = (): RouteConfig => ({
  method: "post",
  path: "/api/v1/verdicts/{id}/replay",
  operationId: "replayVerdict",
  tags: ["Verdicts"],
  summary: "Replay a verdict",
  description:
    "Grades the stored test again under the stored profile version and reports whether the result digest matches (`reproduced`). With `profile`, also grades it under that profile to show what would change. Stores nothing. The body is optional. Needs `verdicts:read`.",
  security: [{ apiKey: [] }],
  request: {
    params: verdictIdParams,
    headers: idempotencyKeyHeader,
    body: { required: false, content: { "application/json": { schema: ReplayRequestSchema, example: { profile: "tia-568-3-d-singlemode-osp@1" } } } },
  },
  responses: {
    200: {
      description: "Replay outcome",
      headers: rateLimitHeaders,
      content: {
        "application/json": {
          schema: ReplayResultSchema,
          example: {
            verdictId: "0b8f3c1e-6d2a-4f7e-9a51-2c4d8e6f1a3b",
            reproduced: true,
            storedDigest: digest,
            replayDigest: digest,
            engineVersion: { stored: "1.0.0", current: "1.0.0" },
            stored: { profile: { slug: "tia-568-3-d-singlemode-osp", version: 1 }, verdict: "pass", headroomDb: 1.83, digest, reasonCodes: [] },
            replayed: { profile: { slug: "tia-568-3-d-singlemode-osp", version: 1 }, verdict: "pass", headroomDb: 1.83, digest, reasonCodes: [] },
          },
        },
      },
    },
    ...problems(...POST_PROBLEMS, ...IDEMPOTENCY_PROBLEMS, "not_found", "conflict", ...AUTH_PROBLEMS),
  },
});
