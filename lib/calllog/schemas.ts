import { z } from "zod";

export const CALL_SORT_FIELDS = ["createdAt", "status", "latencyMs", "route"] as const;

// The call-log filters, as they travel in the query string of the console route and the CSV export.
export const callLogQuerySchema = z.object({
  status: z.enum(["2xx", "3xx", "4xx", "5xx"]).optional(),
  route: z.string().max(200).optional(),
  keyId: z.uuid().optional(),
  from: z.iso.datetime({ offset: true }).optional(),
  to: z.iso.datetime({ offset: true }).optional(),
  sort: z.enum(CALL_SORT_FIELDS).default("createdAt"),
  dir: z.enum(["asc", "desc"]).default("desc"),
  cursor: z.string().max(400).optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});
export type CallLogQuery = z.infer<typeof callLogQuerySchema>;

/** Reads the query string leniently: empty values mean "no filter". */
export function parseCallLogQuery(params: URLSearchParams): CallLogQuery {
  const raw: Record<string, string> = {};
  for (const [k, v] of params) if (v !== "") raw[k] = v;
  return callLogQuerySchema.parse(raw);
}
