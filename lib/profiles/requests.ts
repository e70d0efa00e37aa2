// Request shapes of the console's profile and audit routes: one schema each, shared by the route that
// parses and the form that sends.
import { z } from "zod";

const instant = z.iso.datetime({ offset: true, message: "Use an ISO 8601 time, e.g. 2026-11-01T00:00:00Z" });

export const TimeRangeSchema = z
  .object({ from: instant.optional(), to: instant.optional() })
  .refine((r) => !r.from || !r.to || new Date(r.from) < new Date(r.to), { path: ["to"], message: "The end must come after the start" });
export type TimeRange = z.infer<typeof TimeRangeSchema>;

export const PreviewRequestSchema = z.object({
  slug: z.string().min(1).max(80),
  /** Limits from the editor that are not saved yet; the stored draft when absent. */
  limits: z.unknown().optional(),
  limit: z.union([z.literal("all"), z.coerce.number().int().min(1, "At least one test").max(10_000_000)]).default(1000),
  /** "related": tests graded under this profile or its template; "all": every stored test. */
  scope: z.enum(["related", "all"]).default("related"),
  from: instant.optional(),
  to: instant.optional(),
});
export type PreviewRequestBody = z.infer<typeof PreviewRequestSchema>;

export const PackTokenSchema = z.object({ token: z.string().regex(/^[0-9a-f]{32}$/, "Not an audit pack token") });

export function toDates(r: { from?: string; to?: string }): { from?: Date; to?: Date } {
  return { from: r.from ? new Date(r.from) : undefined, to: r.to ? new Date(r.to) : undefined };
}
