import { forwardRef, useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes } from "react";
import { cn } from "./cn";

const CONTROL =
  "block w-full rounded-md border bg-white px-3 py-2 text-sm text-ink-900 shadow-sm placeholder:text-ink-400 focus:border-lumen-600 focus:outline-none focus:ring-2 focus:ring-lumen-100";

interface FieldShellProps {
  id: string;
  label: string;
  hint?: ReactNode;
  error?: string;
  children: ReactNode;
}

/** Label, control, hint and error, wired together for screen readers. */
export function FieldShell({ id, label, hint, error, children }: FieldShellProps) {
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-medium text-ink-800">
        {label}
      </label>
      {children}
      {hint && !error && <p id={`${id}-hint`} className="text-xs text-ink-600">{hint}</p>}
      {error && <p id={`${id}-error`} role="alert" className="text-xs font-medium text-verdict-fail">{error}</p>}
    </div>
  );
}

export interface InputProps extends InputHTMLAttributes<HTMLInputElement> {
  label: string;
  hint?: ReactNode;
  error?: string;
}

/** The id, ARIA wiring and border every labelled control shares. */
function useControlProps({ id, hint, error, className }: { id?: string; hint?: ReactNode; error?: string; className?: string }) {
  const auto = useId();
  const fid = id ?? auto;
  return {
    id: fid,
    "aria-invalid": !!error || undefined,
    "aria-describedby": error ? `${fid}-error` : hint ? `${fid}-hint` : undefined,
    className: cn(CONTROL, error ? "border-verdict-fail" : "border-ink-200", className),
  };
}

export const Input = forwardRef<HTMLInputElement, InputProps>(function Input({ label, hint, error, id, className, ...rest }, ref) {
  const control = useControlProps({ id, hint, error, className });
  return (
    <FieldShell id={control.id} label={label} hint={hint} error={error}>
      <input ref={ref} {...control} {...rest} />
    </FieldShell>
  );
});

export interface SelectProps extends SelectHTMLAttributes<HTMLSelectElement> {
  label: string;
  hint?: ReactNode;
  error?: string;
}

export const Select = forwardRef<HTMLSelectElement, SelectProps>(function Select({ label, hint, error, id, className, children, ...rest }, ref) {
  const control = useControlProps({ id, hint, error, className });
  return (
    <FieldShell id={control.id} label={label} hint={hint} error={error}>
      <select ref={ref} {...control} {...rest}>
        {children}
      </select>
    </FieldShell>
  );
});
