// Long console jobs (impact preview, bulk replay, chain check, pack building) answer as a stream of
// newline-delimited JSON events: progress lines, then one result line, or an error line. The first event
// is pulled before the response starts, so a refusal (role, bad input) is still an ordinary error response.
export type StreamEvent = { type: string } & Record<string, unknown>;

export async function ndjsonResponse(events: AsyncGenerator<StreamEvent>, signal?: AbortSignal): Promise<Response> {
  const first = await events.next();
  const enc = new TextEncoder();
  const line = (ev: unknown) => enc.encode(JSON.stringify(ev) + "\n");
  const stream = new ReadableStream<Uint8Array>({
    start(c) {
      if (first.done) c.close();
      else c.enqueue(line(first.value));
    },
    async pull(c) {
      try {
        if (signal?.aborted) {
          await events.return(undefined);
          c.close();
          return;
        }
        const next = await events.next();
        if (next.done) c.close();
        else c.enqueue(line(next.value));
      } catch (err) {
        console.error("[ndjson]", err);
        c.enqueue(line({ type: "error", message: "The job stopped on an internal error; nothing was changed." }));
        c.close();
      }
    },
    async cancel() {
      await events.return(undefined);
    },
  });
  return new Response(stream, {
    headers: { "content-type": "application/x-ndjson; charset=utf-8", "cache-control": "no-store", "x-content-type-options": "nosniff" },
  });
}
