import type { Metadata } from "next";
import Link from "next/link";
import { Card } from "@/components/console/overview/card";
import { StackedBars } from "@/components/console/overview/stacked-bars";
import { formatDateTime } from "@/components/console/format";
import { LaserSafetyNotice } from "@/components/laser-safety-notice";
import { Badge } from "@/components/ui/badge";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/states";
import { requireMember } from "@/lib/auth/session";
import { can } from "@/lib/auth/roles";
import { getOverview } from "@/lib/overview/queries";

export const metadata: Metadata = { title: "Overview" };
export const dynamic = "force-dynamic";

const VERDICT_SERIES = [
  { key: "pass" as const, label: "Pass", fill: "fill-verdict-pass" },
  { key: "marginal" as const, label: "Marginal", fill: "fill-verdict-marginal" },
  { key: "fail" as const, label: "Fail", fill: "fill-verdict-fail" },
];
const CALL_SERIES = [
  { key: "2xx" as const, label: "2xx", fill: "fill-lumen-500" },
  { key: "4xx" as const, label: "4xx", fill: "fill-verdict-marginal" },
  { key: "5xx" as const, label: "5xx", fill: "fill-verdict-fail" },
];

export default async function OverviewPage() {
  const m = await requireMember("overview:read");
  const o = await getOverview({ actor: m });
  const total = o.totals.pass + o.totals.marginal + o.totals.fail;
  const pct = (n: number) => (total ? `${Math.round((n / total) * 100)}%` : "—");
  const maxReason = Math.max(1, ...o.topReasons.map((r) => r.n));
  const calls = o.callsPerDay.reduce((s, d) => s + d["2xx"] + d["4xx"] + d["5xx"], 0);
  const canKeys = can(m.role, "keys:manage-own");
  return (
    <>
      <PageHeader title="Overview" description={`${m.organisationName}, last ${o.days} days (UTC).`} />
      <dl className="mb-4 grid grid-cols-2 gap-3 lg:grid-cols-4">
        {[
          ["Verdicts", String(total)],
          ["Pass", `${o.totals.pass} · ${pct(o.totals.pass)}`],
          ["Marginal", `${o.totals.marginal} · ${pct(o.totals.marginal)}`],
          ["Fail", `${o.totals.fail} · ${pct(o.totals.fail)}`],
        ].map(([k, v]) => (
          <div key={k} className="rounded-md border border-ink-100 bg-white px-4 py-3">
            <dt className="text-xs uppercase tracking-wide text-ink-600">{k}</dt>
            <dd className="mt-0.5 text-lg font-semibold tabular-nums text-ink-900">{v}</dd>
          </div>
        ))}
      </dl>
      <div className="grid gap-4 lg:grid-cols-2">
        <Card title="Verdicts per day">
          {total ? <StackedBars title="Verdicts per day" data={o.verdictsPerDay} series={VERDICT_SERIES} /> : (
            <EmptyState title="No verdicts yet">Verdicts appear once a system posts tests to <code>POST /api/v1/gradings</code>{canKeys && <> with one of your <Link className="underline" href="/console/keys">API keys</Link></>}.</EmptyState>
          )}
        </Card>
        <Card title="API calls per day" aside={o.callsOwnOnly ? "your keys only" : "whole organisation"}>
          {calls ? <StackedBars title="API calls per day" data={o.callsPerDay} series={CALL_SERIES} /> : <EmptyState title="No calls yet">Calls made with API keys are counted here.</EmptyState>}
        </Card>
        <Card title="Top reason codes" aside="findings that made links marginal or fail">
          {o.topReasons.length ? (
            <ol className="space-y-1.5">
              {o.topReasons.map((r) => (
                <li key={r.code} className="grid grid-cols-[minmax(0,14rem)_1fr_3rem] items-center gap-2 text-sm">
                  <code className="truncate text-xs" title={r.code}>{r.code}</code>
                  <span aria-hidden className="h-2 rounded bg-verdict-marginal/70" style={{ width: `${(r.n / maxReason) * 100}%` }} />
                  <span className="text-right tabular-nums">{r.n}</span>
                </li>
              ))}
            </ol>
          ) : <p className="text-sm text-ink-600">No reasons recorded against non-passing links in this period.</p>}
        </Card>
        <Card title="Recent failures">
          {o.recentFailures.length ? (
            <ul className="divide-y divide-ink-100 text-sm">
              {o.recentFailures.map((f) => (
                <li key={f.id} className="flex flex-wrap items-center justify-between gap-2 py-1.5">
                  <span className="flex items-center gap-2">
                    <Badge tone={f.verdict}>{f.verdict}</Badge>
                    <Link href={`/console/verdicts/${f.id}`} className="font-medium text-ink-900 underline-offset-2 hover:underline">{f.linkRef}</Link>
                  </span>
                  <span className="text-xs text-ink-600">{f.reasonCodes.slice(0, 2).join(", ")}{f.reasonCodes.length > 2 ? ` +${f.reasonCodes.length - 2}` : ""} · {formatDateTime(f.createdAt)}</span>
                </li>
              ))}
            </ul>
          ) : <p className="text-sm text-ink-600">No marginal or failed links. </p>}
        </Card>
      </div>
      <div className="mt-6">
        <LaserSafetyNotice compact />
      </div>
    </>
  );
}
