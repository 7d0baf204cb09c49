// Transaction-scoped advisory locks: serialise work whose conflicts no single row lock covers.
import { sql } from 'drizzle-orm';
import type { Tx } from '../../../db/client';

/** Waits until no other transaction holds `key`; PostgreSQL releases it when this transaction ends. */
export async function lockForTransaction(tx: Tx, key: number): Promise<void> {
  await tx.execute(sql`select pg_advisory_xact_lock(${key})`);
}

/** Like lockForTransaction for one of many keys in a namespace: `name` (e.g. a user id) is hashed to the second key. */
export async function lockKeyForTransaction(tx: Tx, namespace: number, name: string): Promise<void> {
  await tx.execute(sql`select pg_advisory_xact_lock(${namespace}, hashtext(${name}))`);
}
