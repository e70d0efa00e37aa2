import type { Metadata } from "next";
import Link from "next/link";
import { ForgotPasswordForm } from "@/components/auth/forgot-password-form";
import { devMailboxEnabled } from "@/lib/mail/config";

export const metadata: Metadata = { title: "Reset your password" };
export const dynamic = "force-dynamic";

export default function ForgotPasswordPage() {
  return (
    <>
      <h1 className="mb-1 text-lg font-semibold text-ink-900">Reset your password</h1>
      <p className="mb-4 text-sm text-ink-600">We will e-mail you a link to choose a new one.</p>
      <ForgotPasswordForm />
      {devMailboxEnabled() && (
        <p className="mt-4 rounded-md bg-ink-50 px-3 py-2 text-xs text-ink-600">
          Development setup: mail is caught by the local fake SMTP server. Sign in with another demo account and
          open <strong>Mailbox (dev)</strong> to follow the link.
        </p>
      )}
      <p className="mt-4 text-center text-sm"><Link href="/sign-in" className="text-lumen-700 underline underline-offset-2">Back to sign-in</Link></p>
    </>
  );
}
