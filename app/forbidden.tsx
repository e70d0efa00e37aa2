import Link from "next/link";

// Shown with status 403 when a signed-in member's role lacks the permission a page needs.
export default function Forbidden() {
  return (
    <main className="mx-auto mt-24 max-w-xl rounded-md border border-ink-200 bg-white p-6">
      <h1 className="text-lg font-semibold text-ink-900">Not available for your role</h1>
      <p className="mt-2 text-sm text-ink-600">
        This page needs a permission your role in this organisation does not have. Ask an administrator if you need it.
      </p>
      <Link href="/console" className="mt-4 inline-block text-sm font-medium text-lumen-700 underline underline-offset-2">
        Back to the overview
      </Link>
    </main>
  );
}
