// The one OpenAPI registry. Named components come from the same zod schemas the routes validate with.
// Names are attached in the generator's metadata registry to the very schema instances the routes use,
// so every nested use becomes a $ref. We do not rely on extendZodWithOpenApi's `.openapi()`: zod 4 only
// gives that method to schemas created after the extension runs, and the engine's schemas come first.
import { OpenAPIRegistry, zodToOpenAPIRegistry } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";
import { GradingResultSchema, LinkTestSchema, ReasonSchema, WavelengthResultSchema, LimitsSchema } from "@/lib/grading/schema";
import { ProblemSchema } from "@/lib/api/schemas/common";
import { BatchRequestSchema, BatchResultSchema, GradingRequestSchema } from "@/lib/api/schemas/gradings";
import { ReplayRequestSchema, ReplayResultSchema, VerdictListSchema, VerdictResourceSchema, VerdictSummarySchema } from "@/lib/api/schemas/verdicts";
import { ProfileDetailSchema, ProfileListSchema, ProfileVersionSchema } from "@/lib/api/schemas/profiles";

function named(refId: string, schema: z.ZodType) {
  const current = zodToOpenAPIRegistry.get(schema) as { _internal?: object } | undefined;
  zodToOpenAPIRegistry.add(schema, { ...current, _internal: { ...current?._internal, refId } });
}

export function createRegistry(): OpenAPIRegistry {
  const registry = new OpenAPIRegistry();
  registry.registerComponent("securitySchemes", "apiKey", {
    type: "http",
    scheme: "bearer",
    bearerFormat: "gg_live_… or gg_sbx_…",
    description: "An API key from the console (API keys page). Sandbox keys start with `gg_sbx_`, live keys with `gg_live_`.",
  });
  named("Problem", ProblemSchema);
  named("LinkTest", LinkTestSchema);
  named("Limits", LimitsSchema);
  named("Reason", ReasonSchema);
  named("WavelengthResult", WavelengthResultSchema);
  named("GradingResult", GradingResultSchema);
  named("GradingRequest", GradingRequestSchema);
  named("BatchRequest", BatchRequestSchema);
  named("BatchResult", BatchResultSchema);
  named("Verdict", VerdictResourceSchema);
  named("VerdictSummary", VerdictSummarySchema);
  named("VerdictList", VerdictListSchema);
  named("ReplayRequest", ReplayRequestSchema);
  named("ReplayResult", ReplayResultSchema);
  named("ProfileList", ProfileListSchema);
  named("ProfileDetail", ProfileDetailSchema);
  named("ProfileVersion", ProfileVersionSchema);
  return registry;
}
