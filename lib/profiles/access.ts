import type { Role } from "@/db/schema";
import { can, type Permission } from "@/lib/auth/roles";

// Who is acting. Console pages build it from the session; tests build it directly. Every lib function
// that changes or reveals organisation data takes one and checks it before touching the database.
export interface Actor {
  userId: string;
  organisationId: string;
  role: Role;
}

export class ForbiddenError extends Error {
  readonly code = "forbidden" as const;
  constructor(readonly permission: Permission, role: Role) {
    super(`The ${role} role may not do this (needs ${permission})`);
    this.name = "ForbiddenError";
  }
}

export class NotFoundError extends Error {
  readonly code = "not_found" as const;
  constructor(what: string) {
    super(`${what} not found`);
    this.name = "NotFoundError";
  }
}

export class ConflictError extends Error {
  readonly code = "conflict" as const;
  constructor(message: string) {
    super(message);
    this.name = "ConflictError";
  }
}

export interface FieldIssue {
  /** Dotted path of the field inside the submitted object, "" for the whole object. */
  path: string;
  message: string;
}

export class InvalidInputError extends Error {
  readonly code = "validation_failed" as const;
  constructor(readonly issues: FieldIssue[]) {
    super(issues.map((i) => (i.path ? `${i.path}: ${i.message}` : i.message)).join("; "));
    this.name = "InvalidInputError";
  }
}

export function authorise(actor: Actor, permission: Permission): void {
  if (!can(actor.role, permission)) throw new ForbiddenError(permission, actor.role);
}
