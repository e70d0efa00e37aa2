"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { acceptInvitationAction } from "@/app/(auth)/actions";
import { Button } from "@/components/ui/button";
import { Input } from "@/components/ui/field";
import { ErrorState } from "@/components/ui/states";
import { acceptInvitationSchema, joinWithAccountSchema, type AcceptInvitationInput } from "@/lib/members/schemas";

export function AcceptInvitationForm({ token, hasAccount }: { token: string; hasAccount: boolean }) {
  const [error, setError] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<AcceptInvitationInput>({
    resolver: zodResolver(hasAccount ? (joinWithAccountSchema as unknown as typeof acceptInvitationSchema) : acceptInvitationSchema),
    defaultValues: { token, name: "", password: "" },
  });
  const submit = handleSubmit(async (v) => {
    setError(null);
    const r = await acceptInvitationAction(v);
    if (!r.ok) return setError(r.error);
    window.location.assign("/sign-in?joined=1");
  });
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      {error && <ErrorState title="Could not accept">{error}</ErrorState>}
      <input type="hidden" {...register("token")} />
      {!hasAccount && (
        <>
          <Input label="Your name" autoComplete="name" autoFocus {...register("name")} error={formState.errors.name?.message} />
          <Input label="Choose a password" type="password" autoComplete="new-password" hint="At least 12 characters; a few unrelated words work well." {...register("password")} error={formState.errors.password?.message} />
        </>
      )}
      <Button type="submit" className="w-full" busy={formState.isSubmitting}>{hasAccount ? "Join the organisation" : "Accept and create account"}</Button>
    </form>
  );
}
