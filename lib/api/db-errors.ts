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
