import type { Role } from "@/db/schema";
import { can, type Permission } from "./roles";
import { ForbiddenError } from "./errors";

/** The signed-in person acting in one organisation; what every console lib function receives. */
export interface Member {
  userId: string;
  email: string;
  name: string;
  organisationId: string;
  organisationName: string;
  role: Role;
}

export interface ActorContext {
  actor: Member;
}

export function assertCan(actor: Member, permission: Permission): void {
  if (!can(actor.role, permission)) throw new ForbiddenError(`The ${actor.role} role may not do this (${permission}).`);
}
