// The console's verdict search: filters on the columns copied out of each result, newest first, with the
// chain position as the cursor so pages do not shift while new verdicts arrive.
import { and, desc, eq, gte, lt, sql, type SQL } from "drizzle-orm";
import type { Database } from "../index";
import { verdicts } from "../schema";

export interface ExplorerFilter {
  verdict?: "pass" | "marginal" | "fail";
  profileSlug?: string;
  profileVersion?: number;
  linkRef?: string;
  reasonCode?: string;
  from?: Date;
  to?: Date;
  beforeSeq?: number;
}

export interface ExplorerRow {
  id: string;
  seq: number;
  linkRef: string;
  verdict: "pass" | "marginal" | "fail";
  headroomDb: number | null;
  profileSlug: string;
  profileVersion: number;
  engineVersion: string;
  reasonCodes: string[];
  createdAt: Date;
}

export async function searchVerdicts(db: Database, organisationId: string, f: ExplorerFilter, limit: number): Promise<ExplorerRow[]> {
  const cond: SQL[] = [eq(verdicts.organisationId, organisationId)];
  if (f.verdict) cond.push(eq(verdicts.verdict, f.verdict));
  if (f.profileSlug) cond.push(eq(verdicts.profileSlug, f.profileSlug));
  if (f.profileVersion !== undefined) cond.push(eq(verdicts.profileVersion, f.profileVersion));
  // Link references are typed by people: match a prefix, case-insensitively.
  if (f.linkRef) cond.push(sql`lower(${verdicts.linkRef}) like ${f.linkRef.toLowerCase().replace(/[\\%_]/g, "\\$&") + "%"}`);
  if (f.reasonCode) cond.push(sql`${verdicts.reasonCodes} @> array[${f.reasonCode}]::text[]`);
  if (f.from) cond.push(gte(verdicts.createdAt, f.from));
  if (f.to) cond.push(lt(verdicts.createdAt, f.to));
  if (f.beforeSeq !== undefined) cond.push(lt(verdicts.seq, f.beforeSeq));
  return db
    .select({
      id: verdicts.id,
      seq: verdicts.seq,
      linkRef: verdicts.linkRef,
      verdict: verdicts.verdict,
      headroomDb: verdicts.headroomDb,
      profileSlug: verdicts.profileSlug,
      profileVersion: verdicts.profileVersion,
      engineVersion: verdicts.engineVersion,
      reasonCodes: verdicts.reasonCodes,
      createdAt: verdicts.createdAt,
    })
    .from(verdicts)
    .where(and(...cond))
    .orderBy(desc(verdicts.seq))
    .limit(limit);
}

/** Reason codes and profiles in use, for the filter menus. */
export async function explorerFacets(db: Database, organisationId: string): Promise<{ reasonCodes: string[]; profiles: string[] }> {
  const codes = await db.execute<{ code: string }>(
    sql`select distinct unnest(reason_codes) as code from verdicts where organisation_id = ${organisationId} order by 1 limit 200`,
  );
  const profiles = await db.execute<{ ref: string }>(
    sql`select distinct profile_slug || '@' || profile_version as ref from verdicts where organisation_id = ${organisationId} order by 1 limit 200`,
  );
  return { reasonCodes: codes.rows.map((r) => r.code), profiles: profiles.rows.map((r) => r.ref) };
}

export async function findVerdictDetail(db: Database, organisationId: string, id: string) {
  const res = await db.execute(sql`
    select v.id, v.seq, v.link_ref as "linkRef", v.verdict, v.headroom_db as "headroomDb", v.profile_slug as "profileSlug",
           v.profile_version as "profileVersion", v.engine_version as "engineVersion", v.result, v.digest,
           v.prev_digest as "prevDigest", v.created_at as "createdAt", v.api_key_id as "apiKeyId", t.input, t.id as "testId"
    from verdicts v join tests t on t.id = v.test_id
    where v.organisation_id = ${organisationId} and v.id = ${id}`);
  return res.rows[0] as
    | { id: string; seq: number; linkRef: string; verdict: string; headroomDb: number | null; profileSlug: string; profileVersion: number; engineVersion: string; result: unknown; digest: string; prevDigest: string | null; createdAt: string | Date; apiKeyId: string | null; input: unknown; testId: string }
    | undefined;
}
