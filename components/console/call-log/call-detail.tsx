"use client";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import type { CallRow } from "@/lib/calllog/query";
import { formatDateTime, formatMs } from "../format";

export function statusTone(status: number) {
  return status >= 500 ? "fail" : status >= 400 ? "marginal" : "pass";
}

export function CallDetail({ call, onClose }: { call: CallRow; onClose: () => void }) {
  const rows: [string, React.ReactNode][] = [
    ["Time", formatDateTime(call.createdAt)],
    ["Request", <code key="r" className="break-all text-xs">{call.method} {call.path}</code>],
    ["Route", <code key="rt" className="text-xs">{call.route}</code>],
    ["Status", <Badge key="s" tone={statusTone(call.status)}>{call.status}</Badge>],
    ["Latency", formatMs(call.latencyMs)],
    ["Request id", <code key="id" className="break-all text-xs" data-testid="call-request-id">{call.requestId}</code>],
    ["Key", call.keyName ? `${call.keyName} (${call.keyStart})` : "—"],
    ["Console user", call.userName ?? "—"],
    ["Verdict", call.verdictId ? <code key="v" className="break-all text-xs">{call.verdictId}</code> : "—"],
    ["Problem type", call.problemType ? <code key="p" className="break-all text-xs">{call.problemType}</code> : "—"],
  ];
  return (
    <aside aria-label="Call detail" className="rounded-md border border-ink-100 bg-white p-4">
      <div className="flex items-start justify-between gap-2">
        <h2 className="text-sm font-semibold text-ink-900">Call detail</h2>
        <Button variant="ghost" size="sm" onClick={onClose}>Close</Button>
      </div>
      <dl className="mt-3 grid grid-cols-[7rem_1fr] gap-x-3 gap-y-2 text-sm">
        {rows.map(([k, v]) => (
          <div key={k} className="contents">
            <dt className="text-ink-600">{k}</dt>
            <dd className="min-w-0 text-ink-900">{v}</dd>
          </div>
        ))}
      </dl>
      <p className="mt-4 text-xs text-ink-600">Quote the request id when you report a problem; it joins this row to the server logs.</p>
    </aside>
  );
}
