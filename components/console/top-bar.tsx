"use client";
import { signOut } from "next-auth/react";
import { useTransition } from "react";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";

export interface TopBarProps {
  name: string;
  email: string;
  role: string;
  organisationId: string;
  organisations: { id: string; name: string }[];
  switchOrganisation: (organisationId: string) => Promise<void>;
}

export function TopBar({ name, email, role, organisationId, organisations, switchOrganisation }: TopBarProps) {
  const [pending, start] = useTransition();
  const current = organisations.find((o) => o.id === organisationId);
  return (
    <header className="flex flex-wrap items-center justify-between gap-3 border-b border-ink-100 bg-white px-5 py-2.5">
      <div className="flex items-center gap-2 text-sm">
        <span className="sr-only">Organisation</span>
        {organisations.length > 1 ? (
          <label className="flex items-center gap-2">
            <span className="text-ink-600">Organisation</span>
            <select
              value={organisationId}
              disabled={pending}
              onChange={(e) => start(() => switchOrganisation(e.target.value))}
              className="rounded-md border border-ink-200 bg-white px-2 py-1 text-sm font-medium text-ink-900"
            >
              {organisations.map((o) => (
                <option key={o.id} value={o.id}>{o.name}</option>
              ))}
            </select>
          </label>
        ) : (
          <span data-testid="org-name" className="font-semibold text-ink-900">{current?.name}</span>
        )}
      </div>
      <div className="flex items-center gap-3 text-sm">
        <span className="hidden text-right sm:block">
          <span className="block font-medium leading-tight text-ink-900">{name}</span>
          <span className="block text-xs leading-tight text-ink-600">{email}</span>
        </span>
        <Badge tone="accent" className="capitalize">
          <span data-testid="role">{role}</span>
        </Badge>
        <Button variant="secondary" size="sm" onClick={() => signOut({ callbackUrl: "/sign-in?signedOut=1" })}>
          Sign out
        </Button>
      </div>
    </header>
  );
}
