// Recognises "the database cannot be reached" among errors thrown by pg and Drizzle, so the API answers
// 503 (retry later) rather than 500 (our bug). Drizzle wraps driver errors, so the cause chain is walked.
const NETWORK_CODES = new Set(["ECONNREFUSED", "ECONNRESET", "ETIMEDOUT", "EHOSTUNREACH", "ENOTFOUND", "EPIPE", "EAI_AGAIN"]);
// SQLSTATE classes 08 (connection exception), 57P0x (shutdown), 53300 (too many connections).
const UNAVAILABLE_SQLSTATE = /^(08...|57P0[1-4]|53300)$/;

export function isDatabaseUnavailable(err: unknown): boolean {
  for (let e: unknown = err, depth = 0; e && depth < 6; depth++) {
    if (typeof e !== "object") return false;
    const o = e as { code?: unknown; message?: unknown; cause?: unknown };
    if (typeof o.code === "string" && (NETWORK_CODES.has(o.code) || UNAVAILABLE_SQLSTATE.test(o.code))) return true;
    if (typeof o.message === "string" && /timeout exceeded when trying to connect|Connection terminated/i.test(o.message)) return true;
    e = o.cause;
  }
  return false;
}

/**
 * The driver's own words for a database failure (innermost cause: code and message), for the server log.
 * Drizzle's wrapper message repeats the query and its parameters, which include key hashes; those stay out.
 */
export function describeDatabaseError(err: unknown): string {
  let inner: unknown = err;
  for (let depth = 0; depth < 6 && inner && typeof inner === "object" && (inner as { cause?: unknown }).cause; depth++) {
    inner = (inner as { cause?: unknown }).cause;
  }
  if (inner && typeof inner === "object") {
    const o = inner as { code?: unknown; message?: unknown };
    return [typeof o.code === "string" ? o.code : "", typeof o.message === "string" ? o.message : ""].filter(Boolean).join(" ") || "unknown error";
  }
  return String(inner);
}
