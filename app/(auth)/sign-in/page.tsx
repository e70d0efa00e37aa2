import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SignInForm } from "@/components/auth/sign-in-form";
import { Notice } from "@/components/ui/states";
import { DEMO_PASSWORD, DEMO_USERS } from "@/db/seed";
import { getMember } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Sign in" };
export const dynamic = "force-dynamic";

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const sp = await searchParams;
  if (await getMember()) redirect("/console");
  return (
    <>
      <h1 className="mb-4 text-lg font-semibold text-ink-900">Sign in to the console</h1>
      {sp.signedOut && <div className="mb-4"><Notice>You are signed out.</Notice></div>}
      {sp.reset && <div className="mb-4"><Notice tone="success">Your password was changed. Sign in with the new one.</Notice></div>}
      {sp.joined && <div className="mb-4"><Notice tone="success">Welcome aboard. Sign in to open the console.</Notice></div>}
      <SignInForm
        callbackUrl={sp.callbackUrl}
        initialError={sp.error ? "Sign-in did not work. Check the e-mail and password and try again." : undefined}
      />
      {process.env.GLASSGRADE_DEMO === "1" && (
        <details className="mt-5 rounded-md bg-ink-50 px-3 py-2 text-xs text-ink-600">
          <summary className="cursor-pointer font-medium text-ink-800">Demo accounts</summary>
          <p className="mt-2">Every demo account uses the password <code>{DEMO_PASSWORD}</code>.</p>
          <ul className="mt-1 space-y-0.5">
            {DEMO_USERS.map((u) => (
              <li key={u.email}><code>{u.email}</code> · {u.role}</li>
            ))}
          </ul>
        </details>
      )}
    </>
  );
}
