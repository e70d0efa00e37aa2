import { Badge } from "@/components/ui/badge";
import type { Reason } from "@/lib/grading/schema";

const ORDER = { fail: 0, marginal: 1, info: 2 } as const;

export function ReasonsTable({ reasons }: { reasons: Reason[] }) {
  const sorted = [...reasons].sort((a, b) => ORDER[a.severity] - ORDER[b.severity]);
  if (sorted.length === 0) return <p className="text-sm text-ink-600">No reasons recorded.</p>;
  return (
    <div className="overflow-x-auto rounded-md border border-ink-100 bg-white">
      <table className="min-w-full text-left text-sm">
        <caption className="sr-only">Reasons for the verdict</caption>
        <thead className="bg-ink-50 text-xs uppercase tracking-wide text-ink-600">
          <tr><th className="px-3 py-2">Severity</th><th className="px-3 py-2">Reason</th><th className="px-3 py-2">Measured / limit</th><th className="px-3 py-2">Rule and source</th></tr>
        </thead>
        <tbody className="divide-y divide-ink-100">
          {sorted.map((r, i) => (
            <tr key={i} className="align-top">
              <td className="px-3 py-2">
                <Badge tone={r.severity === "info" ? "neutral" : r.severity}>{r.severity}</Badge>
              </td>
              <td className="px-3 py-2">
                <p className="font-mono text-xs text-ink-600">{r.code}{r.wavelengthNm ? ` · ${r.wavelengthNm} nm` : ""}{r.eventIndex !== undefined ? ` · event ${r.eventIndex}` : ""}</p>
                <p className="mt-0.5 text-ink-900">{r.message}</p>
              </td>
              <td className="whitespace-nowrap px-3 py-2 tabular-nums">
                {r.measured !== undefined ? `${r.measured}` : "–"}{r.limit !== undefined ? ` / ${r.limit}` : ""}{r.unit ? ` ${r.unit}` : ""}
              </td>
              <td className="px-3 py-2 text-xs">
                <p className="font-mono text-ink-600">{r.rule}</p>
                <p className="mt-0.5 text-ink-800">{r.source}</p>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
