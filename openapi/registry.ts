// The one OpenAPI registry. Named components come from the same zod schemas the routes validate with.
import { extendZodWithOpenApi, OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";
import { GradingResultSchema, LinkTestSchema, ReasonSchema, WavelengthResultSchema, LimitsSchema } from "@/lib/grading/schema";
import { ProblemSchema } from "@/lib/api/schemas/common";
import { BatchRequestSchema, BatchResultSchema, GradingRequestSchema } from "@/lib/api/schemas/gradings";
import { ReplayRequestSchema, ReplayResultSchema, VerdictListSchema, VerdictResourceSchema } from "@/lib/api/schemas/verdicts";
import { ProfileDetailSchema, ProfileListSchema, ProfileVersionSchema } from "@/lib/api/schemas/profiles";

extendZodWithOpenApi(z);

export function createRegistry(): OpenAPIRegistry {
  const registry = new OpenAPIRegistry();
  registry.registerComponent("securitySchemes", "apiKey", {
    type: "http",
    scheme: "bearer",
    bearerFormat: "gg_live_… or gg_sbx_…",
    description: "An API key from the console (API keys page). Sandbox keys start with `gg_sbx_`, live keys with `gg_live_`.",
  });
  registry.register("Problem", ProblemSchema);
  registry.register("LinkTest", LinkTestSchema);
  registry.register("Limits", LimitsSchema);
  registry.register("Reason", ReasonSchema);
  registry.register("WavelengthResult", WavelengthResultSchema);
  registry.register("GradingResult", GradingResultSchema);
  registry.register("GradingRequest", GradingRequestSchema);
  registry.register("BatchRequest", BatchRequestSchema);
  registry.register("BatchResult", BatchResultSchema);
  registry.register("Verdict", VerdictResourceSchema);
  registry.register("VerdictList", VerdictListSchema);
  registry.register("ReplayRequest", ReplayRequestSchema);
  registry.register("ReplayResult", ReplayResultSchema);
  registry.register("ProfileList", ProfileListSchema);
  registry.register("ProfileDetail", ProfileDetailSchema);
  registry.register("ProfileVersion", ProfileVersionSchema);
  return registry;
}
