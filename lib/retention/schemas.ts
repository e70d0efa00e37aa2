import { z } from "zod";

// Call-log rows are kept for at least 30 days (enough to answer an integrator's question about last month)
// and at most 10 years.
export const CALL_LOG_RETENTION_MIN_DAYS = 30;
export const CALL_LOG_RETENTION_MAX_DAYS = 3650;

export const retentionSchema = z.object({
  callLogDays: z.coerce
    .number({ error: "Enter a number of days." })
    .int("Enter a whole number of days.")
    .min(CALL_LOG_RETENTION_MIN_DAYS, `Keep calls for at least ${CALL_LOG_RETENTION_MIN_DAYS} days.`)
    .max(CALL_LOG_RETENTION_MAX_DAYS, `Keep calls for at most ${CALL_LOG_RETENTION_MAX_DAYS} days.`),
});
export type RetentionInput = z.input<typeof retentionSchema>;
