"use client";
// The verdicts table: filters kept in the URL (so a filtered view can be shared or bookmarked), fetched
// with SWR from the console route, paged by cursor on the chain position.
import type { ColumnDef } from "@tanstack/react-table";
import Link from "next/link";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useId, useMemo, useState } from "react";
import useSWR from "swr";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { DataTable } from "@/components/ui/data-table";
import { EmptyState, ErrorState, Spinner } from "@/components/ui/states";
import type { ExplorerRow } from "@/db/queries/verdict-explorer";

// The route sends ExplorerRow with its time as an ISO string.
type Row = Omit<ExplorerRow, "createdAt"> & { createdAt: string };
interface Page {
  data: Row[];
  nextCursor: number | null;
  facets?: { reasonCodes: string[]; profiles: string[] };
}

const FILTERS = ["verdict", "profile", "linkRef", "reasonCode", "from", "to"] as const;

async function fetchPage(url: string): Promise<Page> {
  const res = await fetch(url);
  if (!res.ok) {
    const p = await res.json().catch(() => null);
    throw new Error(p?.errors?.map((e: { pointer: string; message: string }) => `${e.pointer.slice(1)}: ${e.message}`).join("; ") || p?.detail || `The server answered ${res.status}`);
  }
  return res.json();
}

const columns: ColumnDef<Row>[] = [
  { header: "Link", accessorKey: "linkRef", cell: (c) => <Link href={`/console/verdicts/${c.row.original.id}`} className="font-medium text-lumen-700 underline-offset-2 hover:underline">{c.row.original.linkRef}</Link> },
  { header: "Verdict", accessorKey: "verdict", cell: (c) => <Badge tone={c.row.original.verdict}>{c.row.original.verdict}</Badge> },
  { header: "Headroom", accessorKey: "headroomDb", cell: (c) => <span className="tabular-nums">{c.row.original.headroomDb === null ? "–" : `${c.row.original.headroomDb.toFixed(2)} dB`}</span> },
  { header: "Profile", id: "profile", cell: (c) => <span className="font-mono text-xs">{c.row.original.profileSlug}@{c.row.original.profileVersion}</span> },
  { header: "Reasons", id: "reasons", cell: (c) => <span className="font-mono text-xs">{c.row.original.reasonCodes.filter((r) => !r.endsWith("within-budget")).slice(0, 3).join(", ")}{c.row.original.reasonCodes.length > 3 ? " …" : ""}</span> },
  { header: "Graded (UTC)", accessorKey: "createdAt", cell: (c) => <span className="tabular-nums">{c.row.original.createdAt.replace("T", " ").slice(0, 19)}</span> },
  { header: "Seq", accessorKey: "seq", cell: (c) => <span className="tabular-nums text-ink-600">{c.row.original.seq}</span> },
];

function toLocalInput(iso: string | null): string {
  if (!iso) return "";
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? "" : new Date(d.getTime() - d.getTimezoneOffset() * 60_000).toISOString().slice(0, 16);
}

export function VerdictTable() {
  const params = useSearchParams();
  const router = useRouter();
  const pathname = usePathname();
  const [cursors, setCursors] = useState<(number | null)[]>([null]);
  const cursor = cursors[cursors.length - 1];
  const query = useMemo(() => {
    const q = new URLSearchParams();
    for (const f of FILTERS) {
      const v = params.get(f);
      if (v) q.set(f, v);
    }
    return q;
  }, [params]);
  const url = `/api/console/verdicts?${query.toString()}&facets=1&limit=50${cursor ? `&cursor=${cursor}` : ""}`;
  const { data, error, isLoading, mutate } = useSWR<Page>(url, fetchPage, { keepPreviousData: true });
  const [facets, setFacets] = useState<Page["facets"]>();
  if (data?.facets && !facets) setFacets(data.facets);
  const ids = { verdict: useId(), profile: useId(), link: useId(), reason: useId(), from: useId(), to: useId() };

  const apply = (form: FormData) => {
    const q = new URLSearchParams();
    for (const f of FILTERS) {
      let v = String(form.get(f) ?? "").trim();
      if (v && (f === "from" || f === "to")) v = new Date(v).toISOString();
      if (v) q.set(f, v);
    }
    setCursors([null]);
    router.replace(`${pathname}?${q.toString()}`);
  };

  const control = "rounded-md border border-ink-200 bg-white px-2 py-1.5 text-sm";
  return (
    <div className="space-y-4">
      <form
        key={query.toString()}
        aria-label="Filter verdicts"
        className="flex flex-wrap items-end gap-3 rounded-md border border-ink-100 bg-white p-3"
        onSubmit={(e) => {
          e.preventDefault();
          apply(new FormData(e.currentTarget));
        }}
      >
        <div className="space-y-0.5">
          <label htmlFor={ids.verdict} className="block text-xs font-medium text-ink-800">Verdict</label>
          <select id={ids.verdict} name="verdict" defaultValue={params.get("verdict") ?? ""} className={control}>
            <option value="">Any</option><option value="pass">pass</option><option value="marginal">marginal</option><option value="fail">fail</option>
          </select>
        </div>
        <div className="space-y-0.5">
          <label htmlFor={ids.profile} className="block text-xs font-medium text-ink-800">Profile</label>
          <select id={ids.profile} name="profile" defaultValue={params.get("profile") ?? ""} className={control}>
            <option value="">Any</option>
            {[...new Set([...(facets?.profiles ?? []), ...(params.get("profile") ? [params.get("profile")!] : [])])].map((p) => <option key={p} value={p}>{p}</option>)}
          </select>
        </div>
        <div className="space-y-0.5">
          <label htmlFor={ids.link} className="block text-xs font-medium text-ink-800">Link ref starts with</label>
          <input id={ids.link} name="linkRef" defaultValue={params.get("linkRef") ?? ""} className={control} />
        </div>
        <div className="space-y-0.5">
          <label htmlFor={ids.reason} className="block text-xs font-medium text-ink-800">Reason code</label>
          <select id={ids.reason} name="reasonCode" defaultValue={params.get("reasonCode") ?? ""} className={control}>
            <option value="">Any</option>
            {(facets?.reasonCodes ?? []).map((c) => <option key={c} value={c}>{c}</option>)}
          </select>
        </div>
        <div className="space-y-0.5">
          <label htmlFor={ids.from} className="block text-xs font-medium text-ink-800">From</label>
          <input id={ids.from} name="from" type="datetime-local" defaultValue={toLocalInput(params.get("from"))} className={control} />
        </div>
        <div className="space-y-0.5">
          <label htmlFor={ids.to} className="block text-xs font-medium text-ink-800">To</label>
          <input id={ids.to} name="to" type="datetime-local" defaultValue={toLocalInput(params.get("to"))} className={control} />
        </div>
        <Button type="submit">Apply</Button>
        <Button variant="ghost" onClick={() => { setCursors([null]); router.replace(pathname); }}>Clear</Button>
      </form>

      {error && <ErrorState title="Could not load verdicts" onRetry={() => mutate()}>{(error as Error).message}</ErrorState>}
      {isLoading && !data && <Spinner label="Loading verdicts" />}
      {data && data.data.length === 0 && (
        <EmptyState title={query.toString() ? "No verdicts match these filters" : "No verdicts yet"}>
          {query.toString() ? "Widen the filters or clear them." : "Verdicts appear here as your systems grade tests through the API."}
        </EmptyState>
      )}
      {data && data.data.length > 0 && (
        <>
          <DataTable caption="Verdicts, newest first" columns={columns} data={data.data} getRowId={(r) => r.id} />
          <nav aria-label="Pages" className="flex items-center gap-2">
            <Button variant="secondary" size="sm" disabled={cursors.length === 1} onClick={() => setCursors((c) => c.slice(0, -1))}>Newer</Button>
            <Button variant="secondary" size="sm" disabled={data.nextCursor === null} onClick={() => setCursors((c) => [...c, data.nextCursor])}>Older</Button>
            <span className="text-xs text-ink-600">Page {cursors.length}</span>
          </nav>
        </>
      )}
    </div>
  );
}
