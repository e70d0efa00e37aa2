"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";
import { cn } from "@/components/ui/cn";

export interface SidebarLink {
  href: string;
  label: string;
}

function isActive(pathname: string, href: string) {
  return href === "/console" ? pathname === "/console" : pathname === href || pathname.startsWith(href + "/");
}

export function Sidebar({ links }: { links: SidebarLink[] }) {
  const pathname = usePathname() ?? "";
  return (
    <nav aria-label="Console" className="flex gap-1 overflow-x-auto px-2 py-2 md:flex-col md:overflow-visible md:py-4">
      {links.map((l) => {
        const active = isActive(pathname, l.href);
        return (
          <Link
            key={l.href}
            href={l.href}
            aria-current={active ? "page" : undefined}
            className={cn(
              "whitespace-nowrap rounded-md px-3 py-1.5 text-sm",
              active ? "bg-ink-800 font-medium text-white" : "text-ink-200 hover:bg-ink-800/60 hover:text-white",
            )}
          >
            {l.label}
          </Link>
        );
      })}
    </nav>
  );
}
