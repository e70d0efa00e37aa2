import { z } from "zod";
import { ReasonSchema, VerdictSchema, WavelengthResultSchema } from "@/lib/grading/schema";
import { CursorSchema, ProfileRefSchema } from "./common";

export const VerdictResourceSchema = z
  .object({
    id: z.uuid().meta({ example: "0b8f3c1e-6d2a-4f7e-9a51-2c4d8e6f1a3b" }),
    seq: z.number().int().meta({ description: "Position in your organisation's audit chain (1, 2, 3 …)", example: 1042 }),
    linkRef: z.string().meta({ example: "NM-KIRKBY-0417" }),
    verdict: VerdictSchema,
    headroomDb: z.number().nullable().meta({ description: "Worst headroom in dB; negative when over the limit", example: 1.83 }),
    wavelengths: z.array(WavelengthResultSchema),
    reasons: z.array(ReasonSchema),
    profile: z.object({ slug: z.string(), version: z.number().int() }).meta({ example: { slug: "tia-568-3-d-singlemode-osp", version: 1 } }),
    engineVersion: z.string().meta({ example: "1.0.0" }),
    digest: z.string().meta({ description: "SHA-256 of the RFC 8785 canonical JSON of the result" }),
    prevDigest: z.string().nullable().meta({ description: "Digest of the verdict before this one in the chain; null for the first" }),
    createdAt: z.iso.datetime().meta({ example: "2026-11-30T09:14:07.512Z" }),
  })
  .meta({ description: "A stored, immutable verdict" });
export type VerdictResource = z.infer<typeof VerdictResourceSchema>;

export const VerdictSummarySchema = VerdictResourceSchema.pick({
  id: true,
  seq: true,
  linkRef: true,
  verdict: true,
  headroomDb: true,
  profile: true,
  engineVersion: true,
  digest: true,
  prevDigest: true,
  createdAt: true,
})
  .extend({ reasonCodes: z.array(z.string()).meta({ description: "Distinct reason codes; the full reasons are at GET /api/v1/verdicts/{id}" }) })
  .meta({ description: "A stored verdict without its per-wavelength figures and reason texts (batch answers stay small)" });
export type VerdictSummary = z.infer<typeof VerdictSummarySchema>;

export const VerdictListQuerySchema = z
  .object({
    verdict: VerdictSchema.optional(),
    profile: ProfileRefSchema.optional().meta({ description: "Only verdicts graded under this profile (any version, or `slug@n`)" }),
    linkRef: z.string().trim().min(1).max(200).optional().meta({ description: "Exact link reference" }),
    from: z.iso.datetime({ offset: true }).optional().meta({ description: "Created at or after (ISO 8601)", example: "2026-11-01T00:00:00Z" }),
    to: z.iso.datetime({ offset: true }).optional().meta({ description: "Created before (ISO 8601)", example: "2026-12-01T00:00:00Z" }),
    limit: z.coerce.number().int().min(1).max(200).default(50).meta({ description: "Page size, 1 to 200" }),
    cursor: CursorSchema.optional(),
  })
  .strict();
export type VerdictListQuery = z.infer<typeof VerdictListQuerySchema>;

export const VerdictListSchema = z.object({
  data: z.array(VerdictResourceSchema),
  nextCursor: z.string().nullable().meta({ description: "Pass as `cursor` for the next (older) page; null on the last page" }),
});

export const ReplayRequestSchema = z
  .object({
    profile: ProfileRefSchema.optional().meta({
      description: "Also grade the stored test under this profile version to see what would change",
      example: "northmere-osp@2",
    }),
  })
  .strict();

const Outcome = z.object({
  profile: z.object({ slug: z.string(), version: z.number().int() }),
  verdict: VerdictSchema,
  headroomDb: z.number().nullable(),
  digest: z.string(),
  reasonCodes: z.array(z.string()),
});

export const ReplayResultSchema = z
  .object({
    verdictId: z.uuid(),
    reproduced: z.boolean().meta({ description: "True when re-grading gave the stored digest byte for byte" }),
    storedDigest: z.string(),
    replayDigest: z.string(),
    engineVersion: z.object({ stored: z.string(), current: z.string() }),
    stored: Outcome,
    replayed: Outcome,
    comparison: Outcome.extend({
      changed: z.boolean().meta({ description: "True when the verdict or the reason codes differ from the stored ones" }),
      reasonsAdded: z.array(z.string()),
      reasonsRemoved: z.array(z.string()),
    })
      .optional()
      .meta({ description: "Present when a `profile` was given: the stored test graded under it" }),
  })
  .meta({ description: "Outcome of re-grading a stored test" });
export type ReplayResult = z.infer<typeof ReplayResultSchema>;
