"use client";
// Impact preview: re-grades stored tests under the limits in the editor (saved or not) and shows how
// verdicts would move. The server streams progress; the matrix and the changed links arrive at the end.
import Link from "next/link";
import { useId, useState } from "react";
import { ProgressBar } from "@/components/audit/progress-bar";
import { useNdjsonJob } from "@/components/audit/use-ndjson-job";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { EmptyState, ErrorState } from "@/components/ui/states";
import type { PreviewSummary } from "@/lib/profiles/impact-preview";

const VERDICTS = ["pass", "marginal", "fail"] as const;
const pickSummary = (ev: Record<string, unknown>) => (ev.type === "result" ? (ev.summary as PreviewSummary) : undefined);

function localToIso(v: string): string | undefined {
  return v ? new Date(v).toISOString() : undefined;
}

export function TransitionMatrix({ summary }: { summary: PreviewSummary }) {
  return (
    <table className="text-sm" aria-label="Verdicts now (rows) against verdicts under the draft (columns)">
      <thead>
        <tr>
          <th className="p-2 text-left text-xs font-medium text-ink-600">now ↓ / draft →</th>
          {VERDICTS.map((v) => <th key={v} scope="col" className="p-2"><Badge tone={v}>{v}</Badge></th>)}
        </tr>
      </thead>
      <tbody>
        {VERDICTS.map((from) => (
          <tr key={from}>
            <th scope="row" className="p-2 text-left"><Badge tone={from}>{from}</Badge></th>
            {VERDICTS.map((to) => {
              const n = summary.matrix[from][to];
              return (
                <td key={to} data-from={from} data-to={to} className={`p-2 text-right tabular-nums ${from !== to && n > 0 ? "font-semibold text-ink-900" : "text-ink-600"}`}>
                  {n.toLocaleString("en-GB")}
                </td>
              );
            })}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export function ImpactPreview({ slug, currentLimits, dirty }: { slug: string; currentLimits: () => unknown; dirty: boolean }) {
  const { state, start, cancel } = useNdjsonJob<PreviewSummary>("/api/console/profiles/preview", pickSummary);
  const [limit, setLimit] = useState("1000");
  const [scope, setScope] = useState<"related" | "all">("related");
  const [from, setFrom] = useState("");
  const [to, setTo] = useState("");
  const ids = { limit: useId(), from: useId(), to: useId(), scope: useId() };

  const run = () => start({ slug, limits: currentLimits(), scope, limit: limit === "all" ? "all" : Number(limit), from: localToIso(from), to: localToIso(to) });

  return (
    <section aria-labelledby="preview-title" className="mt-6 space-y-4 rounded-lg border border-ink-100 bg-white p-4">
      <div>
        <h2 id="preview-title" className="text-base font-semibold text-ink-900">Impact preview</h2>
        <p className="mt-0.5 text-sm text-ink-600">
          Re-grade your organisation&apos;s stored tests under the limits above{dirty ? " (including unsaved edits)" : ""} and see which verdicts would change. Nothing is stored.
        </p>
      </div>
      <div className="flex flex-wrap items-end gap-3">
        <div className="space-y-0.5">
          <label htmlFor={ids.scope} className="block text-xs font-medium text-ink-800">Compare with</label>
          <select id={ids.scope} value={scope} onChange={(e) => setScope(e.target.value as "related" | "all")} className="rounded-md border border-ink-200 bg-white px-2 py-1.5 text-sm">
            <option value="related">Tests graded under this profile or its template</option>
            <option value="all">Every stored test</option>
          </select>
        </div>
        <div className="space-y-0.5">
          <label htmlFor={ids.limit} className="block text-xs font-medium text-ink-800">Tests</label>
          <select id={ids.limit} value={limit} onChange={(e) => setLimit(e.target.value)} className="rounded-md border border-ink-200 bg-white px-2 py-1.5 text-sm">
            <option value="1000">Newest 1,000</option>
            <option value="10000">Newest 10,000</option>
            <option value="100000">Newest 100,000</option>
            <option value="all">All stored tests</option>
          </select>
        </div>
        <div className="space-y-0.5">
          <label htmlFor={ids.from} className="block text-xs font-medium text-ink-800">From (optional)</label>
          <input id={ids.from} type="datetime-local" value={from} onChange={(e) => setFrom(e.target.value)} className="rounded-md border border-ink-200 px-2 py-1.5 text-sm" />
        </div>
        <div className="space-y-0.5">
          <label htmlFor={ids.to} className="block text-xs font-medium text-ink-800">To (optional)</label>
          <input id={ids.to} type="datetime-local" value={to} onChange={(e) => setTo(e.target.value)} className="rounded-md border border-ink-200 px-2 py-1.5 text-sm" />
        </div>
        {state.status === "running" ? (
          <Button variant="secondary" onClick={cancel}>Cancel</Button>
        ) : (
          <Button onClick={run}>Preview impact</Button>
        )}
      </div>

      {state.status === "running" && <ProgressBar done={state.done} total={state.total} label="Impact preview progress" />}
      {state.status === "cancelled" && <p className="text-sm text-ink-600">Preview cancelled.</p>}
      {state.status === "failed" && (
        <ErrorState title="The preview could not run" onRetry={run}>
          {state.message}
          {state.fieldErrors?.length ? <ul className="mt-1 list-disc pl-5">{state.fieldErrors.map((e, i) => <li key={i}>{e.pointer}: {e.message}</li>)}</ul> : null}
        </ErrorState>
      )}
      {state.status === "done" && <PreviewResult summary={state.result} />}
    </section>
  );
}

function PreviewResult({ summary }: { summary: PreviewSummary }) {
  if (summary.total === 0) {
    return <EmptyState title="No stored tests to compare with">None in this period were graded under this profile or its template. Widen the period, or compare with every stored test.</EmptyState>;
  }
  return (
    <div className="space-y-4" data-testid="preview-result">
      <p className="text-sm text-ink-800" role="status">
        <strong className="tabular-nums">{summary.changed.toLocaleString("en-GB")}</strong> of {summary.total.toLocaleString("en-GB")} verdicts would change under {summary.profile.slug} v{summary.profile.version} (draft).
        {summary.failedToGrade > 0 && <> {summary.failedToGrade} stored tests could not be graded under the draft.</>}
      </p>
      <TransitionMatrix summary={summary} />
      {summary.changedLinks.length > 0 && (
        <div className="overflow-x-auto rounded-md border border-ink-100">
          <table className="min-w-full text-left text-sm">
            <caption className="px-3 py-2 text-left text-xs font-medium text-ink-600">
              Changed links{summary.changedLinksTruncated ? ` (first ${summary.changedLinks.length})` : ""}
            </caption>
            <thead className="bg-ink-50 text-xs uppercase tracking-wide text-ink-600">
              <tr><th className="px-3 py-2">Link</th><th className="px-3 py-2">Now</th><th className="px-3 py-2">Draft</th><th className="px-3 py-2">Headroom now → draft</th><th className="px-3 py-2">Reasons under the draft</th></tr>
            </thead>
            <tbody className="divide-y divide-ink-100">
              {summary.changedLinks.map((c) => (
                <tr key={c.verdictId}>
                  <td className="px-3 py-1.5"><Link className="font-medium text-lumen-700 underline-offset-2 hover:underline" href={`/console/verdicts/${c.verdictId}`}>{c.linkRef}</Link></td>
                  <td className="px-3 py-1.5"><Badge tone={c.before}>{c.before}</Badge></td>
                  <td className="px-3 py-1.5"><Badge tone={c.after}>{c.after}</Badge></td>
                  <td className="px-3 py-1.5 tabular-nums">{c.headroomBefore?.toFixed(2) ?? "–"} → {c.headroomAfter?.toFixed(2) ?? "–"} dB</td>
                  <td className="px-3 py-1.5 font-mono text-xs">{c.reasonCodes.join(", ")}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
