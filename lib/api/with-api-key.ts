// The only way to export a /api/v1 handler: request id, key, scope, rate limit, body, idempotency, error
// mapping and exactly one call-log row per request, in that order.
import { getDb, type Database } from "@/db";
import { insertCallLog } from "@/db/queries/call-log";
import type { KeyRecord } from "@/db/queries/api-keys";
import type { ApiScope } from "@/lib/keys/api-key";
import { touchLastUsed, verifyApiKey } from "@/lib/keys/verify";
import { describeDatabaseError, isDatabaseUnavailable } from "./db-errors";
import { parseIdempotencyKey, reserve, settle } from "./idempotency";
import { ApiError, problemResponse, type ProblemCode } from "./problem";
import { TokenBucketLimiter, rateLimitHeaders } from "./rate-limit";
import { DEFAULT_MAX_BODY_BYTES, parseJsonText, readBodyText, validate } from "./read-body";
import { requestIdFor } from "./request-id";
import type { z } from "zod";

export interface CallRecord {
  verdictId?: string;
}

interface BaseContext {
  req: Request;
  url: URL;
  requestId: string;
  db: Database;
  now: Date;
  /** Filled by the handler; lands on the call-log row. */
  record: CallRecord;
}

export interface ApiContext extends BaseContext {
  key: KeyRecord;
  organisationId: string;
  /** The raw body text, already read with the route's size cap ("" when none was sent). */
  bodyText: string;
  /** Body parsed as JSON (400 when it is not) and validated (422 with a pointer per field). */
  body<S extends z.ZodType>(schema: S): z.output<S>;
}

type RouteParams = Record<string, string | string[]>;
type NextContext<P> = { params: Promise<P> };

export interface ApiOptions {
  /** Path template used in the call log and the OpenAPI document, e.g. "/api/v1/verdicts/{id}". */
  route: string;
  scope: ApiScope;
  maxBodyBytes?: number;
}

const limiter = new TokenBucketLimiter();
/** For tests: forget all rate-limit state of this process. */
export function resetRateLimits() {
  limiter.reset();
}

function withHeaders(res: Response, headers: Record<string, string>): Response {
  for (const [k, v] of Object.entries(headers)) res.headers.set(k, v);
  return res;
}

function errorResponse(err: unknown, requestId: string, instance: string): { res: Response; code: ProblemCode } {
  if (err instanceof ApiError) {
    return {
      res: problemResponse(err.code, err.detail, { instance, requestId, errors: err.extra.errors, headers: err.extra.headers }),
      code: err.code,
    };
  }
  if (isDatabaseUnavailable(err)) {
    console.error(`[api] ${requestId} database unavailable:`, describeDatabaseError(err));
    return {
      res: problemResponse("database_unavailable", "The database did not answer; nothing was stored. Retry later.", {
        instance,
        requestId,
        headers: { "Retry-After": "5" },
      }),
      code: "database_unavailable",
    };
  }
  // The real error goes to the server log with the request id; the caller gets a fixed text.
  console.error(`[api] ${requestId} unhandled error:`, err);
  return {
    res: problemResponse("internal_error", `Something went wrong on our side. Quote request id ${requestId} when reporting it.`, {
      instance,
      requestId,
    }),
    code: "internal_error",
  };
}

async function writeCallLog(
  db: Database,
  req: Request,
  url: URL,
  route: string,
  started: number,
  requestId: string,
  status: number,
  problemCode: ProblemCode | null,
  key: KeyRecord | null,
  record: CallRecord,
) {
  try {
    await insertCallLog(db, {
      organisationId: key?.organisationId ?? null,
      apiKeyId: key?.id ?? null,
      method: req.method,
      route,
      path: url.pathname,
      status,
      latencyMs: Math.round((performance.now() - started) * 100) / 100,
      requestId,
      verdictId: record.verdictId ?? null,
      problemType: problemCode,
    });
  } catch (err) {
    // The response still goes out (e.g. the 503 that explains the database is down).
    console.error(`[api] ${requestId} call-log write failed:`, describeDatabaseError(err));
  }
}

export function withApiKey<P extends RouteParams = Record<string, never>>(
  handler: (ctx: ApiContext, params: P) => Promise<Response>,
  opts: ApiOptions,
) {
  return async function apiRoute(req: Request, nextCtx: NextContext<P>): Promise<Response> {
    const started = performance.now();
    const requestId = requestIdFor(req);
    const url = new URL(req.url);
    const now = new Date();
    const db = getDb();
    const record: CallRecord = {};
    let key: KeyRecord | null = null;
    let res: Response;
    let problemCode: ProblemCode | null = null;
    let rateHeaders: Record<string, string> = {};
    try {
      const check = await verifyApiKey(db, req.headers.get("authorization"), opts.scope, now);
      if (check.key) key = check.key;
      if (!check.ok) {
        throw new ApiError(check.code, check.detail, check.code === "unauthorized" ? { headers: { "WWW-Authenticate": 'Bearer realm="glassgrade"' } } : {});
      }
      const k = check.key;
      touchLastUsed(db, k, now);
      const decision = limiter.take(k.id, k.rateLimitPerMinute, now.getTime());
      rateHeaders = rateLimitHeaders(decision);
      if (!decision.allowed) {
        throw new ApiError("rate_limited", `This key allows ${decision.limit} requests per minute; retry after ${decision.retryAfterSeconds} s.`);
      }
      const bodyText = req.method === "GET" || req.method === "HEAD" ? "" : await readBodyText(req, opts.maxBodyBytes ?? DEFAULT_MAX_BODY_BYTES);
      const ctx: ApiContext = {
        req,
        url,
        requestId,
        db,
        now,
        record,
        key: k,
        organisationId: k.organisationId,
        bodyText,
        body: (schema) => validate(schema, parseJsonText(bodyText)),
      };
      const params = (await nextCtx?.params) ?? ({} as P);
      const idemKey = req.method === "POST" ? parseIdempotencyKey(req.headers.get("idempotency-key")) : null;
      if (idemKey) {
        const r = await reserve(db, { apiKeyId: k.id, organisationId: k.organisationId, key: idemKey, route: opts.route, body: bodyText }, now);
        if (r.kind === "replay") {
          res = r.response;
        } else {
          try {
            res = await handler(ctx, params);
          } catch (err) {
            await settle(db, k.id, idemKey, new Response(null, { status: 500 })).catch(() => undefined);
            throw err;
          }
          await settle(db, k.id, idemKey, res);
        }
      } else {
        res = await handler(ctx, params);
      }
    } catch (err) {
      const e = errorResponse(err, requestId, url.pathname);
      res = e.res;
      problemCode = e.code;
    }
    withHeaders(res, { ...rateHeaders, "X-Request-Id": requestId });
    if (!res.headers.has("cache-control")) res.headers.set("Cache-Control", "no-store");
    await writeCallLog(db, req, url, opts.route, started, requestId, res.status, problemCode, key, record);
    return res;
  };
}

/** Public routes (health, the OpenAPI document): no key, but the same request id, errors and call log. */
export function withPublic(handler: (ctx: BaseContext) => Promise<Response>, opts: { route: string }) {
  return async function publicRoute(req: Request): Promise<Response> {
    const started = performance.now();
    const requestId = requestIdFor(req);
    const url = new URL(req.url);
    const db = getDb();
    const record: CallRecord = {};
    let res: Response;
    let problemCode: ProblemCode | null = null;
    try {
      res = await handler({ req, url, requestId, db, now: new Date(), record });
    } catch (err) {
      const e = errorResponse(err, requestId, url.pathname);
      res = e.res;
      problemCode = e.code;
    }
    res.headers.set("X-Request-Id", requestId);
    await writeCallLog(db, req, url, opts.route, started, requestId, res.status, problemCode, null, record);
    return res;
  };
}
