"use client";
import { useState } from "react";
import { Input } from "@/components/ui/field";
import { EmptyState, ErrorState, Spinner } from "@/components/ui/states";
import { useMailbox } from "@/lib/swr/hooks";
import { formatDateTime } from "../format";

// Links in a message are made clickable so invitations and resets can be followed from here.
function Linkified({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/\S+)/g);
  return (
    <>
      {parts.map((p, i) => (/^https?:\/\//.test(p) ? <a key={i} href={p} className="break-all text-lumen-700 underline underline-offset-2">{p}</a> : <span key={i}>{p}</span>))}
    </>
  );
}

export function MailboxPanel() {
  const [to, setTo] = useState("");
  const { data, error, isLoading, mutate } = useMailbox(to.trim());
  const [openId, setOpenId] = useState<number | null>(null);
  return (
    <div className="space-y-4">
      <div className="max-w-sm">
        <Input label="Recipient contains" type="search" value={to} onChange={(e) => setTo(e.target.value)} placeholder="e.g. northmere.example" hint="The list refreshes every 5 seconds." />
      </div>
      {error && <ErrorState title="Could not read the mailbox" onRetry={() => mutate()}>{error.message}</ErrorState>}
      {isLoading ? (
        <Spinner label="Reading the mailbox" />
      ) : !data?.length ? (
        <EmptyState title="No mail yet">Invite a member or ask for a password reset; the message appears here within seconds.</EmptyState>
      ) : (
        <ul className="divide-y divide-ink-100 rounded-md border border-ink-100 bg-white">
          {data.map((m) => {
            const open = openId === m.id;
            return (
              <li key={m.id}>
                <button
                  type="button"
                  aria-expanded={open}
                  onClick={() => setOpenId(open ? null : m.id)}
                  className="grid w-full grid-cols-[1fr_auto] gap-x-4 px-4 py-2.5 text-left text-sm hover:bg-ink-50"
                >
                  <span className="font-medium text-ink-900">{m.subject || "(no subject)"}</span>
                  <span className="text-xs text-ink-600">{formatDateTime(m.receivedAt)}</span>
                  <span className="text-xs text-ink-600">to {m.to}</span>
                </button>
                {open && (
                  <pre className="whitespace-pre-wrap border-t border-ink-100 bg-ink-50 px-4 py-3 font-sans text-sm text-ink-800">
                    <Linkified text={m.body} />
                  </pre>
                )}
              </li>
            );
          })}
        </ul>
      )}
    </div>
  );
}
