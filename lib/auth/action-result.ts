import { ZodError } from "zod";
import { isKnownError } from "./errors";

// What a server action returns to its form: data, or a message (and the field it belongs to) the form
// can show next to the input. Unexpected errors are logged and reported without internals.
export type ActionResult<T> = { ok: true; data: T } | { ok: false; error: string; field?: string };

export async function runAction<T>(fn: () => Promise<T>): Promise<ActionResult<T>> {
  try {
    return { ok: true, data: await fn() };
  } catch (err) {
    if (isKnownError(err)) return { ok: false, error: err.message, field: "field" in err ? err.field : undefined };
    if (err instanceof ZodError) {
      const first = err.issues[0];
      return { ok: false, error: first?.message ?? "Invalid input.", field: first?.path.map(String).join(".") || undefined };
    }
    // Let Next.js redirects and 403 interrupts through.
    if (err && typeof err === "object" && "digest" in err) throw err;
    console.error("[action]", err);
    return { ok: false, error: "Something went wrong on our side. Nothing was changed; try again." };
  }
}
