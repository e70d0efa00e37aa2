"use client";
// Pick two versions (or the draft, or the template it came from) and see what changed, limit by limit.
import { useId, useState } from "react";
import useSWR from "swr";
import { Spinner, EmptyState, ErrorState } from "@/components/ui/states";
import type { LimitChange } from "@/lib/profiles/diff";

async function fetchJson<T>(url: string): Promise<T> {
  const res = await fetch(url);
  if (!res.ok) throw new Error((await res.json().catch(() => null))?.detail ?? `The server answered ${res.status}`);
  return res.json() as Promise<T>;
}

function show(v: unknown): string {
  if (v === undefined) return "–";
  return typeof v === "string" ? v : JSON.stringify(v);
}

export function VersionDiff({ slug, sides, initialFrom, initialTo }: { slug: string; sides: { value: string; label: string }[]; initialFrom: string; initialTo: string }) {
  const [from, setFrom] = useState(initialFrom);
  const [to, setTo] = useState(initialTo);
  const ids = { from: useId(), to: useId() };
  const key = from && to && from !== to ? `/api/console/profiles/diff?slug=${encodeURIComponent(slug)}&from=${from}&to=${to}` : null;
  const { data, error, isLoading, mutate } = useSWR<{ changes: LimitChange[] }>(key, fetchJson);
  const select = (id: string, label: string, value: string, set: (v: string) => void) => (
    <div className="space-y-0.5">
      <label htmlFor={id} className="block text-xs font-medium text-ink-800">{label}</label>
      <select id={id} value={value} onChange={(e) => set(e.target.value)} className="rounded-md border border-ink-200 bg-white px-2 py-1.5 text-sm">
        {sides.map((s) => <option key={s.value} value={s.value}>{s.label}</option>)}
      </select>
    </div>
  );
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end gap-3">
        {select(ids.from, "From", from, setFrom)}
        {select(ids.to, "To", to, setTo)}
      </div>
      {!key && <p className="text-sm text-ink-600">Choose two different versions to compare.</p>}
      {key && isLoading && <Spinner label="Comparing" />}
      {key && error && <ErrorState title="Could not compare" onRetry={() => mutate()}>{(error as Error).message}</ErrorState>}
      {key && data && data.changes.length === 0 && <EmptyState title="No differences">These two have exactly the same limits and sources.</EmptyState>}
      {key && data && data.changes.length > 0 && (
        <div className="overflow-x-auto rounded-md border border-ink-100 bg-white">
          <table className="min-w-full text-left text-sm" aria-label="Limit changes">
            <thead className="bg-ink-50 text-xs uppercase tracking-wide text-ink-600">
              <tr><th className="px-3 py-2">Limit</th><th className="px-3 py-2">Change</th><th className="px-3 py-2">From</th><th className="px-3 py-2">To</th></tr>
            </thead>
            <tbody className="divide-y divide-ink-100">
              {data.changes.map((c) => (
                <tr key={c.path} className="align-top">
                  <td className="px-3 py-1.5 font-mono text-xs">{c.path}</td>
                  <td className="px-3 py-1.5 text-xs">{c.kind}</td>
                  <td className="max-w-md break-words px-3 py-1.5 text-xs text-verdict-fail/90">{show(c.before)}</td>
                  <td className="max-w-md break-words px-3 py-1.5 text-xs text-verdict-pass">{show(c.after)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
