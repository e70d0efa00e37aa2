// RFC 9457 problem details. One table maps each stable `code` to its HTTP status, title and `type` URI,
// so clients can switch on `code` and docs can link every `type`.

export const PROBLEM_BASE = "https://glassgrade.dev/problems/";

export const PROBLEMS = {
  bad_request: { status: 400, title: "Request body is not valid JSON" },
  validation_failed: { status: 422, title: "Request failed validation" },
  unauthorized: { status: 401, title: "Missing or invalid credentials" },
  forbidden: { status: 403, title: "Not allowed for this key or role" },
  not_found: { status: 404, title: "Resource not found" },
  method_not_allowed: { status: 405, title: "Method not allowed on this route" },
  conflict: { status: 409, title: "Conflicting request" },
  idempotency_key_reused: { status: 422, title: "Idempotency-Key was used with a different request" },
  idempotency_in_flight: { status: 409, title: "A request with this Idempotency-Key is still in progress" },
  payload_too_large: { status: 413, title: "Request body is too large" },
  unsupported_media_type: { status: 415, title: "Content-Type must be application/json" },
  rate_limited: { status: 429, title: "Too many requests" },
  internal_error: { status: 500, title: "Internal error" },
  database_unavailable: { status: 503, title: "Database is unavailable" },
} as const satisfies Record<string, { status: number; title: string }>;

export type ProblemCode = keyof typeof PROBLEMS;

export interface FieldError {
  /** JSON pointer (RFC 6901) of the offending field, "" for the whole body. */
  pointer: string;
  message: string;
}

export interface ProblemBody {
  type: string;
  title: string;
  status: number;
  detail: string;
  instance?: string;
  code: ProblemCode;
  requestId?: string;
  errors?: FieldError[];
}

export function problemType(code: ProblemCode): string {
  return PROBLEM_BASE + code.replace(/_/g, "-");
}

export function problemBody(
  code: ProblemCode,
  detail: string,
  extra: { instance?: string; requestId?: string; errors?: FieldError[] } = {},
): ProblemBody {
  const { status, title } = PROBLEMS[code];
  return { type: problemType(code), title, status, detail, code, ...extra };
}

export function problemResponse(
  code: ProblemCode,
  detail: string,
  extra: { instance?: string; requestId?: string; errors?: FieldError[]; headers?: HeadersInit } = {},
): Response {
  const { headers, ...rest } = extra;
  const body = problemBody(code, detail, rest);
  const h = new Headers(headers);
  h.set("content-type", "application/problem+json");
  if (rest.requestId) h.set("x-request-id", rest.requestId);
  return new Response(JSON.stringify(body), { status: body.status, headers: h });
}

/** Thrown by handlers and helpers; the API wrapper turns it into a problem response. */
export class ApiError extends Error {
  constructor(
    readonly code: ProblemCode,
    readonly detail: string,
    readonly extra: { errors?: FieldError[]; headers?: HeadersInit } = {},
  ) {
    super(detail);
    this.name = "ApiError";
  }

  get status(): number {
    return PROBLEMS[this.code].status;
  }
}

/** RFC 6901: "~" becomes "~0" and "/" becomes "~1" inside each reference token. */
export function jsonPointer(path: readonly PropertyKey[]): string {
  return path.map((p) => "/" + String(p).replace(/~/g, "~0").replace(/\//g, "~1")).join("");
}

interface IssueLike {
  code?: string;
  path: readonly PropertyKey[];
  message: string;
  keys?: readonly string[];
}

/** One field error per zod issue; an unknown-key issue becomes one error per key so each has a pointer. */
export function fieldErrorsFromIssues(issues: readonly IssueLike[], base: readonly PropertyKey[] = []): FieldError[] {
  const out: FieldError[] = [];
  for (const issue of issues) {
    if (issue.code === "unrecognized_keys" && issue.keys?.length) {
      for (const k of issue.keys) out.push({ pointer: jsonPointer([...base, ...issue.path, k]), message: "Unknown field" });
    } else {
      out.push({ pointer: jsonPointer([...base, ...issue.path]), message: issue.message });
    }
  }
  return out;
}
