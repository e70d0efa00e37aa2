import { desc, lt, sql } from "drizzle-orm";
import { getDb } from "@/db";
import { devMailbox } from "@/db/schema";

export interface MailboxMessage {
  id: number;
  from: string;
  to: string;
  subject: string;
  body: string;
  receivedAt: string;
}

/** The newest messages the development receiver caught, optionally for one recipient. */
export async function listMailbox(opts: { to?: string; before?: number; limit?: number } = {}): Promise<MailboxMessage[]> {
  const limit = Math.min(Math.max(opts.limit ?? 50, 1), 200);
  const conds = [];
  if (opts.to) conds.push(sql`lower(${devMailbox.to}) like ${"%" + opts.to.toLowerCase() + "%"}`);
  if (opts.before) conds.push(lt(devMailbox.id, opts.before));
  const rows = await getDb()
    .select()
    .from(devMailbox)
    .where(conds.length ? sql.join(conds, sql` and `) : undefined)
    .orderBy(desc(devMailbox.id))
    .limit(limit);
  return rows.map((r) => ({ ...r, receivedAt: r.receivedAt.toISOString() }));
}
