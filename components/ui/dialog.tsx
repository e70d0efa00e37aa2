"use client";
import { useEffect, useId, useRef, type ReactNode } from "react";

// The native <dialog> in modal mode traps focus, closes on Escape and restores focus to the opener.
export function Dialog({ open, onClose, title, children, footer }: { open: boolean; onClose: () => void; title: string; children: ReactNode; footer?: ReactNode }) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) d.showModal();
    if (!open && d.open) d.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      onClose={onClose}
      aria-labelledby={titleId}
      className="w-full max-w-lg rounded-lg border border-ink-200 p-0 shadow-xl backdrop:bg-ink-900/40"
    >
      {open && (
        <div className="p-5">
          <h2 id={titleId} className="text-base font-semibold text-ink-900">{title}</h2>
          <div className="mt-3 text-sm text-ink-800">{children}</div>
          {footer && <div className="mt-5 flex justify-end gap-2">{footer}</div>}
        </div>
      )}
    </dialog>
  );
}
