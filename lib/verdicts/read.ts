// Reading verdicts: one by id, or a filtered page with an opaque cursor on the chain position.
import type { Database } from "@/db";
import { findVerdict, listVerdicts } from "@/db/queries/verdicts";
import type { VerdictListQuery, VerdictResource } from "@/lib/api/schemas/verdicts";
import { splitProfileRef } from "@/lib/profiles/resolve";
import { toVerdictResource } from "./present";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export function isUuid(s: string): boolean {
  return UUID.test(s);
}

export async function getVerdict(db: Database, organisationId: string, id: string): Promise<VerdictResource | null> {
  // A malformed id cannot name a verdict: answer like any unknown id instead of asking the database.
  if (!isUuid(id)) return null;
  const row = await findVerdict(db, organisationId, id);
  return row ? toVerdictResource(row) : null;
}

export function encodeCursor(seq: number): string {
  return Buffer.from(JSON.stringify({ s: seq })).toString("base64url");
}

export function decodeCursor(cursor: string): number | null {
  try {
    const v = JSON.parse(Buffer.from(cursor, "base64url").toString("utf8")) as { s?: unknown };
    return typeof v.s === "number" && Number.isSafeInteger(v.s) && v.s > 0 ? v.s : null;
  } catch {
    return null;
  }
}

export class BadCursorError extends Error {}

export async function listVerdictPage(
  db: Database,
  organisationId: string,
  q: VerdictListQuery,
): Promise<{ data: VerdictResource[]; nextCursor: string | null }> {
  let beforeSeq: number | undefined;
  if (q.cursor !== undefined) {
    const s = decodeCursor(q.cursor);
    if (s === null) throw new BadCursorError("cursor is not one this API issued");
    beforeSeq = s;
  }
  const ref = q.profile ? splitProfileRef(q.profile) : null;
  // One extra row tells whether another page exists without a count query.
  const rows = await listVerdicts(
    db,
    organisationId,
    {
      verdict: q.verdict,
      profileSlug: ref?.slug,
      profileVersion: ref?.version,
      linkRef: q.linkRef,
      from: q.from ? new Date(q.from) : undefined,
      to: q.to ? new Date(q.to) : undefined,
      beforeSeq,
    },
    q.limit + 1,
  );
  const page = rows.slice(0, q.limit);
  const nextCursor = rows.length > q.limit ? encodeCursor(page[page.length - 1].seq) : null;
  return { data: page.map(toVerdictResource), nextCursor };
}
