"use client";
import { createColumnHelper, type SortingState } from "@tanstack/react-table";
import { useMemo, useState } from "react";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { DataTable } from "@/components/ui/data-table";
import { EmptyState, ErrorState, Spinner } from "@/components/ui/states";
import type { CallRow } from "@/lib/calllog/query";
import { useCallLog } from "@/lib/swr/hooks";
import { formatDateTime, formatMs } from "../format";
import { CallDetail, statusTone } from "./call-detail";
import { CallLogFilters, EMPTY_FILTERS, toInstant, type CallFilters } from "./filters";

const col = createColumnHelper<CallRow>();

const columns = [
  col.accessor("createdAt", { header: "Time", cell: (c) => formatDateTime(c.getValue()) }),
  col.accessor("method", { header: "Method", enableSorting: false, cell: (c) => <code className="text-xs">{c.getValue()}</code> }),
  col.accessor("route", { header: "Route", cell: (c) => <code className="text-xs">{c.getValue()}</code> }),
  col.accessor("status", { header: "Status", cell: (c) => <Badge tone={statusTone(c.getValue())}>{c.getValue()}</Badge> }),
  col.accessor("latencyMs", { header: "Latency", cell: (c) => <span className="tabular-nums">{formatMs(c.getValue())}</span> }),
  col.accessor("keyName", { header: "Key or user", enableSorting: false, cell: (c) => c.getValue() ?? c.row.original.userName ?? "—" }),
];

function queryString(f: CallFilters, sorting: SortingState): string {
  const p = new URLSearchParams();
  if (f.status) p.set("status", f.status);
  if (f.route) p.set("route", f.route);
  if (f.keyId) p.set("keyId", f.keyId);
  if (f.from && toInstant(f.from)) p.set("from", toInstant(f.from));
  if (f.to && toInstant(f.to)) p.set("to", toInstant(f.to));
  const s = sorting[0];
  if (s) {
    p.set("sort", s.id);
    p.set("dir", s.desc ? "desc" : "asc");
  }
  return p.toString();
}

export function CallLogPanel() {
  const [filters, setFilters] = useState<CallFilters>(EMPTY_FILTERS);
  const [sorting, setSorting] = useState<SortingState>([{ id: "createdAt", desc: true }]);
  const [live, setLive] = useState(true);
  const [selected, setSelected] = useState<CallRow | null>(null);
  const qs = useMemo(() => queryString(filters, sorting), [filters, sorting]);
  const { data, error, size, setSize, isLoading, isValidating, mutate } = useCallLog(qs, live ? 10_000 : 0);
  const rows = useMemo(() => data?.flatMap((p) => p.items) ?? [], [data]);
  const hasMore = !!data?.[data.length - 1]?.nextCursor;
  const loadingMore = isValidating && size > (data?.length ?? 0);

  return (
    <div className="space-y-4">
      <CallLogFilters value={filters} onChange={(f) => { setFilters(f); setSelected(null); }} />
      <div className="flex flex-wrap items-center justify-between gap-2 text-sm">
        <p className="text-ink-600" aria-live="polite">
          {isLoading ? "Loading…" : `${rows.length}${hasMore ? "+" : ""} call${rows.length === 1 ? "" : "s"} shown`}
        </p>
        <div className="flex items-center gap-2">
          <label className="flex items-center gap-1.5 text-ink-600">
            <input type="checkbox" checked={live} onChange={(e) => setLive(e.target.checked)} className="h-4 w-4" />
            Refresh every 10 s
          </label>
          <Button variant="secondary" size="sm" busy={isValidating && !loadingMore} onClick={() => mutate()}>Refresh</Button>
          <a
            href={`/api/console/call-log/export?${qs}`}
            className="rounded-md border border-ink-200 bg-white px-2.5 py-1 text-xs font-medium text-ink-800 hover:bg-ink-50"
            download
          >
            Export CSV
          </a>
        </div>
      </div>
      {error && <ErrorState title="Could not load the call log" onRetry={() => mutate()}>{error.message}</ErrorState>}
      {isLoading ? (
        <Spinner label="Loading calls" />
      ) : rows.length === 0 && !error ? (
        <EmptyState title={qs.replace(/(^|&)(sort|dir)=[^&]*/g, "") ? "No calls match these filters" : "No calls yet"}>
          Calls appear here a moment after a system uses one of your keys. Try the API reference with a sandbox key.
        </EmptyState>
      ) : (
        <div className="grid gap-4 xl:grid-cols-[1fr_22rem]">
          <div className="min-w-0 space-y-3">
            <DataTable
              caption="API calls"
              columns={columns}
              data={rows}
              sorting={sorting}
              onSortingChange={(s) => { setSorting(s); setSelected(null); }}
              getRowId={(r) => String(r.id)}
              selectedRowId={selected ? String(selected.id) : null}
              onRowClick={setSelected}
            />
            {hasMore && (
              <Button variant="secondary" busy={loadingMore} onClick={() => setSize(size + 1)}>Load more</Button>
            )}
          </div>
          {selected ? (
            <CallDetail call={selected} onClose={() => setSelected(null)} />
          ) : (
            <p className="hidden text-sm text-ink-600 xl:block">Select a call to see its details.</p>
          )}
        </div>
      )}
    </div>
  );
}
