// Seeds a scenario plus the demo accounts in one transaction; running it again inserts nothing new.
import type { PgTable } from 'drizzle-orm/pg-core';
import type { Db } from '../client';
import { formatIssue, validateScenario, type ScenarioIssue } from '../../shared/scenario-validate';
import type { Scenario } from '../../shared/scenario';
import {
  tenants, sites, spans, slices, sliceFunctions, sliceTies, placements, windows, windowElements, networkMeta,
} from '../schema';
import { scenarioRows } from './scenario-rows';
import { windowShiftMs } from './shift-windows';
import { seedDemoUsers } from './seed-users';
import { seedDemoSso } from './seed-sso';
import { DEMO_USERS, pickDemoTenantId } from './demo-users';
import type { Tx } from '../client';


/** Rows newly written per table (0 everywhere on a repeat run). */
export type SeedSummary = Record<string, number>;

export class ScenarioInvalidError extends Error {
  readonly code = 'SCENARIO_INVALID';
  constructor(readonly errors: ScenarioIssue[]) {
    super(`scenario is invalid (${errors.length} error(s)):\n${errors.map((e) => `  ${formatIssue(e)}`).join('\n')}`);
  }
}

const CHUNK_ROWS = 500; // keeps each statement well under PostgreSQL's 65 535 bind parameters

/** Inserts rows that are not there yet (by primary or unique key); returns how many were new. */
async function insertNew<T extends PgTable>(tx: Tx, table: T, rows: T['$inferInsert'][]): Promise<number> {
  let inserted = 0;
  for (let i = 0; i < rows.length; i += CHUNK_ROWS) {
    const result = await tx.insert(table).values(rows.slice(i, i + CHUNK_ROWS)).onConflictDoNothing();
    inserted += result.rowCount ?? 0;
  }
  return inserted;
}

export function parseScenarioOrThrow(input: unknown): Scenario {
  const result = validateScenario(input);
  if (!result.ok) throw new ScenarioInvalidError(result.errors);
  return result.scenario;
}

/**
 * Writes the scenario (network, tenants, slices, revision-1 placements, windows moved by whole
 * weeks to start just after `now`) and the demo users. Validates first; all or nothing.
 */
export async function seedDemo(db: Db, input: unknown, options: { now?: Date } = {}): Promise<SeedSummary> {
  const scenario = parseScenarioOrThrow(input);
  const now = options.now ?? new Date();
  const engineer = DEMO_USERS.find((u) => u.role === 'engineer');
  const rows = scenarioRows(scenario, {
    windowShiftMs: windowShiftMs(scenario.windows ?? [], now),
    ownerId: engineer?.id ?? null,
  });
  return db.transaction(async (tx) => {
    const summary: SeedSummary = {
      tenants: await insertNew(tx, tenants, rows.tenants),
      sites: await insertNew(tx, sites, rows.sites),
      spans: await insertNew(tx, spans, rows.spans),
      slices: await insertNew(tx, slices, rows.slices),
      functions: await insertNew(tx, sliceFunctions, rows.functions),
      ties: await insertNew(tx, sliceTies, rows.ties),
      placements: await insertNew(tx, placements, rows.placements),
      // The map's name and outline; an existing row (e.g. from a later import) is left as it is.
      networkMeta: await insertNew(tx, networkMeta, [
        { id: 'network', name: scenario.name ?? null, outline: scenario.outline ?? null },
      ]),
    };
    summary.users = await seedDemoUsers(tx, pickDemoTenantId(scenario));
    summary.windows = await insertNewWindows(tx, rows);
    summary.ssoSettings = await seedDemoSso(tx);
    return summary;
  });
}

/** Window elements have no natural key, so they are written only with their window's first insert. */
async function insertNewWindows(tx: Tx, rows: ReturnType<typeof scenarioRows>): Promise<number> {
  if (rows.windows.length === 0) return 0;
  const created = await tx.insert(windows).values(rows.windows).onConflictDoNothing().returning({ id: windows.id });
  const createdIds = new Set(created.map((w) => w.id));
  await insertNew(tx, windowElements, rows.windowElements.filter((e) => createdIds.has(e.windowId)));
  return created.length;
}
