import Link from "next/link";
import type { ReactNode } from "react";

// Pages for people who are not signed in: sign-in, password reset, invitation acceptance.
export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col items-center justify-center px-4 py-10">
      <Link href="/" className="mb-6 flex items-center gap-2 text-lg font-semibold tracking-tight text-ink-800">
        <span aria-hidden className="inline-block h-3 w-3 rotate-45 rounded-sm bg-lumen-500" />
        Glassgrade
      </Link>
      <main className="w-full max-w-sm rounded-lg border border-ink-100 bg-white p-6 shadow-sm">{children}</main>
    </div>
  );
}
