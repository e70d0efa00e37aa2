import { z } from "zod";
import { LimitsSchema } from "@/lib/grading/schema";

const Kind = z.enum(["template", "organisation"]).meta({ description: "Built-in read-only template, or your organisation's own profile" });

export const ProfileSummarySchema = z.object({
  slug: z.string().meta({ example: "tia-568-3-d-singlemode-osp" }),
  name: z.string(),
  kind: Kind,
  latestVersion: z.number().int().nullable().meta({ description: "null for an organisation profile with nothing published yet" }),
  isDefault: z.boolean().meta({ description: "True when API calls without `profile` grade under it" }),
});

export const ProfileListSchema = z.object({
  defaultProfile: z.string().meta({ description: "The organisation's default profile reference", example: "tia-568-3-d-singlemode-osp" }),
  data: z.array(ProfileSummarySchema),
});

export const ProfileVersionSummarySchema = z.object({
  version: z.number().int(),
  publishedAt: z.iso.datetime().nullable().meta({ description: "null for templates (built into this engine version)" }),
  note: z.string(),
});

export const ProfileDetailSchema = z.object({
  slug: z.string(),
  name: z.string(),
  kind: Kind,
  basedOn: z.string().nullable(),
  versions: z.array(ProfileVersionSummarySchema).meta({ description: "Newest first" }),
});

export const ProfileVersionSchema = z.object({
  slug: z.string(),
  name: z.string(),
  kind: Kind,
  version: z.number().int(),
  publishedAt: z.iso.datetime().nullable(),
  note: z.string(),
  limits: LimitsSchema,
});
