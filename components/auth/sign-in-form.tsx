"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { signIn } from "next-auth/react";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Input } from "@/components/ui/field";
import { ErrorState } from "@/components/ui/states";
import { signInSchema, type SignInInput } from "@/lib/auth/sign-in-schema";

// Only same-site paths are followed after sign-in, so a crafted link cannot send people elsewhere.
function safeCallback(url: string | undefined): string {
  return url && url.startsWith("/") && !url.startsWith("//") ? url : "/console";
}

export function SignInForm({ callbackUrl, initialError }: { callbackUrl?: string; initialError?: string }) {
  const [error, setError] = useState<string | null>(initialError ?? null);
  const { register, handleSubmit, formState } = useForm<SignInInput>({ resolver: zodResolver(signInSchema) });
  const onSubmit = handleSubmit(async (values) => {
    setError(null);
    const res = await signIn("credentials", { ...values, redirect: false });
    if (!res || res.error) {
      setError("That e-mail and password do not match an account with access to an organisation.");
      return;
    }
    window.location.assign(safeCallback(callbackUrl));
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {error && <ErrorState title="Sign-in failed">{error}</ErrorState>}
      <Input label="E-mail" type="email" autoComplete="username" autoFocus {...register("email")} error={formState.errors.email?.message} />
      <Input label="Password" type="password" autoComplete="current-password" {...register("password")} error={formState.errors.password?.message} />
      <Button type="submit" className="w-full" busy={formState.isSubmitting}>Sign in</Button>
      <p className="text-center text-sm">
        <Link href="/forgot-password" className="text-lumen-700 underline underline-offset-2">Forgot your password?</Link>
      </p>
    </form>
  );
}
