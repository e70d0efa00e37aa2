"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Input, Select } from "@/components/ui/field";
import { inviteSchema, type InviteInput } from "@/lib/members/schemas";

export function InviteForm({ onInvite }: { onInvite: (v: InviteInput) => Promise<{ error: string; field?: string } | null> }) {
  const { register, handleSubmit, formState, reset, setError } = useForm<InviteInput>({
    resolver: zodResolver(inviteSchema),
    defaultValues: { email: "", role: "developer" },
  });
  const submit = handleSubmit(async (v) => {
    const err = await onInvite(v);
    if (!err) return reset({ email: "", role: v.role });
    setError(err.field === "role" ? "role" : "email", { message: err.error });
  });
  return (
    <form onSubmit={submit} noValidate aria-label="Invite a member" className="grid gap-3 rounded-md border border-ink-100 bg-white p-4 sm:grid-cols-[1fr_12rem_auto] sm:items-start">
      <Input label="E-mail" type="email" autoComplete="off" placeholder="name@example.com" {...register("email")} error={formState.errors.email?.message} />
      <Select label="Role" {...register("role")} error={formState.errors.role?.message}>
        <option value="admin">Admin</option>
        <option value="engineer">Engineer</option>
        <option value="auditor">Auditor</option>
        <option value="developer">Developer</option>
      </Select>
      <div className="sm:pt-6">
        <Button type="submit" busy={formState.isSubmitting}>Send invitation</Button>
      </div>
    </form>
  );
}
