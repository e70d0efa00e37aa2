import type { RouteConfig } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";
import { ProfileDetailSchema } from "@/lib/api/schemas/profiles";
import { AUTH_PROBLEMS, problems, rateLimitHeaders } from "../responses";

export const profileSlugParams = z.object({ slug: z.string().meta({ description: "Profile or template slug", example: "tia-568-3-d-singlemode-osp" }) });

export const profilesGet = (): RouteConfig => ({
  method: "get",
  path: "/api/v1/profiles/{slug}",
  operationId: "getProfile",
  tags: ["Profiles"],
  summary: "Read a profile and its versions",
  description: "One of your organisation's profiles (versions newest first) or a built-in template (one version). Needs `profiles:read`.",
  security: [{ apiKey: [] }],
  request: { params: profileSlugParams },
  responses: {
    200: {
      description: "The profile",
      headers: rateLimitHeaders,
      content: {
        "application/json": {
          schema: ProfileDetailSchema,
          example: { slug: "northmere-osp", name: "Northmere outside plant", kind: "organisation", basedOn: "tia-568-3-d-singlemode-osp", versions: [{ version: 2, publishedAt: "2026-11-20T10:00:00.000Z", note: "Tighter splice allowance" }] },
        },
      },
    },
    ...problems("not_found", ...AUTH_PROBLEMS),
  },
});
