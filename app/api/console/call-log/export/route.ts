// GET /api/console/call-log/export — the whole filtered call log as CSV, streamed.
import { withConsoleSession } from "@/lib/auth/console-route";
import { allCalls } from "@/lib/calllog/query";
import { csvHeader, csvRow } from "@/lib/calllog/csv";
import { parseCallLogQuery } from "@/lib/calllog/schemas";

export const dynamic = "force-dynamic";
export const GET = withConsoleSession(async ({ member, url }) => {
  const query = parseCallLogQuery(url.searchParams);
  const rows = allCalls({ actor: member }, query);
  // Pull the first row before answering so a permission error becomes a proper problem response.
  const first = await rows.next();
  const enc = new TextEncoder();
  const stream = new ReadableStream<Uint8Array>({
    start(c) {
      c.enqueue(enc.encode(csvHeader()));
      if (!first.done) c.enqueue(enc.encode(csvRow(first.value)));
    },
    async pull(c) {
      const next = await rows.next();
      if (next.done) c.close();
      else c.enqueue(enc.encode(csvRow(next.value)));
    },
  });
  const stamp = new Date().toISOString().slice(0, 19).replace(/[:T]/g, "-");
  return new Response(stream, {
    headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="glassgrade-call-log-${stamp}.csv"`, "cache-control": "no-store" },
  });
});
