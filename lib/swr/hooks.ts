"use client";
import useSWR from "swr";
import useSWRInfinite from "swr/infinite";
import type { CallPage } from "@/lib/calllog/query";
import type { KeySummary } from "@/lib/keys/manage";
import type { MailboxMessage } from "@/lib/mail/mailbox";
import type { MemberRow, PendingInvitation } from "@/lib/members/members";
import { fetchJson } from "./fetcher";

// One hook per console resource, each against its app/api/console route.

export function useKeys(fallback?: KeySummary[]) {
  return useSWR<KeySummary[]>("/api/console/keys", fetchJson, { fallbackData: fallback });
}

export function useMembers(fallback?: { members: MemberRow[]; invitations: PendingInvitation[] }) {
  return useSWR<{ members: MemberRow[]; invitations: PendingInvitation[] }>("/api/console/members", fetchJson, { fallbackData: fallback });
}

export function useMailbox(to: string) {
  const q = to ? `?to=${encodeURIComponent(to)}` : "";
  return useSWR<MailboxMessage[]>(`/api/console/mailbox${q}`, fetchJson, { refreshInterval: 5000 });
}

export function useCallLogFacets() {
  return useSWR<{ routes: string[]; keys: { id: string; name: string; start: string }[] }>("/api/console/call-log/facets", fetchJson);
}

/** Cursor-paged call log for a query string of filters; `refreshInterval` keeps the first page live. */
export function useCallLog(query: string, refreshMs: number) {
  return useSWRInfinite<CallPage>(
    (index, prev: CallPage | null) => {
      if (prev && !prev.nextCursor) return null;
      const cursor = index === 0 || !prev ? "" : `&cursor=${encodeURIComponent(prev.nextCursor!)}`;
      return `/api/console/call-log?${query}${cursor}`;
    },
    fetchJson,
    { refreshInterval: refreshMs, revalidateFirstPage: true },
  );
}
