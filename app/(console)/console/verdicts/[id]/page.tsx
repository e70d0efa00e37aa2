import Link from "next/link";
import { notFound } from "next/navigation";
import { LaserSafetyNotice } from "@/components/laser-safety-notice";
import { Badge } from "@/components/ui/badge";
import { PageHeader } from "@/components/ui/page-header";
import { BudgetChart } from "@/components/verdicts/budget-chart";
import { EventMap } from "@/components/verdicts/event-map";
import { ReasonsTable } from "@/components/verdicts/reasons-table";
import { ReplayPanel } from "@/components/verdicts/replay-panel";
import { getDb } from "@/db";
import { NotFoundError } from "@/lib/auth/errors";
import { can } from "@/lib/auth/roles";
import { requireMember } from "@/lib/auth/session";
import { verdictDetail } from "@/lib/audit/verdict-explorer";

export const metadata = { title: "Verdict" };

function Meta({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div className="min-w-0">
      <dt className="text-xs font-medium uppercase tracking-wide text-ink-600">{label}</dt>
      <dd className="mt-0.5 break-all text-sm text-ink-900">{children}</dd>
    </div>
  );
}

export default async function VerdictPage({ params }: { params: Promise<{ id: string }> }) {
  const member = await requireMember("verdicts:read");
  const { id } = await params;
  const v = await verdictDetail({ db: getDb(), actor: member }, id).catch((err) => {
    if (err instanceof NotFoundError) notFound();
    throw err;
  });
  const profileHref = `/console/profiles/${v.profile.slug}`;
  return (
    <div className="space-y-6">
      <PageHeader
        title={v.linkRef}
        description={<span className="inline-flex items-center gap-2">Verdict <Badge tone={v.verdict} className="text-sm">{v.verdict}</Badge> {v.result.headroomDb !== null && <span className="tabular-nums">worst headroom {v.result.headroomDb.toFixed(2)} dB</span>}</span>}
        actions={<Link href="/console/verdicts" className="text-sm text-lumen-700 underline-offset-2 hover:underline">All verdicts</Link>}
      />
      <dl className="grid gap-4 rounded-lg border border-ink-100 bg-white p-4 sm:grid-cols-2 lg:grid-cols-4">
        <Meta label="Profile version"><Link href={profileHref} className="font-mono text-lumen-700 underline-offset-2 hover:underline" data-testid="verdict-profile">{v.profile.slug}@{v.profile.version}</Link></Meta>
        <Meta label="Engine version"><span className="font-mono">{v.engineVersion}</span></Meta>
        <Meta label="Graded (UTC)">{v.createdAt.replace("T", " ").slice(0, 19)}</Meta>
        <Meta label="Chain position">seq {v.seq}{v.viaApiKey ? " · via API key" : ""}</Meta>
        <div className="sm:col-span-2"><Meta label="Digest (SHA-256 of the canonical result)"><span className="font-mono text-xs">{v.digest}</span></Meta></div>
        <div className="sm:col-span-2"><Meta label="Previous digest"><span className="font-mono text-xs">{v.prevDigest ?? "none: first in the chain"}</span></Meta></div>
      </dl>

      <section aria-labelledby="map-title" className="space-y-2">
        <h2 id="map-title" className="text-sm font-semibold text-ink-900">Event map</h2>
        <EventMap test={v.test} result={v.result} />
      </section>

      <section aria-labelledby="budget-title" className="space-y-2">
        <h2 id="budget-title" className="text-sm font-semibold text-ink-900">Budget against measured loss</h2>
        <BudgetChart result={v.result} />
      </section>

      <section aria-labelledby="reasons-title" className="space-y-2">
        <h2 id="reasons-title" className="text-sm font-semibold text-ink-900">Reasons</h2>
        <ReasonsTable reasons={v.result.reasons} />
      </section>

      {can(member.role, "verdicts:replay") && (
        <section aria-labelledby="replay-title" className="space-y-2">
          <h2 id="replay-title" className="text-sm font-semibold text-ink-900">Replay</h2>
          <p className="text-sm text-ink-600">Grades the stored test again under {v.profile.slug}@{v.profile.version} and compares the result with the stored digest.</p>
          <ReplayPanel verdictId={v.id} />
        </section>
      )}

      <section aria-labelledby="json-title" className="space-y-2">
        <h2 id="json-title" className="text-sm font-semibold text-ink-900">Submitted test</h2>
        <details className="rounded-md border border-ink-100 bg-white">
          <summary className="cursor-pointer px-4 py-2 text-sm font-medium text-ink-800">Show the test as JSON</summary>
          <pre className="max-h-[32rem] overflow-auto border-t border-ink-100 bg-ink-50 p-4 text-xs leading-relaxed" tabIndex={0} aria-label="Submitted test JSON">{JSON.stringify(v.test, null, 2)}</pre>
        </details>
      </section>

      <LaserSafetyNotice />
    </div>
  );
}
