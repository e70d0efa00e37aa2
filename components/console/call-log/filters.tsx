"use client";
import { Button } from "@/components/ui/button";
import { Input, Select } from "@/components/ui/field";
import { useCallLogFacets } from "@/lib/swr/hooks";

export interface CallFilters {
  status: string;
  route: string;
  keyId: string;
  from: string;
  to: string;
}

export const EMPTY_FILTERS: CallFilters = { status: "", route: "", keyId: "", from: "", to: "" };

/** datetime-local values are local wall-clock time; the server wants an instant. */
export function toInstant(local: string): string {
  if (!local) return "";
  const d = new Date(local);
  return Number.isNaN(d.getTime()) ? "" : d.toISOString();
}

export function CallLogFilters({ value, onChange }: { value: CallFilters; onChange: (f: CallFilters) => void }) {
  const { data: facets } = useCallLogFacets();
  const set = (k: keyof CallFilters) => (e: React.ChangeEvent<HTMLInputElement | HTMLSelectElement>) => onChange({ ...value, [k]: e.target.value });
  return (
    <form role="search" aria-label="Filter calls" onSubmit={(e) => e.preventDefault()} className="grid grid-cols-2 gap-3 rounded-md border border-ink-100 bg-white p-3 md:grid-cols-3 xl:grid-cols-6">
      <Select label="Status" value={value.status} onChange={set("status")}>
        <option value="">Any</option>
        <option value="2xx">2xx success</option>
        <option value="4xx">4xx client error</option>
        <option value="5xx">5xx server error</option>
      </Select>
      <Select label="Route" value={value.route} onChange={set("route")}>
        <option value="">Any</option>
        {facets?.routes.map((r) => <option key={r} value={r}>{r}</option>)}
      </Select>
      <Select label="Key" value={value.keyId} onChange={set("keyId")}>
        <option value="">Any</option>
        {facets?.keys.map((k) => <option key={k.id} value={k.id}>{k.name} ({k.start})</option>)}
      </Select>
      <Input label="From" type="datetime-local" value={value.from} onChange={set("from")} />
      <Input label="To" type="datetime-local" value={value.to} onChange={set("to")} />
      <div className="flex items-end">
        <Button variant="secondary" className="w-full" onClick={() => onChange(EMPTY_FILTERS)}>Clear filters</Button>
      </div>
    </form>
  );
}
