"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Input } from "@/components/ui/field";
import type { ActionResult } from "@/lib/auth/action-result";
import { CALL_LOG_RETENTION_MAX_DAYS, CALL_LOG_RETENTION_MIN_DAYS, retentionSchema, type RetentionInput } from "@/lib/retention/schemas";

export function RetentionForm({
  current,
  onSave,
}: {
  current: number;
  onSave: (v: RetentionInput) => Promise<ActionResult<{ callLogDays: number }>>;
}) {
  const [saved, setSaved] = useState<number | null>(null);
  const { register, handleSubmit, formState, setError } = useForm<RetentionInput>({
    resolver: zodResolver(retentionSchema),
    defaultValues: { callLogDays: current },
  });
  const submit = handleSubmit(async (v) => {
    setSaved(null);
    const r = await onSave(v);
    if (r.ok) setSaved(r.data.callLogDays);
    else setError("callLogDays", { message: r.error });
  });
  return (
    <form onSubmit={submit} noValidate aria-label="Call-log retention" className="grid max-w-xl gap-3 rounded-md border border-ink-100 bg-white p-4">
      <Input
        label="Keep API calls for (days)"
        type="number"
        inputMode="numeric"
        min={CALL_LOG_RETENTION_MIN_DAYS}
        max={CALL_LOG_RETENTION_MAX_DAYS}
        hint={`Between ${CALL_LOG_RETENTION_MIN_DAYS} and ${CALL_LOG_RETENTION_MAX_DAYS}. Older calls are removed when the server starts and every six hours.`}
        {...register("callLogDays")}
        error={formState.errors.callLogDays?.message}
      />
      <div className="flex items-center gap-3">
        <Button type="submit" busy={formState.isSubmitting}>Save retention</Button>
        {saved !== null && (
          <p role="status" className="text-sm text-verdict-pass">
            Saved: calls are kept for {saved} days.
          </p>
        )}
      </div>
    </form>
  );
}
