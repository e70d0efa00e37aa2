"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { acceptInvitationAction } from "@/app/(auth)/actions";
import { Button } from "@/components/ui/button";
import { Input } from "@/components/ui/field";
import { ErrorState } from "@/components/ui/states";
import { acceptInvitationSchema, type AcceptInvitationInput } from "@/lib/members/schemas";

async function accept(input: unknown, setError: (e: string) => void) {
  const r = await acceptInvitationAction(input);
  if (!r.ok) return setError(r.error);
  window.location.assign("/sign-in?joined=1");
}

/** Someone who already has an account only confirms: an invitation never sets their password. */
function JoinWithAccount({ token }: { token: string }) {
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  return (
    <div className="space-y-4">
      {error && <ErrorState title="Could not accept">{error}</ErrorState>}
      <Button className="w-full" busy={busy} onClick={async () => { setBusy(true); await accept({ token }, setError); setBusy(false); }}>
        Join the organisation
      </Button>
    </div>
  );
}

function NewAccountForm({ token }: { token: string }) {
  const [error, setError] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<AcceptInvitationInput>({
    resolver: zodResolver(acceptInvitationSchema),
    defaultValues: { token, name: "", password: "" },
  });
  return (
    <form onSubmit={handleSubmit((v) => accept(v, setError))} noValidate className="space-y-4">
      {error && <ErrorState title="Could not accept">{error}</ErrorState>}
      <input type="hidden" {...register("token")} />
      <Input label="Your name" autoComplete="name" autoFocus {...register("name")} error={formState.errors.name?.message} />
      <Input label="Choose a password" type="password" autoComplete="new-password" hint="At least 12 characters; a few unrelated words work well." {...register("password")} error={formState.errors.password?.message} />
      <Button type="submit" className="w-full" busy={formState.isSubmitting}>Accept and create account</Button>
    </form>
  );
}

export function AcceptInvitationForm({ token, hasAccount }: { token: string; hasAccount: boolean }) {
  return hasAccount ? <JoinWithAccount token={token} /> : <NewAccountForm token={token} />;
}
