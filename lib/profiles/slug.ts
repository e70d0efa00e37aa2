import { z } from "zod";

// Organisation profile slugs appear in API calls as `slug` or `slug@version`, so they stay URL-safe.
export const ProfileSlugSchema = z
  .string()
  .trim()
  .min(2, "Use at least 2 characters")
  .max(63, "Use at most 63 characters")
  .regex(/^[a-z0-9][a-z0-9-]*[a-z0-9]$/, "Lower-case letters, digits and dashes; start and end with a letter or digit")
  // The console serves templates under /console/profiles/templates.
  .refine((s) => s !== "templates", "This slug is reserved");

export const ProfileNameSchema = z.string().trim().min(1, "Give the profile a name").max(120, "Use at most 120 characters");

export const ChangeNoteSchema = z.string().trim().min(3, "Say in a few words what changed").max(2000, "Use at most 2,000 characters");

/** "slug" or "slug@version". */
export function parseProfileRef(ref: string): { slug: string; version?: number } {
  const at = ref.lastIndexOf("@");
  if (at < 0) return { slug: ref };
  const version = Number(ref.slice(at + 1));
  return { slug: ref.slice(0, at), version: Number.isInteger(version) && version > 0 ? version : Number.NaN };
}
