"use client";
// Inputs for one limit (a number with the source it comes from) and its relatives, wired to the
// surrounding react-hook-form through context so error messages land on the field they concern.
import { useId, type ReactNode } from "react";
import { useFormContext, type FieldErrors, type FieldValues } from "react-hook-form";
import { cn } from "@/components/ui/cn";

export function errorAt(errors: FieldErrors<FieldValues>, path: string): string | undefined {
  let node: unknown = errors;
  for (const part of path.split(".")) {
    if (node === null || typeof node !== "object") return undefined;
    node = (node as Record<string, unknown>)[part];
  }
  const message = (node as { message?: unknown } | undefined)?.message;
  return typeof message === "string" ? message : undefined;
}

const CONTROL = "block w-full rounded-md border bg-white px-2 py-1.5 text-sm text-ink-900 focus:border-lumen-600 focus:outline-none focus:ring-2 focus:ring-lumen-100";

function Control({ id, label, error, children, hideLabel }: { id: string; label: string; error?: string; children: ReactNode; hideLabel?: boolean }) {
  return (
    <div className="min-w-0 space-y-0.5">
      <label htmlFor={id} className={cn("block text-xs font-medium text-ink-800", hideLabel && "sr-only")}>{label}</label>
      {children}
      {error && <p id={`${id}-error`} role="alert" className="text-xs font-medium text-verdict-fail">{error}</p>}
    </div>
  );
}

export function NumberField({ name, label, unit, step = "any", hideLabel }: { name: string; label: string; unit?: string; step?: string; hideLabel?: boolean }) {
  const { register, formState } = useFormContext();
  const id = useId();
  const error = errorAt(formState.errors, name);
  return (
    <Control id={id} label={unit ? `${label} (${unit})` : label} error={error} hideLabel={hideLabel}>
      <input
        id={id}
        type="number"
        inputMode="decimal"
        step={step}
        aria-invalid={!!error || undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        className={cn(CONTROL, "tabular-nums", error ? "border-verdict-fail" : "border-ink-200")}
        {...register(name, { valueAsNumber: true })}
      />
    </Control>
  );
}

export function TextField({ name, label, hideLabel, placeholder, list, optional }: { name: string; label: string; hideLabel?: boolean; placeholder?: string; list?: boolean; optional?: boolean }) {
  const { register, formState } = useFormContext();
  const id = useId();
  const error = errorAt(formState.errors, name);
  return (
    <Control id={id} label={label} error={error} hideLabel={hideLabel}>
      <input
        id={id}
        type="text"
        placeholder={placeholder}
        aria-invalid={!!error || undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        className={cn(CONTROL, error ? "border-verdict-fail" : "border-ink-200")}
        {...register(name, {
          setValueAs: (v: unknown) =>
            list && typeof v === "string" ? v.split(/[\s,]+/).filter(Boolean) : optional && (v === "" || v === null) ? undefined : v,
        })}
      />
    </Control>
  );
}

/** A limit: its value and, beside it, where it comes from. */
export function LimitField({ name, label, unit, hint }: { name: string; label: string; unit?: string; hint?: string }) {
  return (
    <fieldset className="grid grid-cols-[minmax(7rem,10rem)_1fr] items-start gap-2 rounded-md border border-ink-100 bg-white p-2.5">
      <legend className="px-1 text-xs font-semibold text-ink-800">{label}</legend>
      <NumberField name={`${name}.value`} label="Value" unit={unit} />
      <TextField name={`${name}.source`} label="Source" placeholder="Standard and clause, 'common practice' or 'from memory'" />
      {hint && <p className="col-span-2 text-xs text-ink-600">{hint}</p>}
    </fieldset>
  );
}

/** A limit the profile may leave out: a switch adds it with a starting value, or removes it. */
export function OptionalGroup({ name, label, fallback, children }: { name: string; label: string; fallback: unknown; children: ReactNode }) {
  const { watch, setValue } = useFormContext();
  const present = watch(name) !== undefined && watch(name) !== null;
  const id = useId();
  return (
    <div className="space-y-2">
      <div className="flex items-center gap-2">
        <input
          id={id}
          type="checkbox"
          checked={present}
          onChange={(e) => setValue(name, e.target.checked ? structuredClone(fallback) : undefined, { shouldDirty: true, shouldValidate: true })}
          className="h-4 w-4 rounded border-ink-200 text-lumen-600 focus:ring-lumen-600"
        />
        <label htmlFor={id} className="text-sm font-medium text-ink-800">{label}</label>
      </div>
      {present && children}
    </div>
  );
}

export function Section({ title, description, children }: { title: string; description?: string; children: ReactNode }) {
  return (
    <section className="space-y-3 rounded-lg border border-ink-100 bg-ink-50/60 p-4">
      <div>
        <h2 className="text-sm font-semibold text-ink-900">{title}</h2>
        {description && <p className="mt-0.5 text-xs text-ink-600">{description}</p>}
      </div>
      {children}
    </section>
  );
}

/**
 * A long table (applications, PON classes) folded away until needed. It opens by itself when a field
 * inside it has an error, so a refused save never hides the message.
 */
export function FoldedSection({ title, description, path, count, children }: { title: string; description?: string; path: string; count: number; children: ReactNode }) {
  const { formState } = useFormContext();
  const hasError = errorTree(formState.errors, path);
  return (
    <details open={hasError || undefined} className="group rounded-lg border border-ink-100 bg-ink-50/60 p-4 [&[open]>summary>span.chev]:rotate-90">
      <summary className="flex cursor-pointer list-none items-baseline gap-2">
        <span aria-hidden className="chev inline-block text-ink-600 transition-transform">▸</span>
        <h2 className="text-sm font-semibold text-ink-900">{title}</h2>
        <span className="text-xs text-ink-600">{count} row{count === 1 ? "" : "s"}{hasError ? " · needs attention" : ""}</span>
      </summary>
      {description && <p className="mt-1 text-xs text-ink-600">{description}</p>}
      <div className="mt-3 space-y-3">{children}</div>
    </details>
  );
}

function errorTree(errors: FieldErrors<FieldValues>, path: string): boolean {
  let node: unknown = errors;
  for (const part of path.split(".")) {
    if (node === null || typeof node !== "object") return false;
    node = (node as Record<string, unknown>)[part];
  }
  return node !== undefined && node !== null;
}
