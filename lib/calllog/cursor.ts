// Opaque keyset cursor: the sort value and id of the last row seen. Keyset (not offset) paging keeps
// pages stable while new calls arrive at the top.
export interface CallCursor {
  v: string | number;
  id: number;
}

export function encodeCursor(c: CallCursor): string {
  return Buffer.from(JSON.stringify(c), "utf8").toString("base64url");
}

export function decodeCursor(s: string | undefined): CallCursor | null {
  if (!s) return null;
  try {
    const c = JSON.parse(Buffer.from(s, "base64url").toString("utf8"));
    if (c && (typeof c.v === "string" || typeof c.v === "number") && Number.isInteger(c.id)) return c;
  } catch {
    /* fall through */
  }
  return null;
}
