import type { Permission } from "@/lib/auth/roles";

// The console's left-hand navigation. Each page adds one line here; an item shows only to roles holding
// its permission (the page itself still checks on the server).
export interface NavItem {
  href: string;
  label: string;
  permission: Permission;
}

export const NAV_ITEMS: NavItem[] = [];
