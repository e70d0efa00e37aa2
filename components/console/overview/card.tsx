import type { ReactNode } from "react";

export function Card({ title, children, aside }: { title: string; children: ReactNode; aside?: ReactNode }) {
  return (
    <section aria-label={title} className="rounded-md border border-ink-100 bg-white p-4">
      <div className="mb-3 flex items-baseline justify-between gap-2">
        <h2 className="text-sm font-semibold text-ink-900">{title}</h2>
        {aside && <div className="text-xs text-ink-600">{aside}</div>}
      </div>
      {children}
    </section>
  );
}
