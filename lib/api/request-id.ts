import { randomUUID } from "node:crypto";

// A caller's own X-Request-Id is kept when it looks like an id (so its logs and ours join up); anything
// else is replaced, so log lines cannot be forged or stuffed through this header.
const ACCEPTABLE = /^[A-Za-z0-9._:-]{8,80}$/;

export function requestIdFor(req: Request): string {
  const given = req.headers.get("x-request-id");
  if (given && ACCEPTABLE.test(given)) return given;
  // randomUUID draws from a buffered pool; randomBytes costs a system call on every request.
  return "req_" + Buffer.from(randomUUID().replace(/-/g, ""), "hex").subarray(4, 16).toString("base64url");
}
