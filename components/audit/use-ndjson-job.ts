"use client";
// Runs a long console job that answers with NDJSON (progress lines, then a result or an error line) and
// exposes its state to a component: idle, running with progress, done with a result, or failed.
import { useCallback, useRef, useState } from "react";

export type JobState<R> =
  | { status: "idle" }
  | { status: "running"; done: number; total: number | null }
  | { status: "done"; result: R }
  | { status: "failed"; message: string; fieldErrors?: { pointer: string; message: string }[] }
  | { status: "cancelled" };

export function useNdjsonJob<R>(url: string, pick: (event: Record<string, unknown>) => R | undefined) {
  const [state, setState] = useState<JobState<R>>({ status: "idle" });
  const abort = useRef<AbortController | null>(null);

  const start = useCallback(
    async (body: unknown) => {
      abort.current?.abort();
      const ctl = new AbortController();
      abort.current = ctl;
      setState({ status: "running", done: 0, total: null });
      try {
        const res = await fetch(url, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body ?? {}), signal: ctl.signal });
        if (!res.ok || !res.body) {
          const problem = await res.json().catch(() => null);
          setState({ status: "failed", message: problem?.detail ?? `The server answered ${res.status}.`, fieldErrors: problem?.errors });
          return;
        }
        const reader = res.body.pipeThrough(new TextDecoderStream()).getReader();
        let buffer = "";
        let finished = false;
        while (!finished) {
          const { value, done } = await reader.read();
          if (done) break;
          buffer += value;
          let nl: number;
          while ((nl = buffer.indexOf("\n")) >= 0) {
            const line = buffer.slice(0, nl).trim();
            buffer = buffer.slice(nl + 1);
            if (!line) continue;
            const ev = JSON.parse(line) as Record<string, unknown>;
            if (ev.type === "progress") setState({ status: "running", done: Number(ev.done), total: ev.total === undefined ? null : Number(ev.total) });
            else if (ev.type === "error") {
              setState({ status: "failed", message: String(ev.message) });
              finished = true;
            } else {
              const r = pick(ev);
              if (r !== undefined) {
                setState({ status: "done", result: r });
                finished = true;
              }
            }
          }
        }
        if (!finished) setState({ status: "failed", message: "The connection closed before the job finished. Try again." });
      } catch (err) {
        if ((err as Error).name === "AbortError") setState({ status: "cancelled" });
        else setState({ status: "failed", message: "Could not reach the server. Check your connection and try again." });
      }
    },
    [url, pick],
  );

  const cancel = useCallback(() => abort.current?.abort(), []);
  return { state, start, cancel };
}
