import type { ReactNode } from "react";

export function Spinner({ label = "Loading" }: { label?: string }) {
  return (
    <span role="status" className="inline-flex items-center gap-2 text-sm text-ink-600">
      <span aria-hidden className="h-4 w-4 animate-spin rounded-full border-2 border-ink-200 border-t-lumen-600" />
      {label}…
    </span>
  );
}

export function EmptyState({ title, children, action }: { title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <div className="rounded-md border border-dashed border-ink-200 bg-white px-6 py-10 text-center">
      <p className="font-medium text-ink-800">{title}</p>
      {children && <div className="mx-auto mt-1 max-w-md text-sm text-ink-600">{children}</div>}
      {action && <div className="mt-4">{action}</div>}
    </div>
  );
}

export function ErrorState({ title = "Something went wrong", children, onRetry }: { title?: string; children?: ReactNode; onRetry?: () => void }) {
  return (
    <div role="alert" className="rounded-md border border-verdict-fail/30 bg-verdict-fail/5 px-4 py-3 text-sm">
      <p className="font-medium text-verdict-fail">{title}</p>
      {children && <div className="mt-1 text-ink-800">{children}</div>}
      {onRetry && (
        <button type="button" onClick={onRetry} className="mt-2 font-medium text-ink-800 underline underline-offset-2">
          Try again
        </button>
      )}
    </div>
  );
}

export function Notice({ tone = "info", children }: { tone?: "info" | "success"; children: ReactNode }) {
  const cls = tone === "success" ? "border-verdict-pass/30 bg-verdict-pass/5 text-ink-900" : "border-lumen-100 bg-lumen-50 text-ink-900";
  return <div role="status" className={`rounded-md border px-4 py-3 text-sm ${cls}`}>{children}</div>;
}
