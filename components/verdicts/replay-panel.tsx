"use client";
// Replays one verdict on demand and shows either "reproduced" or the differences field by field.
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { ErrorState } from "@/components/ui/states";
import type { ReplayOutcome } from "@/lib/audit/replay";
import { replayVerdictAction } from "@/app/(console)/console/verdicts/actions";

export function ReplayOutcomeView({ outcome }: { outcome: ReplayOutcome }) {
  if (outcome.status === "reproduced") {
    return (
      <div role="status" data-replay="reproduced" className="rounded-md border border-verdict-pass/30 bg-verdict-pass/5 px-4 py-3 text-sm">
        <p className="font-semibold text-verdict-pass">Reproduced</p>
        <p className="mt-1 text-ink-800">
          Re-graded under {outcome.profile} with engine {outcome.engineVersion}: the digest matches byte for byte
          (<span className="break-all font-mono text-xs">{outcome.replayedDigest}</span>).
        </p>
      </div>
    );
  }
  return (
    <div role="status" data-replay={outcome.status} className="rounded-md border border-verdict-fail/30 bg-verdict-fail/5 px-4 py-3 text-sm">
      <p className="font-semibold text-verdict-fail">{outcome.status === "changed" ? "Not reproduced" : "Could not replay"}</p>
      {outcome.problem && <p className="mt-1 text-ink-800">{outcome.problem}</p>}
      {outcome.storedEngineVersion !== outcome.engineVersion && (
        <p className="mt-1 text-ink-800">Stored under engine {outcome.storedEngineVersion}; this service runs {outcome.engineVersion}.</p>
      )}
      {outcome.differences.length > 0 && (
        <table className="mt-2 min-w-full text-left text-xs" aria-label="Differences between the stored and the replayed result">
          <thead><tr><th className="py-1 pr-3">Field</th><th className="py-1 pr-3">Stored</th><th className="py-1">Replayed</th></tr></thead>
          <tbody>
            {outcome.differences.slice(0, 50).map((d) => (
              <tr key={d.path} className="align-top">
                <td className="py-0.5 pr-3 font-mono">{d.path}</td>
                <td className="max-w-xs break-words py-0.5 pr-3">{JSON.stringify(d.before) ?? "–"}</td>
                <td className="max-w-xs break-words py-0.5">{JSON.stringify(d.after) ?? "–"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}

export function ReplayPanel({ verdictId }: { verdictId: string }) {
  const [busy, setBusy] = useState(false);
  const [outcome, setOutcome] = useState<ReplayOutcome | null>(null);
  const [error, setError] = useState<string | null>(null);
  const run = async () => {
    setBusy(true);
    setError(null);
    const r = await replayVerdictAction(verdictId);
    setBusy(false);
    if (r.ok) setOutcome(r.data);
    else setError(r.error);
  };
  return (
    <div className="space-y-3">
      <Button onClick={run} busy={busy}>Replay this verdict</Button>
      {error && <ErrorState title="Replay failed" onRetry={run}>{error}</ErrorState>}
      {outcome && <ReplayOutcomeView outcome={outcome} />}
    </div>
  );
}
