import Link from "next/link";
import type { ReactNode } from "react";
import { NAV_ITEMS } from "@/components/console/nav-items";
import { Sidebar } from "@/components/console/sidebar";
import { TopBar } from "@/components/console/top-bar";
import { listMembershipsOf } from "@/lib/auth/memberships";
import { can } from "@/lib/auth/roles";
import { requireMember } from "@/lib/auth/session";
import { devMailboxEnabled } from "@/lib/mail/config";
import { switchOrganisation } from "./actions";

// Every console page renders inside this shell. The sidebar shows only what the role may use; each page
// still checks its own permission on the server.
export const dynamic = "force-dynamic";

export default async function ConsoleLayout({ children }: { children: ReactNode }) {
  const m = await requireMember();
  const memberships = await listMembershipsOf(m.userId);
  const mailbox = devMailboxEnabled();
  const links = NAV_ITEMS.filter((i) => can(m.role, i.permission) && (!i.devOnly || mailbox)).map(({ href, label }) => ({ href, label }));
  return (
    <div className="min-h-screen md:grid md:grid-cols-[13rem_1fr]">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-white focus:px-3 focus:py-2">
        Skip to content
      </a>
      <aside className="bg-ink-900 md:min-h-screen">
        <Link href="/console" className="flex items-center gap-2 px-5 pt-4 text-base font-semibold tracking-tight text-white">
          <span aria-hidden className="inline-block h-2.5 w-2.5 rotate-45 rounded-sm bg-lumen-500" />
          Glassgrade
        </Link>
        <Sidebar links={links} />
      </aside>
      <div className="min-w-0">
        <TopBar
          name={m.name}
          email={m.email}
          role={m.role}
          organisationId={m.organisationId}
          organisations={memberships.map((x) => ({ id: x.organisationId, name: x.organisationName }))}
          switchOrganisation={switchOrganisation}
        />
        <main id="main" className="px-5 py-5 lg:px-8">{children}</main>
      </div>
    </div>
  );
}
