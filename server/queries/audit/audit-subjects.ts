// Names of the things audit rows are about (windows, plan runs, notices, freezes, people, slices, imports), looked
// up for one page of rows at a time, so the trail shows names and never ids.
import { eq, inArray } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { freezes, imports, notices, plans, slices, tenants, users, windows } from '../../../db/schema';

export type SubjectNames = {
  windows: Map<string, string>;
  /** plan run id → its window */
  plans: Map<string, { windowId: string; title: string }>;
  /** notice id → its window and tenant */
  notices: Map<string, { windowId: string; title: string; tenantName: string }>;
  freezes: Map<string, string>;
  users: Map<string, string>;
  slices: Map<string, string>;
  imports: Map<string, string>;
};

export type SubjectIds = Partial<Record<keyof SubjectNames, string[]>>;

const some = (ids: string[] | undefined): ids is string[] => (ids?.length ?? 0) > 0;

async function pairs(rows: Promise<{ id: string; name: string }[]>): Promise<Map<string, string>> {
  return new Map((await rows).map((r) => [r.id, r.name]));
}

export async function selectSubjectNames(db: Queryable, ids: SubjectIds): Promise<SubjectNames> {
  const none = Promise.resolve([]);
  const [windowNames, planRows, noticeRows, freezeNames, userNames, sliceNames, importNames] = await Promise.all([
    pairs(some(ids.windows) ? db.select({ id: windows.id, name: windows.title }).from(windows).where(inArray(windows.id, ids.windows)) : none),
    some(ids.plans)
      ? db.select({ id: plans.id, windowId: plans.windowId, title: windows.title }).from(plans)
        .innerJoin(windows, eq(windows.id, plans.windowId)).where(inArray(plans.id, ids.plans))
      : none,
    some(ids.notices)
      ? db.select({ id: notices.id, windowId: notices.windowId, title: windows.title, tenantName: tenants.name }).from(notices)
        .innerJoin(windows, eq(windows.id, notices.windowId)).innerJoin(tenants, eq(tenants.id, notices.tenantId))
        .where(inArray(notices.id, ids.notices))
      : none,
    pairs(some(ids.freezes) ? db.select({ id: freezes.id, name: freezes.title }).from(freezes).where(inArray(freezes.id, ids.freezes)) : none),
    pairs(some(ids.users) ? db.select({ id: users.id, name: users.name }).from(users).where(inArray(users.id, ids.users)) : none),
    pairs(some(ids.slices) ? db.select({ id: slices.id, name: slices.name }).from(slices).where(inArray(slices.id, ids.slices)) : none),
    pairs(some(ids.imports) ? db.select({ id: imports.id, name: imports.fileName }).from(imports).where(inArray(imports.id, ids.imports)) : none),
  ]);
  return {
    windows: windowNames,
    plans: new Map(planRows.map((r) => [r.id, { windowId: r.windowId, title: r.title }])),
    notices: new Map(noticeRows.map((r) => [r.id, { windowId: r.windowId, title: r.title, tenantName: r.tenantName }])),
    freezes: freezeNames, users: userNames, slices: sliceNames, imports: importNames,
  };
}
