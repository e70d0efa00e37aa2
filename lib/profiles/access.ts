// Who is acting, and the typed refusals lib/profiles and lib/audit throw. The error classes are the
// console's own (lib/auth/errors.ts), so server actions and console routes map them in one place.
import type { Member } from "@/lib/auth/context";
import { ForbiddenError, InputError, NotFoundError as AuthNotFoundError, type FieldIssue } from "@/lib/auth/errors";
import { can, type Permission } from "@/lib/auth/roles";

/** The part of a signed-in member these functions need; tests build it directly. */
export type Actor = Pick<Member, "userId" | "organisationId" | "role">;

export { ForbiddenError };

export class NotFoundError extends AuthNotFoundError {
  constructor(what: string) {
    super(`${what} not found`);
  }
}

/** A request that is well-formed but cannot apply to the current state (e.g. publishing without a draft). */
export class ConflictError extends InputError {
  readonly conflict = true;
  constructor(message: string) {
    super(message);
    this.name = "ConflictError";
  }
}

export type { FieldIssue };

export class InvalidInputError extends InputError {
  constructor(issues: FieldIssue[]) {
    super(issues.map((i) => (i.path ? `${i.path}: ${i.message}` : i.message)).join("; "), issues[0]?.path || undefined, issues);
    this.name = "InvalidInputError";
  }

  /** The same refusal with every path placed under `prefix`, for a route whose body nests the object. */
  within(prefix: string): InvalidInputError {
    return new InvalidInputError(this.issues.map((i) => ({ path: i.path ? `${prefix}.${i.path}` : prefix, message: i.message })));
  }
}

export function authorise(actor: Actor, permission: Permission): void {
  if (!can(actor.role, permission)) throw new ForbiddenError(`The ${actor.role} role may not do this (needs ${permission}).`);
}
