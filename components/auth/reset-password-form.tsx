"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { resetPasswordAction } from "@/app/(auth)/actions";
import { Button } from "@/components/ui/button";
import { Input } from "@/components/ui/field";
import { ErrorState } from "@/components/ui/states";
import { resetPasswordSchema, type ResetPasswordInput } from "@/lib/auth/reset-schemas";

export function ResetPasswordForm({ token }: { token: string }) {
  const [error, setError] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<ResetPasswordInput>({ resolver: zodResolver(resetPasswordSchema), defaultValues: { token } });
  const submit = handleSubmit(async (v) => {
    setError(null);
    const r = await resetPasswordAction(v);
    if (!r.ok) return setError(r.error);
    window.location.assign("/sign-in?reset=1");
  });
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      {error && <ErrorState title="Password not changed">{error}</ErrorState>}
      <input type="hidden" {...register("token")} />
      <Input label="New password" type="password" autoComplete="new-password" autoFocus hint="At least 12 characters; a few unrelated words work well." {...register("password")} error={formState.errors.password?.message} />
      <Input label="New password again" type="password" autoComplete="new-password" {...register("confirm")} error={formState.errors.confirm?.message} />
      <Button type="submit" className="w-full" busy={formState.isSubmitting}>Set new password</Button>
    </form>
  );
}
