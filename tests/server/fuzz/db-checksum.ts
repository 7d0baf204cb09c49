// A fingerprint of every table in the public schema: row count and md5 of all rows' text, in one round trip.
import type pg from 'pg';

/** Tables a refused request may still write by design: the session's last-seen touch and failed sign-ins. */
export const CHANGING_ON_REFUSAL = new Set(['sessions', 'sign_in_failures']);

export async function tableNames(pool: pg.Pool): Promise<string[]> {
  const res = await pool.query<{ tablename: string }>("select tablename from pg_tables where schemaname = 'public' order by 1");
  return res.rows.map((r) => r.tablename).filter((t) => !CHANGING_ON_REFUSAL.has(t) && !t.startsWith('__'));
}

export async function checksum(pool: pg.Pool, tables: string[]): Promise<string> {
  const parts = tables.map((t) =>
    `select '${t}' as t, count(*)::text || ':' || coalesce(md5(string_agg(x::text, '' order by x::text)), '') as v from "${t}" x`);
  const res = await pool.query<{ t: string; v: string }>(parts.join(' union all '));
  return res.rows.map((r) => `${r.t}=${r.v}`).join(';');
}
