// A determinate bar when the total is known, an indeterminate one while it is not.
export function ProgressBar({ done, total, label }: { done: number; total: number | null; label: string }) {
  const pct = total ? Math.min(100, Math.round((done / total) * 100)) : null;
  return (
    <div className="space-y-1">
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={total ?? undefined}
        aria-valuenow={total ? done : undefined}
        className="h-2.5 w-full overflow-hidden rounded-full bg-ink-100"
      >
        <div className={`h-full rounded-full bg-lumen-600 transition-[width] duration-200 ${pct === null ? "w-1/3 animate-pulse" : ""}`} style={pct === null ? undefined : { width: `${pct}%` }} />
      </div>
      <p className="text-xs text-ink-600" aria-live="polite">
        {total ? `${done.toLocaleString("en-GB")} of ${total.toLocaleString("en-GB")} (${pct}%)` : `${done.toLocaleString("en-GB")} so far`}
      </p>
    </div>
  );
}
