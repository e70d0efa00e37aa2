import type { RouteConfig } from "@asteasolutions/zod-to-openapi";
import { requestIdHeader } from "../responses";

export const metaOpenapi = (): RouteConfig => ({
  method: "get",
  path: "/api/v1/openapi.json",
  operationId: "getOpenApiDocument",
  tags: ["Service"],
  security: [],
  summary: "This API's OpenAPI 3.1 document",
  description: "No key needed. Generated from the same schemas that validate requests.",
  responses: {
    200: { description: "The OpenAPI document", headers: requestIdHeader, content: { "application/json": { schema: { type: "object" } } } },
  },
});
