import type { RouteConfig } from "@asteasolutions/zod-to-openapi";
import { ProfileListSchema } from "@/lib/api/schemas/profiles";
import { AUTH_PROBLEMS, problems, rateLimitHeaders } from "../responses";

export const profilesList = (): RouteConfig => ({
  method: "get",
  path: "/api/v1/profiles",
  operationId: "listProfiles",
  tags: ["Profiles"],
  summary: "List profiles",
  description: "Your organisation's limit profiles, then the built-in templates, and which one is the default. Needs `profiles:read`.",
  security: [{ apiKey: [] }],
  responses: {
    200: {
      description: "Profiles and templates",
      headers: rateLimitHeaders,
      content: {
        "application/json": {
          schema: ProfileListSchema,
          example: {
            defaultProfile: "tia-568-3-d-singlemode-osp",
            data: [{ slug: "tia-568-3-d-singlemode-osp", name: "TIA-568.3-D single-mode, outside plant", kind: "template", latestVersion: 1, isDefault: true }],
          },
        },
      },
    },
    ...problems(...AUTH_PROBLEMS),
  },
});
