import Link from "next/link";
import { LaserSafetyNotice } from "@/components/laser-safety-notice";

const steps = [
  { title: "Post a test", body: "Your work-order or activation system sends the link's length, insertion loss, optical return loss and events to one JSON endpoint." },
  { title: "Get a verdict", body: "Glassgrade answers in milliseconds with pass, marginal or fail, the headroom per wavelength and a reason for every finding, each citing the standard behind its limit." },
  { title: "Prove it later", body: "Every verdict keeps the exact limit profile and engine version that produced it, chained by digest, so an auditor can replay it years on and get the same answer." },
];

export default function HomePage() {
  return (
    <main className="mx-auto max-w-4xl px-6 py-14">
      <header className="flex items-center justify-between">
        <p className="text-lg font-semibold tracking-tight text-ink-800">
          <span aria-hidden className="mr-2 inline-block h-3 w-3 rotate-45 rounded-sm bg-lumen-500" />
          Glassgrade
        </p>
        <nav className="flex gap-4 text-sm">
          <Link className="text-ink-600 hover:text-ink-900" href="/docs/api">API reference</Link>
          <Link className="rounded bg-ink-800 px-3 py-1.5 font-medium text-white hover:bg-ink-900" href="/console">Sign in</Link>
        </nav>
      </header>

      <section className="mt-14">
        <h1 className="text-4xl font-semibold tracking-tight text-ink-900">Acceptance verdicts for every fibre link you build</h1>
        <p className="mt-4 max-w-2xl text-lg leading-relaxed text-ink-600">
          Glassgrade is the grading service for fibre network operators and their contractors. It judges each
          installed, activated or repaired link against the limit profile you choose (built from TIA-568.3-D,
          ISO/IEC 11801-1 and 14763-3, IEEE 802.3 application budgets and ITU-T PON classes) and tells you why.
        </p>
      </section>

      <ol className="mt-10 grid gap-4 sm:grid-cols-3">
        {steps.map((s, i) => (
          <li key={s.title} className="rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
            <p className="text-xs font-medium uppercase tracking-wider text-lumen-700">Step {i + 1}</p>
            <h2 className="mt-1 font-semibold text-ink-800">{s.title}</h2>
            <p className="mt-2 text-sm leading-relaxed text-ink-600">{s.body}</p>
          </li>
        ))}
      </ol>

      <p className="mt-10 text-sm text-ink-600">
        Built for OSS integrators, operator engineers who set limits, auditors who replay past verdicts,
        developers wiring up the API, and the administrators who hand out keys.
      </p>

      <div className="mt-10">
        <LaserSafetyNotice />
      </div>
    </main>
  );
}
