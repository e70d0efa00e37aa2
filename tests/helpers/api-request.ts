// Calls an exported route handler in-process, the way Next.js would, with a real Request.
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- each route types its own params
type Handler = (req: Request, ctx: { params: Promise<any> }) => Promise<Response>;

export interface CallOptions {
  method?: string;
  key?: string | null;
  body?: unknown;
  /** Sent as-is, without JSON encoding. */
  rawBody?: string;
  headers?: Record<string, string>;
  params?: Record<string, string>;
  query?: Record<string, string>;
}

export async function call(handler: Handler, path: string, opts: CallOptions = {}) {
  const url = new URL(path, "http://glassgrade.test");
  for (const [k, v] of Object.entries(opts.query ?? {})) url.searchParams.set(k, v);
  const headers = new Headers(opts.headers);
  if (opts.key) headers.set("authorization", `Bearer ${opts.key}`);
  let body: string | undefined;
  if (opts.rawBody !== undefined) body = opts.rawBody;
  else if (opts.body !== undefined) {
    body = JSON.stringify(opts.body);
    if (!headers.has("content-type")) headers.set("content-type", "application/json");
  }
  const res = await handler(new Request(url, { method: opts.method ?? (body === undefined ? "GET" : "POST"), headers, body }), {
    params: Promise.resolve(opts.params ?? {}),
  });
  const text = await res.text();
  let json: any = undefined;
  try {
    json = text ? JSON.parse(text) : undefined;
  } catch {
    /* not JSON */
  }
  return { status: res.status, headers: res.headers, text, json };
}
