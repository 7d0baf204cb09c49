// Clean-up for suites on a scratch database that outlives a run: every row a test file adds carries its prefix.
import type pg from 'pg';

/** [table, columns]: rows whose any listed column starts with the prefix are deleted. */
export type PrefixedRows = [table: string, columns: string[]];

const INVENTORY_AND_USERS: PrefixedRows[] = [
  ['slices', ['id']], ['spans', ['id']], ['sites', ['id']], ['users', ['id']], ['tenants', ['id']],
];

/** Deletes `first` (e.g. windows, which point at users and slices), then the file's inventory, users and tenants. */
export async function removePrefixed(pool: pg.Pool, prefix: string, first: PrefixedRows[]): Promise<void> {
  for (const [table, columns] of [...first, ...INVENTORY_AND_USERS]) {
    const where = columns.map((c) => `${c} like $1`).join(' or ');
    await pool.query(`delete from ${table} where ${where}`, [`${prefix}%`]);
  }
}
