"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { requestResetAction } from "@/app/(auth)/actions";
import { Button } from "@/components/ui/button";
import { Input } from "@/components/ui/field";
import { ErrorState, Notice } from "@/components/ui/states";
import { resetRequestSchema } from "@/lib/auth/reset-schemas";

export function ForgotPasswordForm() {
  const [done, setDone] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<z.input<typeof resetRequestSchema>>({ resolver: zodResolver(resetRequestSchema) });
  const submit = handleSubmit(async (v) => {
    setError(null);
    const r = await requestResetAction(v);
    if (!r.ok) return setError(r.error);
    setDone(true);
  });
  if (done) {
    return <Notice tone="success">If that address has an account, a reset link is on its way. It works once, for one hour.</Notice>;
  }
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      {error && <ErrorState title="Could not send the link">{error}</ErrorState>}
      <Input label="E-mail" type="email" autoComplete="username" autoFocus {...register("email")} error={formState.errors.email?.message} />
      <Button type="submit" className="w-full" busy={formState.isSubmitting}>Send reset link</Button>
    </form>
  );
}
