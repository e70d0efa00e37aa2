import { z } from "zod";
import { API_SCOPES } from "./api-key";

// Shared by the key form (react-hook-form) and lib/keys/manage.ts.
export const createKeySchema = z.object({
  name: z.string().trim().min(1, "Give the key a name.").max(80, "Use at most 80 characters."),
  environment: z.enum(["sandbox", "live"]),
  scopes: z.array(z.enum(API_SCOPES)).min(1, "Pick at least one scope."),
  /** Optional last day of validity (UTC, YYYY-MM-DD); the key stops working at the end of that day. */
  expiresOn: z
    .string()
    .regex(/^(\d{4}-\d{2}-\d{2})?$/, "Use the date picker (YYYY-MM-DD).")
    .optional()
    .refine((d) => !d || new Date(`${d}T23:59:59.999Z`).getTime() > Date.now(), "Pick a date in the future."),
});
export type CreateKeyInput = z.input<typeof createKeySchema>;

export const revokeKeySchema = z.object({ keyId: z.uuid() });

export const SCOPE_LABELS: Record<(typeof API_SCOPES)[number], string> = {
  grade: "Submit tests for grading",
  "verdicts:read": "Read verdicts",
  "profiles:read": "Read limit profiles",
};
