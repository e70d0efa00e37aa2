// The seam between profile storage and the grading engine: which templates exist, and whether a set of
// limits is one the engine accepts. The engine's ProfileSchema is the only judge of valid limits.
import { findTemplate, templates } from "@/lib/grading";
import { ProfileSchema, type Profile } from "@/lib/grading/schema";
import { InvalidInputError, type FieldIssue } from "./access";
import { DraftLimitsSchema } from "./limits-schema";

export type EngineProfile = Profile;
export type Limits = Profile["limits"];

export function allTemplates(): EngineProfile[] {
  return (Object.values(templates) as EngineProfile[]).slice().sort((a, b) => a.slug.localeCompare(b.slug));
}

export function templateBySlug(slug: string): EngineProfile | undefined {
  return (findTemplate(slug) as EngineProfile | undefined) ?? undefined;
}

const DraftProfileSchema = ProfileSchema.extend({ limits: DraftLimitsSchema });

/** Validates limits as a whole profile; issue paths are relative to `limits`. */
export function validateLimits(profile: { slug: string; version: number; name: string; limits: unknown }): EngineProfile {
  const parsed = DraftProfileSchema.safeParse(profile);
  if (parsed.success) return parsed.data as EngineProfile;
  const issues: FieldIssue[] = parsed.error.issues.map((i) => {
    const path = i.path.map(String);
    return { path: path[0] === "limits" ? path.slice(1).join(".") : path.join("."), message: i.message };
  });
  throw new InvalidInputError(issues);
}
