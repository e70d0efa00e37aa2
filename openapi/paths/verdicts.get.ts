import type { RouteConfig } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";
import { VerdictResourceSchema } from "@/lib/api/schemas/verdicts";
import { exampleVerdict } from "../examples";
import { AUTH_PROBLEMS, problems, rateLimitHeaders } from "../responses";

export const verdictIdParams = z.object({ id: z.uuid().meta({ description: "Verdict id", example: "0b8f3c1e-6d2a-4f7e-9a51-2c4d8e6f1a3b" }) });

export const verdictsGet = (): RouteConfig => ({
  method: "get",
  path: "/api/v1/verdicts/{id}",
  operationId: "getVerdict",
  tags: ["Verdicts"],
  summary: "Read one verdict",
  description: "A verdict of your organisation. Another organisation's verdict answers 404, exactly like a missing one. Needs `verdicts:read`.",
  security: [{ apiKey: [] }],
  request: { params: verdictIdParams },
  responses: {
    200: { description: "The stored verdict", headers: rateLimitHeaders, content: { "application/json": { schema: VerdictResourceSchema, example: exampleVerdict() } } },
    ...problems("not_found", ...AUTH_PROBLEMS),
  },
});
