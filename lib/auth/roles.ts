import type { Role } from "@/db/schema";

// The one role matrix. Server actions and console routes check it on the server; the README renders it.
export const PERMISSIONS = {
  "members:manage": ["admin"],
  "retention:manage": ["admin"],
  "keys:manage-all": ["admin"],
  "keys:manage-own": ["admin", "engineer", "developer"],
  "keys:create-live": ["admin", "engineer"],
  "profiles:read": ["admin", "engineer", "auditor", "developer"],
  "profiles:edit": ["admin", "engineer"],
  "verdicts:read": ["admin", "engineer", "auditor", "developer"],
  "verdicts:replay": ["admin", "engineer", "auditor"],
  "audit:export": ["admin", "auditor"],
  "calllog:read-all": ["admin", "auditor"],
  "calllog:read-own": ["admin", "engineer", "auditor", "developer"],
  "apidocs:try": ["admin", "engineer", "developer"],
  "apidocs:read": ["admin", "engineer", "auditor", "developer"],
  "overview:read": ["admin", "engineer", "auditor", "developer"],
  // The development mailbox exists only when the local fake SMTP receiver does (DEV_MAILBOX=1).
  "mailbox:read": ["admin", "engineer", "auditor", "developer"],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

export const ROLES: readonly Role[] = ["admin", "engineer", "auditor", "developer"];

export function can(role: Role, permission: Permission): boolean {
  return (PERMISSIONS[permission] as readonly Role[]).includes(role);
}
