// The sign-off summary counts slices the way the impact screen and the plan review do (shared/touch-counts.ts):
// a tenant whose slices only lose their backup path is listed, though a plan never lists such slices.
import { slices, tenants, windowImpacts } from '../../../db/schema';
import type { WindowImpact } from '../../../shared/window-impact';
import { insertPlannedWindow, setupSignoffApp, type SignoffTestContext } from './helpers';

const NOW = new Date('2027-06-07T09:00:00Z');
let ctx: SignoffTestContext;

beforeAll(async () => { ctx = await setupSignoffApp('tenants', NOW); });
afterAll(async () => {
  await ctx.cleanup();
  await ctx.close();
});

type Affected = WindowImpact['affected'][number];

function affected(id: string, tenant: { id: string; name: string }, reasons: Affected['reasons']): Affected {
  return {
    slice: id, name: id, tenant, sst: 1, priority: 3, critical: false, reasons, severity: 'low',
    failureProbability: 0.001, unprotected: reasons.includes('unprotected'),
  };
}

async function insertImpact(windowId: string, windowVersion: number, list: Affected[]) {
  const impact: WindowImpact = {
    windowId, windowVersion, computedAt: NOW.toISOString(), affected: list, touchesCritical: false, splits: false,
    components: 1, overloaded: [], elements: [], currentPaths: [],
  };
  await ctx.db.insert(windowImpacts).values({ windowId, windowVersion, computedAt: NOW, impact });
}

async function summaryOf(windowId: string) {
  const planner = await ctx.as('planner');
  expect((await planner('post', `/api/windows/${windowId}/submit`).send({})).status).toBe(200);
  const res = await (await ctx.as('approver'))('get', `/api/signoff/${windowId}`);
  expect(res.status).toBe(200);
  return res.body;
}

test('a tenant whose slices only lose protection is listed, and the counts include its slices', async () => {
  const p = ctx.prefix;
  const quiet = { id: `${p}-quiet`, name: `${p} Quiet tenant` };
  await ctx.db.insert(tenants).values({ ...quiet, noticeDays: 2, contacts: [{ name: 'Ops', email: `ops.quiet.${p}@test.example` }] });
  const { windowId, review } = await insertPlannedWindow(ctx, { key: 'prot' });
  const unprotectedIds = [`${p}-prot-u1`, `${p}-prot-u2`];
  await ctx.db.insert(slices).values(unprotectedIds.map((id) => ({ id, tenantId: quiet.id, name: id, sst: 1, priority: 3, critical: false })));
  const own = review.slices.map((s) => affected(s.slice, { id: s.tenantId, name: s.tenantId }, ['hosted']));
  await insertImpact(windowId, 1, [...own, ...unprotectedIds.map((id) => affected(id, quiet, ['unprotected']))]);

  const s = await summaryOf(windowId);
  expect(s.touch).toEqual({ touched: 5, mustMove: 3, protectionLost: 2, unresolved: 0, knockOn: 0 });
  expect(s.tenants.find((t: { id: string }) => t.id === quiet.id))
    .toEqual({ id: quiet.id, name: quiet.name, affected: 2, moving: 0, knockOn: 0, protectionLost: 2 });
  expect(s.tenants).toHaveLength(3);
  // Two move; the staying one and the two that only lose protection stay put.
  expect(s.totals).toEqual({ affected: 5, moving: 2, stays: 3, unresolved: 0, knockOn: 0 });
});

test('an impact for another window version is not used: the plan alone gives the counts', async () => {
  const { windowId } = await insertPlannedWindow(ctx, { key: 'stale', unresolved: true });
  await insertImpact(windowId, 7, [affected(`${ctx.prefix}-nowhere`, { id: `${ctx.prefix}-ghost`, name: 'Ghost' }, ['unprotected'])]);
  const s = await summaryOf(windowId);
  expect(s.touch).toEqual({ touched: 4, mustMove: 4, protectionLost: 0, unresolved: 1, knockOn: 0 });
  expect(s.tenants.map((t: { id: string }) => t.id)).not.toContain(`${ctx.prefix}-ghost`);
});
