import type { RouteConfig } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";
import { ProfileVersionSchema } from "@/lib/api/schemas/profiles";
import { findTemplate } from "@/lib/grading";
import { EXAMPLE_PROFILE } from "../examples";
import { AUTH_PROBLEMS, problems, rateLimitHeaders } from "../responses";

export const profilesVersion = (): RouteConfig => {
  const t = findTemplate(EXAMPLE_PROFILE);
  const example = t && { slug: t.slug, name: t.name, kind: "template", version: t.version, publishedAt: null, note: t.description ?? "", limits: t.limits };
  return {
    method: "get",
    path: "/api/v1/profiles/{slug}/versions/{version}",
    operationId: "getProfileVersion",
    tags: ["Profiles"],
    summary: "Read one profile version's limits",
    description: "The frozen limits of a published version (or of a template), each value with its source. Needs `profiles:read`.",
    security: [{ apiKey: [] }],
    request: {
      params: z.object({
        slug: z.string().meta({ description: "Profile or template slug", example: "tia-568-3-d-singlemode-osp" }),
        version: z.string().regex(/^[1-9][0-9]*$/).meta({ description: "Version number", example: "1" }),
      }),
    },
    responses: {
      200: { description: "The version and its limits", headers: rateLimitHeaders, content: { "application/json": { schema: ProfileVersionSchema, example } } },
      ...problems("not_found", ...AUTH_PROBLEMS),
    },
  };
};
