import type { Permission } from "@/lib/auth/roles";

// The console's left-hand navigation. Each page adds one line here; an item shows only to roles holding
// its permission (the page itself still checks on the server).
export interface NavItem {
  href: string;
  label: string;
  permission: Permission;
  /** Shown only when the development mailbox is enabled (DEV_MAILBOX=1). */
  devOnly?: boolean;
}

export const NAV_ITEMS: NavItem[] = [
  { href: "/console", label: "Overview", permission: "overview:read" },
  { href: "/console/verdicts", label: "Verdicts", permission: "verdicts:read" },
  { href: "/console/profiles", label: "Profiles", permission: "profiles:read" },
  { href: "/console/audit", label: "Audit", permission: "verdicts:replay" },
  { href: "/console/keys", label: "API keys", permission: "keys:manage-own" },
  { href: "/console/call-log", label: "Call log", permission: "calllog:read-own" },
  { href: "/console/members", label: "Members", permission: "members:manage" },
  { href: "/console/retention", label: "Retention", permission: "retention:manage" },
  { href: "/console/mailbox", label: "Mailbox (dev)", permission: "mailbox:read", devOnly: true },
  { href: "/docs/api", label: "API reference", permission: "apidocs:read" },
];
