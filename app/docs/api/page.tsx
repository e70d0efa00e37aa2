// /docs/api: the public API reference (rendered from the live OpenAPI document), a quickstart, and
// try-it for signed-in members who may use it, with a sandbox key.
import type { Metadata } from "next";
import Link from "next/link";
import { headers } from "next/headers";
import { LaserSafetyNotice } from "@/components/laser-safety-notice";
import { getMember } from "@/lib/auth/session";
import { can } from "@/lib/auth/roles";
import { SwaggerView } from "./swagger-view";

export const metadata: Metadata = { title: "API reference · Glassgrade" };
export const dynamic = "force-dynamic";

const curlExample = (origin: string) => `curl -sS ${origin}/api/v1/gradings \\
  -H "Authorization: Bearer $GLASSGRADE_KEY" \\
  -H "Content-Type: application/json" \\
  -H "Idempotency-Key: $(uuidgen)" \\
  -d '{
    "profile": "tia-568-3-d-singlemode-osp",
    "test": {
      "link": { "ref": "NM-EASTMERE-0142", "fibreType": "OS2", "designLengthM": 2400,
                "connectorPairs": 2, "splices": 3, "polish": "APC" },
      "measurements": [
        { "wavelengthNm": 1310, "method": "one-cord", "insertionLossDb": 2.1, "orlDb": 52, "lengthM": 2412 },
        { "wavelengthNm": 1550, "method": "one-cord", "insertionLossDb": 1.8, "orlDb": 54, "lengthM": 2412 }
      ]
    }
  }'`;

const fetchExample = (origin: string) => `const res = await fetch("${origin}/api/v1/gradings", {
  method: "POST",
  headers: {
    Authorization: \`Bearer \${process.env.GLASSGRADE_KEY}\`,
    "Content-Type": "application/json",
    "Idempotency-Key": crypto.randomUUID(), // retry with the same value: nothing is graded twice
  },
  body: JSON.stringify({ test }),
});
if (!res.ok) {
  const problem = await res.json(); // RFC 9457: { type, title, status, detail, code, requestId, errors? }
  throw new Error(\`\${problem.code}: \${problem.detail} (request \${problem.requestId})\`);
}
const verdict = await res.json(); // { id, verdict: "pass" | "marginal" | "fail", headroomDb, reasons, ... }`;

function Code({ label, code }: { label: string; code: string }) {
  return (
    <figure className="mt-3">
      <figcaption className="text-xs font-medium uppercase tracking-wider text-ink-600">{label}</figcaption>
      <pre tabIndex={0} className="mt-1 overflow-x-auto rounded-md bg-ink-900 p-4 text-xs leading-relaxed text-ink-50 focus:outline-none focus:ring-2 focus:ring-lumen-500">
        <code>{code}</code>
      </pre>
    </figure>
  );
}

export default async function ApiReferencePage() {
  const member = await getMember().catch(() => null);
  const canTry = !!member && can(member.role, "apidocs:try");
  const h = await headers();
  const origin = `${h.get("x-forwarded-proto") ?? "http"}://${h.get("host") ?? "localhost:3000"}`;

  return (
    <main className="mx-auto max-w-5xl px-6 py-10">
      <nav className="flex items-center justify-between text-sm">
        <Link href="/" className="font-semibold text-ink-800">
          <span aria-hidden className="mr-2 inline-block h-3 w-3 rotate-45 rounded-sm bg-lumen-500" />
          Glassgrade
        </Link>
        <Link href="/console" className="text-ink-600 hover:text-ink-900">
          {member ? "Back to the console" : "Sign in"}
        </Link>
      </nav>

      <header className="mt-8">
        <h1 className="text-3xl font-semibold tracking-tight text-ink-900">API reference</h1>
        <p className="mt-3 max-w-3xl text-ink-600">
          One JSON API grades a link test and stores the verdict; every field, error and example below comes
          from the live OpenAPI 3.1 document at{" "}
          <a className="text-lumen-700 underline" href="/api/v1/openapi.json">/api/v1/openapi.json</a>.
        </p>
      </header>

      <section aria-labelledby="quickstart" className="mt-8 rounded-lg border border-ink-100 bg-white p-6 shadow-sm">
        <h2 id="quickstart" className="text-lg font-semibold text-ink-800">Quickstart</h2>
        <ol className="mt-2 list-decimal space-y-1 pl-5 text-sm text-ink-600">
          <li>
            Create a <strong>sandbox key</strong> (it starts with <code>gg_sbx_</code>) on the console&apos;s{" "}
            <Link className="text-lumen-700 underline" href="/console/keys">API keys</Link> page. It is shown once: store it in your secret manager.
          </li>
          <li>Post a test to <code>/api/v1/gradings</code>. The answer is the stored verdict; its <code>Location</code> header points at it.</li>
          <li>
            Errors come as <code>application/problem+json</code> with a stable <code>code</code>; a 422 lists a JSON pointer for each bad field.
            Send an <code>Idempotency-Key</code> on POST so retries never grade twice.
          </li>
        </ol>
        <Code label="curl" code={curlExample(origin)} />
        <Code label="TypeScript (fetch)" code={fetchExample(origin)} />
      </section>

      <section aria-labelledby="try" className="mt-6">
        <h2 id="try" className="sr-only">Operations</h2>
        {canTry ? (
          <p className="rounded-md border border-lumen-100 bg-lumen-50 px-4 py-3 text-sm text-ink-800" role="note">
            Try-it is on. Press <strong>Authorize</strong>, paste a <strong>sandbox</strong> key, then <strong>Try it out</strong> on any
            operation. Calls made here are real: gradings are stored in your organisation&apos;s verdict history (marked with the sandbox key that made them) and appear in the call log. Live keys are refused on this page.
          </p>
        ) : (
          <p className="rounded-md border border-ink-100 bg-ink-50 px-4 py-3 text-sm text-ink-600" role="note">
            {member
              ? "Your role can read this reference but not send calls from it."
              : "Sign in as an engineer, developer or administrator to send calls from this page with a sandbox key."}
          </p>
        )}
        <div className="mt-4 rounded-lg border border-ink-100 bg-white">
          <SwaggerView canTry={canTry} />
        </div>
      </section>

      <div className="mt-8">
        <LaserSafetyNotice compact />
      </div>
    </main>
  );
}
