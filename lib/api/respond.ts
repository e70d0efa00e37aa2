// Success responses: the body is parsed through its public schema on the way out, so a column added to
// a table can never leak into the API by accident.
import type { z } from "zod";

export function json<S extends z.ZodType>(schema: S, body: z.input<S>, init: { status?: number; headers?: Record<string, string> } = {}): Response {
  return Response.json(schema.parse(body), { status: init.status ?? 200, headers: init.headers });
}
