import { ZodError } from "zod";
import { fieldErrorsFromIssues, jsonPointer, problemResponse } from "@/lib/api/problem";
import type { Member } from "./context";
import { ForbiddenError, InputError, NotFoundError } from "./errors";
import { getMember } from "./session";

type Handler = (ctx: { member: Member; req: Request; url: URL }) => Promise<Response>;

/**
 * The only way to export a console JSON route: it authenticates the session, hands the member to the
 * handler and turns our typed errors into problem+json, so no route can forget one of those steps.
 */
export function withConsoleSession(handler: Handler) {
  return async function route(req: Request): Promise<Response> {
    const url = new URL(req.url);
    const member = await getMember();
    if (!member) return problemResponse("unauthorized", "Sign in to the console first.", { instance: url.pathname });
    try {
      return await handler({ member, req, url });
    } catch (err) {
      if (err instanceof ForbiddenError) return problemResponse("forbidden", err.message, { instance: url.pathname });
      if (err instanceof NotFoundError) return problemResponse("not_found", err.message, { instance: url.pathname });
      if (err instanceof InputError) {
        const errors = err.issues.map((i) => ({ pointer: i.path ? jsonPointer(i.path.split(".")) : "", message: i.message }));
        return problemResponse("validation_failed", err.message, { instance: url.pathname, errors });
      }
      if (err instanceof ZodError) {
        return problemResponse("validation_failed", "Some filters are not valid.", { instance: url.pathname, errors: fieldErrorsFromIssues(err.issues) });
      }
      console.error("[console-route]", url.pathname, err);
      return problemResponse("internal_error", "Something went wrong on our side.", { instance: url.pathname });
    }
  };
}
