"use client";
import { flexRender, getCoreRowModel, useReactTable, type ColumnDef, type SortingState } from "@tanstack/react-table";
import { cn } from "./cn";

// A dense table over @tanstack/react-table. Sorting and paging happen on the server, so the table only
// reports what the user asked for (manualSorting) and renders the rows it is given.
export function DataTable<T>({
  columns,
  data,
  sorting,
  onSortingChange,
  onRowClick,
  selectedRowId,
  getRowId,
  caption,
}: {
  columns: ColumnDef<T, any>[];
  data: T[];
  sorting?: SortingState;
  onSortingChange?: (s: SortingState) => void;
  onRowClick?: (row: T) => void;
  selectedRowId?: string | null;
  getRowId?: (row: T) => string;
  caption: string;
}) {
  const table = useReactTable({
    data,
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    enableSortingRemoval: false,
    state: { sorting: sorting ?? [] },
    onSortingChange: (u) => onSortingChange?.(typeof u === "function" ? u(sorting ?? []) : u),
    getRowId,
  });
  return (
    // `relative` keeps visually hidden (absolutely positioned) header labels inside the scroll box.
    <div className="relative overflow-x-auto rounded-md border border-ink-100 bg-white">
      <table className="min-w-full text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-ink-50 text-xs uppercase tracking-wide text-ink-600">
          {table.getHeaderGroups().map((hg) => (
            <tr key={hg.id}>
              {hg.headers.map((h) => {
                const sortable = h.column.getCanSort() && !!onSortingChange;
                const dir = h.column.getIsSorted();
                return (
                  <th
                    key={h.id}
                    scope="col"
                    aria-sort={dir === "asc" ? "ascending" : dir === "desc" ? "descending" : undefined}
                    className="whitespace-nowrap px-3 py-2 font-medium"
                  >
                    {sortable ? (
                      <button type="button" onClick={h.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 uppercase hover:text-ink-900">
                        {flexRender(h.column.columnDef.header, h.getContext())}
                        <span aria-hidden>{dir === "asc" ? "▲" : dir === "desc" ? "▼" : "↕"}</span>
                      </button>
                    ) : (
                      flexRender(h.column.columnDef.header, h.getContext())
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody className="divide-y divide-ink-100">
          {table.getRowModel().rows.map((row) => (
            <tr
              key={row.id}
              onClick={onRowClick ? () => onRowClick(row.original) : undefined}
              onKeyDown={onRowClick ? (e) => { if (e.key === "Enter" || e.key === " ") { e.preventDefault(); onRowClick(row.original); } } : undefined}
              tabIndex={onRowClick ? 0 : undefined}
              aria-current={onRowClick && selectedRowId === row.id ? "true" : undefined}
              className={cn(onRowClick && "cursor-pointer hover:bg-lumen-50 focus:bg-lumen-50", selectedRowId === row.id && "bg-lumen-50")}
            >
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-3 py-1.5 align-middle text-ink-800">
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
