// What counts as demo data: the ids in scenarios/demo.json and the demo accounts. Setup seeds from the same
// file; removing the demo (server/services/demo-data/) deletes by these ids, so rows imported or made by
// people (other ids) stay.
import fs from 'node:fs';
import path from 'node:path';
import { DEMO_USERS } from './demo-users';

export const DEMO_FILE = path.resolve(__dirname, '..', '..', 'scenarios', 'demo.json');

export interface DemoIdentity {
  siteIds: string[];
  spanIds: string[];
  tenantIds: string[];
  sliceIds: string[];
  windowIds: string[];
  /** the map name the demo writes into network_meta (null: the file has none) */
  networkName: string | null;
  accountIds: string[];
  /** lower-case */
  accountEmails: string[];
}

/** The demo file's parsed JSON, or null when it is missing. */
export function readDemoFile(file = DEMO_FILE): unknown {
  return fs.existsSync(file) ? JSON.parse(fs.readFileSync(file, 'utf8')) : null;
}

type IdList = { id?: unknown }[] | undefined;

function ids(list: unknown): string[] {
  return Array.isArray(list) ? (list as IdList ?? []).map((x) => x.id).filter((id): id is string => typeof id === 'string') : [];
}

/** Ids by kind from a scenario file's JSON (unchecked: a broken file yields fewer ids, never a crash). */
export function demoIdentity(scenario: unknown): DemoIdentity {
  const s = (scenario ?? {}) as Record<string, unknown>;
  return {
    siteIds: ids(s.sites),
    spanIds: ids(s.spans),
    tenantIds: ids(s.tenants),
    sliceIds: ids(s.slices),
    windowIds: ids(s.windows),
    networkName: typeof s.name === 'string' ? s.name : null,
    accountIds: DEMO_USERS.map((u) => u.id),
    accountEmails: DEMO_USERS.map((u) => u.email.toLowerCase()),
  };
}
