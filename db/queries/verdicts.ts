// Verdict chain storage and reads. Every query is scoped by organisation.
import { and, desc, eq, gte, lt, sql, type SQL } from "drizzle-orm";
import type { Database } from "@/db";
import { tests, verdicts, type StoredVerdict } from "@/db/schema";

export type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];

/** Serialises chain appends per organisation for the rest of the transaction. */
export async function lockChain(tx: Tx, organisationId: string): Promise<void> {
  await tx.execute(sql`select pg_advisory_xact_lock(hashtextextended(${"verdict-chain:" + organisationId}, 0))`);
}

export async function chainHead(tx: Tx, organisationId: string): Promise<{ seq: number; digest: string } | null> {
  const [row] = await tx
    .select({ seq: verdicts.seq, digest: verdicts.digest })
    .from(verdicts)
    .where(eq(verdicts.organisationId, organisationId))
    .orderBy(desc(verdicts.seq))
    .limit(1);
  return row ?? null;
}

// 1,000 rows x 17 columns stays far below PostgreSQL's 65,535 bind parameters per statement.
const CHUNK = 1000;

export async function insertTestsAndVerdicts(
  tx: Tx,
  testRows: (typeof tests.$inferInsert)[],
  verdictRows: (typeof verdicts.$inferInsert)[],
): Promise<void> {
  for (let i = 0; i < testRows.length; i += CHUNK) await tx.insert(tests).values(testRows.slice(i, i + CHUNK));
  for (let i = 0; i < verdictRows.length; i += CHUNK) await tx.insert(verdicts).values(verdictRows.slice(i, i + CHUNK));
}

export async function findVerdict(db: Database, organisationId: string, id: string): Promise<StoredVerdict | null> {
  const [row] = await db
    .select()
    .from(verdicts)
    .where(and(eq(verdicts.organisationId, organisationId), eq(verdicts.id, id)))
    .limit(1);
  return row ?? null;
}

export async function findVerdictWithInput(
  db: Database,
  organisationId: string,
  id: string,
): Promise<{ verdict: StoredVerdict; input: unknown } | null> {
  const [row] = await db
    .select({ verdict: verdicts, input: tests.input })
    .from(verdicts)
    .innerJoin(tests, eq(tests.id, verdicts.testId))
    .where(and(eq(verdicts.organisationId, organisationId), eq(verdicts.id, id)))
    .limit(1);
  return row ?? null;
}

export interface VerdictFilter {
  verdict?: "pass" | "marginal" | "fail";
  profileSlug?: string;
  profileVersion?: number;
  linkRef?: string;
  from?: Date;
  to?: Date;
  /** Only rows strictly older in the chain than this seq (the cursor). */
  beforeSeq?: number;
}

/** Newest first by chain position: new verdicts get higher seq, so pages already read never shift. */
export async function listVerdicts(db: Database, organisationId: string, f: VerdictFilter, limit: number): Promise<StoredVerdict[]> {
  const cond: SQL[] = [eq(verdicts.organisationId, organisationId)];
  if (f.verdict) cond.push(eq(verdicts.verdict, f.verdict));
  if (f.profileSlug) cond.push(eq(verdicts.profileSlug, f.profileSlug));
  if (f.profileVersion !== undefined) cond.push(eq(verdicts.profileVersion, f.profileVersion));
  if (f.linkRef) cond.push(eq(verdicts.linkRef, f.linkRef));
  if (f.from) cond.push(gte(verdicts.createdAt, f.from));
  if (f.to) cond.push(lt(verdicts.createdAt, f.to));
  if (f.beforeSeq !== undefined) cond.push(lt(verdicts.seq, f.beforeSeq));
  return db
    .select()
    .from(verdicts)
    .where(and(...cond))
    .orderBy(desc(verdicts.seq))
    .limit(limit);
}
