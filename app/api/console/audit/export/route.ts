// POST /api/console/audit/export — build an audit pack for a time range (NDJSON progress, then a token);
// GET  /api/console/audit/export?token= — download the built pack as a tar, once.
import { randomBytes } from "node:crypto";
import { Readable } from "node:stream";
import { getDb } from "@/db";
import { withConsoleSession } from "@/lib/auth/console-route";
import { buildAuditPack, openBuiltPack, packTarStream, sweepStalePacks } from "@/lib/audit/export";
import { ndjsonResponse, type StreamEvent } from "@/lib/profiles/ndjson";
import { authorise } from "@/lib/profiles/access";
import { PackTokenSchema, TimeRangeSchema, toDates } from "@/lib/profiles/requests";

export const dynamic = "force-dynamic";

export const POST = withConsoleSession(async ({ member, req }) => {
  authorise(member, "audit:export");
  const range = TimeRangeSchema.parse(await req.json().catch(() => ({})));
  const ctx = { db: getDb(), actor: member };
  const token = randomBytes(16).toString("hex");
  await sweepStalePacks();
  async function* events(): AsyncGenerator<StreamEvent> {
    // Progress callbacks arrive during the build; they are queued and flushed between awaits.
    const queue: StreamEvent[] = [];
    let wake: (() => void) | undefined;
    let finished: { manifest: unknown } | { error: unknown } | undefined;
    buildAuditPack(ctx, toDates(range), (done, total) => {
      queue.push({ type: "progress", done, total });
      wake?.();
    }, { token })
      .then((p) => (finished = { manifest: p.manifest }))
      .catch((error) => (finished = { error }))
      .finally(() => wake?.());
    while (true) {
      while (queue.length) yield queue.shift()!;
      if (finished) break;
      await new Promise<void>((r) => (wake = r));
      wake = undefined;
    }
    while (queue.length) yield queue.shift()!;
    if ("error" in finished) throw finished.error;
    yield { type: "result", token, manifest: finished.manifest, download: `/api/console/audit/export?token=${token}` };
  }
  return ndjsonResponse(events(), req.signal);
});

export const GET = withConsoleSession(async ({ member, url }) => {
  const { token } = PackTokenSchema.parse(Object.fromEntries(url.searchParams));
  const pack = await openBuiltPack({ db: getDb(), actor: member }, token);
  const stamp = pack.manifest.generatedAt.slice(0, 19).replace(/[:T]/g, "-");
  const body = Readable.toWeb(packTarStream(pack)) as ReadableStream<Uint8Array>;
  return new Response(body, {
    headers: {
      "content-type": "application/x-tar",
      "content-disposition": `attachment; filename="glassgrade-audit-pack-${stamp}.tar"`,
      "cache-control": "no-store",
    },
  });
});
