// Problem responses registered once in spirit: every operation lists the codes it can answer with, and
// each status gets the same shared description and schema.
import type { ResponseConfig } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";
import { ProblemSchema } from "@/lib/api/schemas/common";
import { PROBLEMS, problemType, type ProblemCode } from "@/lib/api/problem";

export const requestIdHeader = z.object({
  "X-Request-Id": z.string().meta({ description: "Request id; quote it when reporting a problem", example: "req_3vJ0cW1lX9mQ2aTb" }),
});

export const rateLimitHeaders = z.object({
  "X-Request-Id": z.string().meta({ description: "Request id; quote it when reporting a problem" }),
  "RateLimit-Limit": z.string().meta({ description: "Requests allowed per minute for this key", example: "600" }),
  "RateLimit-Remaining": z.string().meta({ description: "Requests left in the current window", example: "598" }),
  "RateLimit-Reset": z.string().meta({ description: "Seconds until the allowance is full again", example: "1" }),
  "RateLimit-Policy": z.string().meta({ example: "600;w=60" }),
});

function problemResponse(codes: ProblemCode[]): ResponseConfig {
  const first = codes[0];
  const description = codes.map((c) => `\`${c}\`: ${PROBLEMS[c].title}`).join("; ");
  return {
    description,
    headers: requestIdHeader,
    content: {
      "application/problem+json": {
        schema: ProblemSchema,
        example: {
          type: problemType(first),
          title: PROBLEMS[first].title,
          status: PROBLEMS[first].status,
          detail: PROBLEMS[first].title + ".",
          code: first,
          requestId: "req_3vJ0cW1lX9mQ2aTb",
          ...(first === "validation_failed" ? { errors: [{ pointer: "/test/link/fibreType", message: "Invalid option" }] } : {}),
        },
      },
    },
  };
}

/** Problem responses for the given codes, grouped by HTTP status. */
export function problems(...codes: ProblemCode[]): Record<number, ResponseConfig> {
  const byStatus = new Map<number, ProblemCode[]>();
  for (const c of codes) byStatus.set(PROBLEMS[c].status, [...(byStatus.get(PROBLEMS[c].status) ?? []), c]);
  return Object.fromEntries([...byStatus].map(([status, cs]) => [status, problemResponse(cs)]));
}

/** What every keyed route can answer besides its own problems. */
export const AUTH_PROBLEMS: ProblemCode[] = ["unauthorized", "forbidden", "rate_limited", "internal_error", "database_unavailable"];
export const POST_PROBLEMS: ProblemCode[] = ["bad_request", "validation_failed", "payload_too_large", "unsupported_media_type"];
export const IDEMPOTENCY_PROBLEMS: ProblemCode[] = ["idempotency_in_flight", "idempotency_key_reused"];

export const idempotencyKeyHeader = z.object({
  "Idempotency-Key": z
    .string()
    .max(255)
    .optional()
    .meta({
      description:
        "Any unique string (a UUID is ideal). A retry with the same key and body returns the first response and creates nothing; the same key with another body answers 422; while the first call is running, 409.",
      example: "5f0c9a8e-2b1d-4d6f-8e3a-7c9b0a1d2e3f",
    }),
});
