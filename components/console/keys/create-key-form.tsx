"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Input, Select } from "@/components/ui/field";
import { API_SCOPES } from "@/lib/keys/api-key";
import { createKeySchema, SCOPE_LABELS, type CreateKeyInput } from "@/lib/keys/manage-schemas";

export function CreateKeyForm({
  canCreateLive,
  onSubmit,
  onCancel,
  serverError,
}: {
  canCreateLive: boolean;
  onSubmit: (v: CreateKeyInput) => Promise<void>;
  onCancel: () => void;
  serverError?: { error: string; field?: string } | null;
}) {
  const { register, handleSubmit, formState } = useForm<CreateKeyInput>({
    resolver: zodResolver(createKeySchema),
    defaultValues: { name: "", environment: "sandbox", scopes: ["grade", "verdicts:read"], expiresOn: "" },
  });
  const e = formState.errors;
  const fieldError = (f: string) => (serverError?.field === f ? serverError.error : undefined);
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="space-y-4">
      <Input label="Name" placeholder="e.g. Work-order system" autoFocus {...register("name")} error={e.name?.message ?? fieldError("name")} />
      <Select
        label="Environment"
        {...register("environment")}
        error={e.environment?.message ?? fieldError("environment")}
        hint={canCreateLive ? "Live keys grade real work; sandbox keys are for trying the API." : "Your role may create sandbox keys only."}
      >
        <option value="sandbox">Sandbox (gg_sbx_)</option>
        {canCreateLive && <option value="live">Live (gg_live_)</option>}
      </Select>
      <fieldset>
        <legend className="text-sm font-medium text-ink-800">Scopes</legend>
        <div className="mt-1 space-y-1">
          {API_SCOPES.map((s) => (
            <label key={s} className="flex items-center gap-2 text-sm">
              <input type="checkbox" value={s} {...register("scopes")} className="h-4 w-4 rounded border-ink-200 text-lumen-600" />
              <code className="text-xs">{s}</code>
              <span className="text-ink-600">{SCOPE_LABELS[s]}</span>
            </label>
          ))}
        </div>
        {(e.scopes?.message || fieldError("scopes")) && (
          <p role="alert" className="mt-1 text-xs font-medium text-verdict-fail">{e.scopes?.message ?? fieldError("scopes")}</p>
        )}
      </fieldset>
      <Input label="Expires after (optional)" type="date" {...register("expiresOn")} error={e.expiresOn?.message ?? fieldError("expiresOn")} hint="Leave empty for a key that does not expire. The key stops working at the end of that day (UTC)." />
      {serverError && !serverError.field && <p role="alert" className="text-sm font-medium text-verdict-fail">{serverError.error}</p>}
      <div className="flex justify-end gap-2 pt-1">
        <Button variant="secondary" onClick={onCancel}>Cancel</Button>
        <Button type="submit" busy={formState.isSubmitting}>Create key</Button>
      </div>
    </form>
  );
}
