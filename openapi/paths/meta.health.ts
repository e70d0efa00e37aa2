import type { RouteConfig } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";
import { problems, requestIdHeader } from "../responses";

export const HealthSchema = z.object({
  status: z.enum(["ok", "degraded"]),
  version: z.string().meta({ example: "0.1.0" }),
  database: z.object({ status: z.enum(["up", "down"]), latencyMs: z.number().optional() }),
});

export const metaHealth = (): RouteConfig => ({
  method: "get",
  path: "/api/v1/health",
  operationId: "getHealth",
  tags: ["Service"],
  security: [],
  summary: "Service health",
  description: "No key needed. Answers 503 when the database cannot be reached.",
  responses: {
    200: {
      description: "The service and its database answer",
      headers: requestIdHeader,
      content: { "application/json": { schema: HealthSchema, example: { status: "ok", version: "0.1.0", database: { status: "up", latencyMs: 0.41 } } } },
    },
    ...problems("database_unavailable"),
  },
});
