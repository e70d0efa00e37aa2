// Builders shared by the grading tests: a validated link test from a compact description, and a
// template clone with some limits changed.
import { findTemplate, LinkTestSchema, ProfileSchema, type LinkTest, type Profile } from "@/lib/grading";

export function linkTest(input: unknown): LinkTest {
  return LinkTestSchema.parse(input);
}

export function template(slug: string): Profile {
  const t = findTemplate(slug);
  if (!t) throw new Error(`no template ${slug}`);
  return t;
}

/** A mutable deep copy of a template, changed by `edit`, then validated like an engineer's draft. */
export function profileFrom(slug: string, edit: (p: Profile) => void): Profile {
  const p = structuredClone(template(slug)) as Profile;
  edit(p);
  return ProfileSchema.parse(p);
}

export function limit(value: number, source = "test fixture") {
  return { value, source };
}

/** Codes of the reasons that are not informational. */
export function problems(result: { reasons: { code: string; severity: string }[] }): string[] {
  return result.reasons.filter((r) => r.severity !== "info").map((r) => `${r.severity}:${r.code}`);
}
