import { and, asc, desc, eq, gte, inArray, isNotNull, lt, or, sql, type SQL } from "drizzle-orm";
import { getDb } from "@/db";
import { apiKeys, callLog, users } from "@/db/schema";
import { assertCan, type ActorContext, type Member } from "@/lib/auth/context";
import { InputError } from "@/lib/auth/errors";
import { can } from "@/lib/auth/roles";
import { decodeCursor, encodeCursor } from "./cursor";
import { callLogQuerySchema, type CallLogQuery } from "./schemas";

export interface CallRow {
  id: number;
  createdAt: string;
  method: string;
  route: string;
  path: string;
  status: number;
  latencyMs: number;
  requestId: string;
  verdictId: string | null;
  problemType: string | null;
  apiKeyId: string | null;
  keyName: string | null;
  keyStart: string | null;
  userName: string | null;
}

export interface CallPage {
  items: CallRow[];
  nextCursor: string | null;
}

/** Admins and auditors read the whole organisation's log; everyone else the calls of their own keys and their own calls. */
export function visibleTo(actor: Member): SQL {
  const org = eq(callLog.organisationId, actor.organisationId);
  if (can(actor.role, "calllog:read-all")) return org;
  const ownKeys = getDb().select({ id: apiKeys.id }).from(apiKeys).where(and(eq(apiKeys.organisationId, actor.organisationId), eq(apiKeys.createdByUserId, actor.userId)));
  return and(org, or(inArray(callLog.apiKeyId, ownKeys), eq(callLog.userId, actor.userId)))!;
}

const SORT_COLUMNS = { createdAt: callLog.createdAt, status: callLog.status, latencyMs: callLog.latencyMs, route: callLog.route } as const;

function filters(actor: Member, q: CallLogQuery): SQL[] {
  const conds: SQL[] = [visibleTo(actor)];
  if (q.status) {
    const lo = Number(q.status[0]) * 100;
    conds.push(gte(callLog.status, lo), lt(callLog.status, lo + 100));
  }
  if (q.route) conds.push(eq(callLog.route, q.route));
  if (q.keyId) conds.push(eq(callLog.apiKeyId, q.keyId));
  if (q.from) conds.push(gte(callLog.createdAt, new Date(q.from)));
  if (q.to) conds.push(lt(callLog.createdAt, new Date(q.to)));
  return conds;
}

const selection = {
  id: callLog.id,
  createdAt: callLog.createdAt,
  method: callLog.method,
  route: callLog.route,
  path: callLog.path,
  status: callLog.status,
  latencyMs: callLog.latencyMs,
  requestId: callLog.requestId,
  verdictId: callLog.verdictId,
  problemType: callLog.problemType,
  apiKeyId: callLog.apiKeyId,
  keyName: apiKeys.name,
  keyStart: apiKeys.start,
  userName: users.name,
  // Full microsecond precision for the cursor; a JS Date would round it to milliseconds and skip rows.
  createdAtExact: sql<string>`${callLog.createdAt}::text`,
};

function baseQuery(where: SQL) {
  return getDb()
    .select(selection)
    .from(callLog)
    .leftJoin(apiKeys, eq(apiKeys.id, callLog.apiKeyId))
    .leftJoin(users, eq(users.id, callLog.userId))
    .where(where);
}

type Raw = Awaited<ReturnType<typeof baseQuery>>[number];

function toRow({ createdAtExact: _exact, ...r }: Raw): CallRow {
  return { ...r, createdAt: r.createdAt.toISOString() };
}

function sortValue(r: Raw, sort: CallLogQuery["sort"]): string | number {
  return sort === "createdAt" ? r.createdAtExact : r[sort];
}

export async function listCalls({ actor }: ActorContext, input: unknown): Promise<CallPage> {
  assertCan(actor, "calllog:read-own");
  const q = callLogQuerySchema.parse(input);
  const conds = filters(actor, q);
  const col = SORT_COLUMNS[q.sort];
  if (q.cursor) {
    const c = decodeCursor(q.cursor);
    if (!c) throw new InputError("The page cursor is not valid; reload the first page.", "cursor");
    const v = q.sort === "createdAt" ? sql`${String(c.v)}::timestamptz` : q.sort === "route" ? String(c.v) : Number(c.v);
    // Row comparison (col, id) against the cursor, in the direction of the sort, with id as tie-breaker.
    conds.push(q.dir === "desc" ? sql`(${col}, ${callLog.id}) < (${v}, ${c.id})` : sql`(${col}, ${callLog.id}) > (${v}, ${c.id})`);
  }
  const order = q.dir === "desc" ? [desc(col), desc(callLog.id)] : [asc(col), asc(callLog.id)];
  const rows = await baseQuery(and(...conds)!).orderBy(...order).limit(q.limit + 1);
  const page = rows.slice(0, q.limit);
  const last = page[page.length - 1];
  return {
    items: page.map(toRow),
    nextCursor: rows.length > q.limit && last ? encodeCursor({ v: sortValue(last, q.sort), id: last.id }) : null,
  };
}

/** Every call of the filtered set, newest first, in pages, for the CSV export. */
export async function* allCalls({ actor }: ActorContext, input: unknown, max = 100_000): AsyncGenerator<CallRow> {
  assertCan(actor, "calllog:read-own");
  const q = callLogQuerySchema.parse({ ...(input as object), cursor: undefined, sort: "createdAt", dir: "desc" });
  let beforeId: number | null = null;
  let sent = 0;
  while (sent < max) {
    const conds = filters(actor, q);
    if (beforeId !== null) conds.push(lt(callLog.id, beforeId));
    const rows = await baseQuery(and(...conds)!).orderBy(desc(callLog.id)).limit(1000);
    if (!rows.length) return;
    for (const r of rows) {
      yield toRow(r);
      if (++sent >= max) return;
    }
    beforeId = rows[rows.length - 1].id;
  }
}

/** Routes and keys seen in the visible log, for the filter menus. */
export async function callLogFacets({ actor }: ActorContext): Promise<{ routes: string[]; keys: { id: string; name: string; start: string }[] }> {
  assertCan(actor, "calllog:read-own");
  const where = visibleTo(actor);
  const routes = await getDb().selectDistinct({ route: callLog.route }).from(callLog).where(where).orderBy(asc(callLog.route)).limit(200);
  const keys = await getDb()
    .selectDistinct({ id: apiKeys.id, name: apiKeys.name, start: apiKeys.start })
    .from(callLog)
    .innerJoin(apiKeys, eq(apiKeys.id, callLog.apiKeyId))
    .where(and(where, isNotNull(callLog.apiKeyId)))
    .orderBy(asc(apiKeys.name))
    .limit(200);
  return { routes: routes.map((r) => r.route), keys };
}
