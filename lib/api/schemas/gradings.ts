import { z } from "zod";
import { LinkTestSchema } from "@/lib/grading/schema";
import { ProfileRefSchema } from "./common";
import { VerdictSummarySchema } from "./verdicts";

export const MAX_BATCH_ITEMS = 1000;

export const GradingRequestSchema = z
  .object({
    profile: ProfileRefSchema.optional().meta({ description: "Profile to grade under; your organisation's default profile when absent" }),
    test: LinkTestSchema,
  })
  .strict()
  .meta({ description: "One link test to grade and store" });
export type GradingRequest = z.infer<typeof GradingRequestSchema>;

// Items are checked one by one (so one bad item does not sink the others): the envelope only checks the list.
export const BatchEnvelopeSchema = z
  .object({
    profile: ProfileRefSchema.optional().meta({ description: "Profile for every item; your organisation's default when absent" }),
    tests: z
      .array(z.unknown())
      .min(1, "tests must hold at least one test")
      .max(MAX_BATCH_ITEMS, `tests must hold at most ${MAX_BATCH_ITEMS} tests`),
  })
  .strict();

export const BatchRequestSchema = BatchEnvelopeSchema.extend({
  tests: z.array(LinkTestSchema).min(1).max(MAX_BATCH_ITEMS),
}).meta({ description: `Up to ${MAX_BATCH_ITEMS} link tests graded under one profile` });

export const BatchItemErrorSchema = z.object({
  pointer: z.string().meta({ example: "/tests/3/measurements/0/insertionLossDb" }),
  message: z.string(),
});

export const BatchItemSchema = z.discriminatedUnion("status", [
  z.object({ index: z.number().int(), status: z.literal("graded"), verdict: VerdictSummarySchema }),
  z.object({ index: z.number().int(), status: z.literal("invalid"), errors: z.array(BatchItemErrorSchema) }),
]);

export const BatchResultSchema = z
  .object({
    graded: z.number().int().meta({ description: "Items graded and stored" }),
    invalid: z.number().int().meta({ description: "Items refused by validation (nothing stored for them)" }),
    counts: z.object({ pass: z.number().int(), marginal: z.number().int(), fail: z.number().int() }),
    items: z.array(BatchItemSchema).meta({ description: "One entry per submitted test, in order" }),
  })
  .meta({ description: "Per-item outcome of a batch" });
export type BatchResult = z.infer<typeof BatchResultSchema>;
