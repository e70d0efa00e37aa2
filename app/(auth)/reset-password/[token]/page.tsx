import type { Metadata } from "next";
import Link from "next/link";
import { ResetPasswordForm } from "@/components/auth/reset-password-form";
import { ErrorState } from "@/components/ui/states";
import { isResetTokenValid } from "@/lib/auth/password-reset";

export const metadata: Metadata = { title: "Choose a new password" };
export const dynamic = "force-dynamic";

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const valid = token.length >= 20 && token.length <= 200 && (await isResetTokenValid(token));
  return (
    <>
      <h1 className="mb-4 text-lg font-semibold text-ink-900">Choose a new password</h1>
      {valid ? (
        <ResetPasswordForm token={token} />
      ) : (
        <ErrorState title="This link no longer works">
          Reset links work once and for one hour. <Link href="/forgot-password" className="underline">Ask for a new one</Link>.
        </ErrorState>
      )}
    </>
  );
}
