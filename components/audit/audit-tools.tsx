"use client";
// The auditor's three tools: verify the chain, replay a period in bulk, export an audit pack. Each runs as
// a streamed job with a progress bar, and can be cancelled.
import Link from "next/link";
import { useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { ErrorState } from "@/components/ui/states";
import type { ChainReport } from "@/lib/audit/chain";
import type { PackManifest } from "@/lib/audit/export";
import type { BulkReplaySummary } from "@/lib/audit/replay";
import { ReplayOutcomeView } from "@/components/verdicts/replay-panel";
import { ProgressBar } from "./progress-bar";
import { useNdjsonJob, type JobState } from "./use-ndjson-job";

const pickChain = (ev: Record<string, unknown>) => (ev.type === "result" ? (ev.report as ChainReport) : undefined);
const pickReplay = (ev: Record<string, unknown>) => (ev.type === "result" ? (ev.summary as BulkReplaySummary) : undefined);
const pickPack = (ev: Record<string, unknown>) => (ev.type === "result" ? { manifest: ev.manifest as PackManifest, download: String(ev.download) } : undefined);

function Running<R>({ state, label, cancel }: { state: JobState<R>; label: string; cancel: () => void }) {
  if (state.status === "running") {
    return (
      <div className="space-y-2">
        <ProgressBar done={state.done} total={state.total} label={label} />
        <Button variant="secondary" size="sm" onClick={cancel}>Cancel</Button>
      </div>
    );
  }
  if (state.status === "failed") {
    return (
      <ErrorState title={`${label} failed`}>
        {state.message}
        {state.fieldErrors?.length ? <ul className="mt-1 list-disc pl-5">{state.fieldErrors.map((e, i) => <li key={i}>{e.pointer.slice(1) || "input"}: {e.message}</li>)}</ul> : null}
      </ErrorState>
    );
  }
  if (state.status === "cancelled") return <p className="text-sm text-ink-600">Cancelled.</p>;
  return null;
}

function RangeInputs({ from, to, setFrom, setTo }: { from: string; to: string; setFrom: (v: string) => void; setTo: (v: string) => void }) {
  const ids = { from: useId(), to: useId() };
  const control = "rounded-md border border-ink-200 bg-white px-2 py-1.5 text-sm";
  return (
    <>
      <div className="space-y-0.5">
        <label htmlFor={ids.from} className="block text-xs font-medium text-ink-800">From (blank: the beginning)</label>
        <input id={ids.from} type="datetime-local" value={from} onChange={(e) => setFrom(e.target.value)} className={control} />
      </div>
      <div className="space-y-0.5">
        <label htmlFor={ids.to} className="block text-xs font-medium text-ink-800">To (blank: now)</label>
        <input id={ids.to} type="datetime-local" value={to} onChange={(e) => setTo(e.target.value)} className={control} />
      </div>
    </>
  );
}

const iso = (v: string) => (v ? new Date(v).toISOString() : undefined);

function Card({ title, description, children, id }: { title: string; description: string; children: React.ReactNode; id: string }) {
  return (
    <section aria-labelledby={id} className="space-y-3 rounded-lg border border-ink-100 bg-white p-4">
      <div>
        <h2 id={id} className="text-base font-semibold text-ink-900">{title}</h2>
        <p className="mt-0.5 text-sm text-ink-600">{description}</p>
      </div>
      {children}
    </section>
  );
}

export function ChainCheck() {
  const { state, start, cancel } = useNdjsonJob<ChainReport>("/api/console/audit/chain", pickChain);
  return (
    <Card id="chain-title" title="Verify the audit chain" description="Walks every verdict in order: each stored result must hash to its digest, point at the digest before it, and agree with the columns the console filters on.">
      {state.status !== "running" && <Button onClick={() => start({})}>Verify chain</Button>}
      <Running state={state} label="Chain check" cancel={cancel} />
      {state.status === "done" && (state.result.intact ? (
        <div role="status" data-chain="intact" className="rounded-md border border-verdict-pass/30 bg-verdict-pass/5 px-4 py-3 text-sm">
          <p className="font-semibold text-verdict-pass">Chain intact</p>
          <p className="mt-1">{state.result.checked.toLocaleString("en-GB")} verdicts checked{state.result.headSeq ? <>; head is seq {state.result.headSeq}, digest <span className="break-all font-mono text-xs">{state.result.headDigest}</span></> : ""}.</p>
        </div>
      ) : (
        <div role="alert" data-chain="broken" className="rounded-md border border-verdict-fail/30 bg-verdict-fail/5 px-4 py-3 text-sm">
          <p className="font-semibold text-verdict-fail">Chain broken at seq {state.result.firstBroken!.seq}</p>
          <p className="mt-1">
            Verdict <Link className="font-mono text-xs text-lumen-700 underline" href={`/console/verdicts/${state.result.firstBroken!.verdictId}`}>{state.result.firstBroken!.verdictId}</Link> (link {state.result.firstBroken!.linkRef}): {state.result.firstBroken!.problem.replace(/_/g, " ")}, {state.result.firstBroken!.detail}.
          </p>
          <p className="mt-1 text-ink-600">{state.result.checked.toLocaleString("en-GB")} verdicts checked up to this one. Everything after it is unverified.</p>
        </div>
      ))}
    </Card>
  );
}

export function BulkReplay() {
  const { state, start, cancel } = useNdjsonJob<BulkReplaySummary>("/api/console/audit/replay", pickReplay);
  const [from, setFrom] = useState("");
  const [to, setTo] = useState("");
  return (
    <Card id="replay-title" title="Replay a period" description="Re-grades every verdict of the period under the exact profile version it names and compares digests. Nothing is written.">
      <div className="flex flex-wrap items-end gap-3">
        <RangeInputs from={from} to={to} setFrom={setFrom} setTo={setTo} />
        {state.status !== "running" && <Button onClick={() => start({ from: iso(from), to: iso(to) })}>Replay</Button>}
      </div>
      <Running state={state} label="Bulk replay" cancel={cancel} />
      {state.status === "done" && (
        <div className="space-y-3" data-testid="bulk-replay-result">
          <dl className="grid max-w-xl grid-cols-3 gap-3 text-center">
            <div className="rounded-md border border-verdict-pass/30 bg-verdict-pass/5 p-3"><dt className="text-xs text-ink-600">Reproduced</dt><dd className="text-2xl font-semibold tabular-nums text-verdict-pass" data-count="reproduced">{state.result.reproduced.toLocaleString("en-GB")}</dd></div>
            <div className="rounded-md border border-verdict-fail/30 bg-verdict-fail/5 p-3"><dt className="text-xs text-ink-600">Changed</dt><dd className="text-2xl font-semibold tabular-nums text-verdict-fail" data-count="changed">{state.result.changed.toLocaleString("en-GB")}</dd></div>
            <div className="rounded-md border border-ink-200 bg-ink-50 p-3"><dt className="text-xs text-ink-600">Could not replay</dt><dd className="text-2xl font-semibold tabular-nums text-ink-800">{state.result.unavailable.toLocaleString("en-GB")}</dd></div>
          </dl>
          {state.result.total === 0 && <p className="text-sm text-ink-600">No verdicts in this period.</p>}
          {state.result.notReproduced.slice(0, 20).map((o) => (
            <div key={o.verdictId}>
              <p className="mb-1 text-sm"><Link className="font-medium text-lumen-700 underline" href={`/console/verdicts/${o.verdictId}`}>{o.linkRef}</Link> <span className="text-ink-600">seq {o.seq}</span></p>
              <ReplayOutcomeView outcome={o} />
            </div>
          ))}
        </div>
      )}
    </Card>
  );
}

export function PackExport({ allowed }: { allowed: boolean }) {
  const { state, start, cancel } = useNdjsonJob<{ manifest: PackManifest; download: string }>("/api/console/audit/export", pickPack);
  const [from, setFrom] = useState("");
  const [to, setTo] = useState("");
  return (
    <Card id="export-title" title="Export an audit pack" description="Verdicts and the tests behind them for a period, as JSON lines and CSV, with a manifest of SHA-256 digests and a SHA256SUMS file you can check with sha256sum -c. Downloaded once as a tar archive.">
      {!allowed ? (
        <p className="text-sm text-ink-600">Exports are for administrators and auditors.</p>
      ) : (
        <>
          <div className="flex flex-wrap items-end gap-3">
            <RangeInputs from={from} to={to} setFrom={setFrom} setTo={setTo} />
            {state.status !== "running" && <Button onClick={() => start({ from: iso(from), to: iso(to) })}>Build pack</Button>}
          </div>
          <Running state={state} label="Audit pack" cancel={cancel} />
          {state.status === "done" && (
            <div role="status" className="space-y-2 rounded-md border border-lumen-100 bg-lumen-50 px-4 py-3 text-sm">
              <p>
                Pack ready: {state.result.manifest.counts.verdicts.toLocaleString("en-GB")} verdicts and {state.result.manifest.counts.tests.toLocaleString("en-GB")} tests
                {state.result.manifest.chain.firstSeq !== null && <> (seq {state.result.manifest.chain.firstSeq}–{state.result.manifest.chain.lastSeq})</>}.
              </p>
              <a href={state.result.download} download className="inline-flex rounded-md bg-ink-800 px-3.5 py-2 font-medium text-white hover:bg-ink-900">Download the pack (.tar)</a>
              <ul className="font-mono text-xs text-ink-600">
                {state.result.manifest.files.map((f) => <li key={f.name}>{f.sha256}  {f.name} ({f.rows} rows)</li>)}
              </ul>
            </div>
          )}
        </>
      )}
    </Card>
  );
}
