// Queries on `sink_messages`: the sink's insert, the Outbox list and detail, and readSinkMessages for tests.
import { and, count, desc, eq, gte, sql, type SQL } from 'drizzle-orm';
import type { Db } from '../../../db/client';
import { sinkMessages } from '../../../db/schema';
import type { OutboxListQuery, OutboxSummary } from '../../../shared/outbox';

export type SinkMessageRow = typeof sinkMessages.$inferSelect;

export async function insertSinkMessage(db: Db, message: typeof sinkMessages.$inferInsert): Promise<void> {
  await db.insert(sinkMessages).values(message);
}

/** Every message the sink kept, oldest first; `to` matches one envelope recipient (case-insensitive). */
export async function readSinkMessages(db: Db, filter: { to?: string; since?: Date } = {}): Promise<SinkMessageRow[]> {
  const where: SQL[] = [];
  if (filter.to) {
    where.push(sql`lower(${filter.to}) in (select lower(r) from unnest(${sinkMessages.envelopeTo}) as r)`);
  }
  if (filter.since) where.push(gte(sinkMessages.receivedAt, filter.since));
  return db.select().from(sinkMessages).where(and(...where)).orderBy(sinkMessages.id);
}

// A header line (not folded) declaring a text/calendar part; good enough to flag invitations in the list.
const hasCalendarSql = sql<boolean>`${sinkMessages.raw} ~* '(^|\n)content-type:[ \t]*text/calendar'`;

/** One page of summaries, newest first. */
export async function listSinkMessages(db: Db, query: OutboxListQuery): Promise<{ items: OutboxSummary[]; total: number }> {
  const rows = await db
    .select({
      id: sinkMessages.id,
      receivedAt: sinkMessages.receivedAt,
      from: sinkMessages.envelopeFrom,
      to: sinkMessages.envelopeTo,
      subject: sinkMessages.subject,
      sizeBytes: sinkMessages.sizeBytes,
      hasCalendar: hasCalendarSql,
    })
    .from(sinkMessages)
    .orderBy(desc(sinkMessages.receivedAt), desc(sinkMessages.id))
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  const [{ total }] = await db.select({ total: count() }).from(sinkMessages);
  return { items: rows.map((r) => ({ ...r, receivedAt: r.receivedAt.toISOString(), hasCalendar: Boolean(r.hasCalendar) })), total };
}

export async function getSinkMessage(db: Db, id: number): Promise<SinkMessageRow | null> {
  const [row] = await db.select().from(sinkMessages).where(eq(sinkMessages.id, id));
  return row ?? null;
}
