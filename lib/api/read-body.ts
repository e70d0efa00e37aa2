// Reads a JSON request body with a size cap, telling "not JSON" (400) apart from "wrong JSON" (422).
import type { z } from "zod";
import { ApiError, fieldErrorsFromIssues } from "./problem";

export const DEFAULT_MAX_BODY_BYTES = 1024 * 1024;

function isJsonMediaType(contentType: string | null): boolean {
  if (!contentType) return false;
  const type = contentType.split(";")[0].trim().toLowerCase();
  return type === "application/json" || /^application\/[a-z0-9.+-]+\+json$/.test(type);
}

/** The raw body text, or "" when there is none. Throws 415 for a body that is not declared JSON, 413 past the cap. */
export async function readBodyText(req: Request, maxBytes: number): Promise<string> {
  const declared = req.headers.get("content-length");
  if (declared && Number(declared) > maxBytes) {
    throw new ApiError("payload_too_large", `The body is ${declared} bytes; the limit for this route is ${maxBytes} bytes.`);
  }
  if (!req.body) return "";
  // With a declared length, HTTP framing guarantees the body is exactly that long: read it in one go.
  if (declared !== null && /^\d+$/.test(declared)) {
    const bytes = new Uint8Array(await req.arrayBuffer());
    if (bytes.byteLength > maxBytes) throw new ApiError("payload_too_large", `The body exceeds the limit of ${maxBytes} bytes for this route.`);
    return decodeJson(bytes, req.headers.get("content-type"));
  }
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > maxBytes) {
      await reader.cancel().catch(() => undefined);
      throw new ApiError("payload_too_large", `The body exceeds the limit of ${maxBytes} bytes for this route.`);
    }
    chunks.push(value);
  }
  return decodeJson(Buffer.concat(chunks), req.headers.get("content-type"));
}

function decodeJson(bytes: Uint8Array, contentType: string | null): string {
  if (bytes.byteLength === 0) return "";
  if (!isJsonMediaType(contentType)) {
    throw new ApiError("unsupported_media_type", "Send the body as JSON with `Content-Type: application/json`.");
  }
  return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength).toString("utf8");
}

export function parseJsonText(text: string): unknown {
  if (text.trim() === "") throw new ApiError("bad_request", "The request body is empty; a JSON object was expected.");
  try {
    return JSON.parse(text);
  } catch {
    throw new ApiError("bad_request", "The request body is not valid JSON.");
  }
}

export function validate<S extends z.ZodType>(schema: S, value: unknown, base: readonly PropertyKey[] = []): z.output<S> {
  const r = schema.safeParse(value);
  if (r.success) return r.data;
  const errors = fieldErrorsFromIssues(r.error.issues, base);
  throw new ApiError("validation_failed", `${errors.length} field${errors.length === 1 ? " is" : "s are"} invalid.`, { errors });
}
