// The change-board pack and its moves CSV: who may read them, the CSV's header, RFC 4180 quoting, the guard
// against spreadsheet formulas, rows that follow the plan's steps by name, and clear errors without a plan.
import Papa from 'papaparse';
import { plans, sites, sliceFunctions, sliceTies, spans } from '../../db/schema';
import { MOVES_CSV_COLUMNS, movesCsv, movesFileName } from '../../server/services/pack/moves-csv';
import { changePackSchema, type PackStep } from '../../shared/change-pack';
import type { PlanReview } from '../../shared/plans';
import { insertPlannedWindow, setupSignoffApp, type SignoffTestContext } from './signoff/helpers';
import { eq } from 'drizzle-orm';

const NOW = new Date('2027-05-03T09:00:00Z');
let ctx: SignoffTestContext;
let windowId: string;
let review: PlanReview;

const id = (key: string) => `${ctx.prefix}-${key}`;

/** A planned window whose accepted plan moves a function (hostile names) and reroutes a link over a third site. */
async function windowWithSteps(): Promise<void> {
  const planned = await insertPlannedWindow(ctx, { key: 'csv' });
  windowId = planned.windowId;
  const [s1, s2] = planned.review.slices;
  await ctx.db.insert(sites).values({ id: id('C'), name: 'Site C', kind: 'edge', lat: 1, lon: 1, cpu: 16 });
  await ctx.db.insert(spans).values([
    { id: id('ab'), siteA: id('A'), siteB: id('B'), capacityGbps: 10, lengthKm: 5 },
    { id: id('ac'), siteA: id('A'), siteB: id('C'), capacityGbps: 10, lengthKm: 5 },
    { id: id('cb'), siteA: id('C'), siteB: id('B'), capacityGbps: 10, lengthKm: 5 },
  ]);
  await ctx.db.insert(sliceFunctions).values([
    { id: `${s1.slice}-f1`, sliceId: s1.slice, name: '=SUM(A1:A9)', cpu: 1 },
    { id: `${s2.slice}-f1`, sliceId: s2.slice, name: 'User plane', cpu: 1 },
    { id: `${s2.slice}-f2`, sliceId: s2.slice, name: 'Edge cache', cpu: 1 },
  ]);
  await ctx.db.insert(sliceTies).values({
    id: `${s2.slice}-t1`, sliceId: s2.slice, fromFunction: `${s2.slice}-f1`, toFunction: `${s2.slice}-f2`, bandwidthGbps: 1, maxLatencyMs: 10,
  });
  review = {
    ...planned.review,
    slices: planned.review.slices.map((s) => (s.slice === s1.slice ? { ...s, name: 'Harbour, "north" cranes' } : s)),
    steps: [
      { slice: s1.slice, kind: 'move-function', element: `${s1.slice}-f1`, from: id('A'), to: id('B'), needsSpare: false, knockOn: false },
      { slice: s2.slice, kind: 'reroute-tie', element: `${s2.slice}-t1`, from: [id('ab')], to: [id('ac'), id('cb')], needsSpare: true, knockOn: false },
    ],
  };
  await ctx.db.update(plans).set({ result: review }).where(eq(plans.id, planned.planId));
}

beforeAll(async () => {
  ctx = await setupSignoffApp('pack', NOW);
  await windowWithSteps();
});
afterAll(async () => {
  await ctx.cleanup();
  await ctx.close();
});

const csvOf = async (who: 'planner' | 'engineer' | 'approver' | 'admin') => (await ctx.as(who))('get', `/api/windows/${windowId}/moves.csv`);
const rowsOf = (text: string) => Papa.parse<string[]>(text, { skipEmptyLines: true }).data;

test('every operator role downloads the moves as a UTF-8 CSV attachment named after the window', async () => {
  for (const who of ['planner', 'engineer', 'approver', 'admin'] as const) {
    const res = await csvOf(who);
    expect([who, res.status]).toEqual([who, 200]);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toBe(`attachment; filename="moves-${ctx.prefix.toLowerCase()}-window-csv.csv"`);
  }
});

test('a tenant user is told the window does not exist, a user without roles is refused', async () => {
  const tenant = await (await ctx.as('tenant'))('get', `/api/windows/${windowId}/moves.csv`);
  expect(tenant.status).toBe(404);
  expect(tenant.body.error.code).toBe('WINDOW_NOT_FOUND');
  expect((await (await ctx.as('tenant'))('get', `/api/windows/${windowId}/pack`)).status).toBe(404);
  expect((await (await ctx.as('noRoles'))('get', `/api/windows/${windowId}/moves.csv`)).status).toBe(403);
});

test('the header row comes first and each following row is one plan step in order, by name', async () => {
  const res = await csvOf('engineer');
  const [header, ...rows] = rowsOf(res.text);
  expect(header).toEqual([...MOVES_CSV_COLUMNS]);
  expect(rows).toHaveLength(review.steps.length);
  const col = (row: string[], name: (typeof MOVES_CSV_COLUMNS)[number]) => row[MOVES_CSV_COLUMNS.indexOf(name)];
  expect(rows.map((r) => [col(r, 'Order'), col(r, 'Slice'), col(r, 'Action'), col(r, 'From site'), col(r, 'To site')])).toEqual([
    ['1', 'Harbour, "north" cranes', 'Move function', 'Site A', 'Site B'],
    ['2', 'Slice csv-s2', 'Reroute link', '', ''],
  ]);
  expect(col(rows[1], 'Function or link')).toBe('the link User plane – Edge cache');
  expect(col(rows[1], 'From path (sites in order)')).toBe('Site A → Site B');
  expect(col(rows[1], 'To path (sites in order)')).toBe('Site A → Site C → Site B');
  expect(col(rows[1], 'Tenant')).toBe(`${ctx.prefix} Other tenant`);
  expect(col(rows[1], 'Spare capacity')).toBe('Needs temporary spare capacity');
  // The window starts 2027-05-23 09:00 UTC: 08:00 in the network's zone (UTC−1), where the test users' times are.
  expect(col(rows[0], 'Planned time')).toBe('Before Sun, 23 May 2027, 08:00 GMT-1');
  expect(col(rows[0], 'After the window')).toBe('Return after Sun, 23 May 2027, 12:00 GMT-1');
  expect(res.text).not.toContain(ctx.prefix + '-');
});

test('cells are quoted as RFC 4180 says, lines end in CRLF, and a cell that starts a formula is defused', async () => {
  const res = await csvOf('planner');
  expect(res.text).toContain('"Harbour, ""north"" cranes"');
  expect(res.text.split('\r\n')).toHaveLength(review.steps.length + 2);
  expect(res.text.replace(/\r\n/g, '')).not.toMatch(/[\r\n]/);
  expect(rowsOf(res.text)[1][3]).toBe("'=SUM(A1:A9)");
});

test('a window without an accepted plan: the pack says so, the CSV answers 409 with the reason', async () => {
  const bare = await insertPlannedWindow(ctx, { key: 'bare' });
  await ctx.pool.query('update windows set accepted_plan_id = null where id = $1', [bare.windowId]);
  const csv = await (await ctx.as('planner'))('get', `/api/windows/${bare.windowId}/moves.csv`);
  expect(csv.status).toBe(409);
  expect(csv.body.error).toMatchObject({ code: 'NO_PLAN_YET' });
  expect(csv.body.error.message).toContain('no accepted move plan yet');
  const pack = await (await ctx.as('engineer'))('get', `/api/windows/${bare.windowId}/pack`);
  expect(pack.status).toBe(200);
  expect(pack.body.plan).toBeNull();
  expect(pack.body.window.elements).toEqual([{ kind: 'site', name: 'Site A', effect: 'down', fraction: null }]);
  expect((await (await ctx.as('planner'))('get', `/api/windows/${id('nowhere')}/moves.csv`)).status).toBe(404);
});

test('the pack lists the same steps as the CSV, names the owner, and holds no internal ids in its plan', async () => {
  const res = await (await ctx.as('approver'))('get', `/api/windows/${windowId}/pack`);
  expect(res.status).toBe(200);
  const pack = changePackSchema.parse(res.body);
  expect(pack.plan?.steps.map((s) => [s.order, s.sliceName, s.what])).toEqual([
    [1, 'Harbour, "north" cranes', '=SUM(A1:A9)'], [2, 'Slice csv-s2', 'the link User plane – Edge cache'],
  ]);
  expect(pack.window.ownerName).not.toBeNull();
  expect(pack.touch?.unresolved).toBe(0);
  // Ids start with the file's prefix; names may only carry it after other words ("User t…-planner").
  expect(JSON.stringify(pack.plan)).not.toContain(`"${ctx.prefix}-`);
  expect(pack.generatedAt).toBe(NOW.toISOString());
});

describe('movesCsv and movesFileName, without the API', () => {
  const step = (what: string): PackStep => ({
    order: 1, sliceName: 's', tenantName: 't', kind: 'move-function', what, fromSite: 'A', toSite: 'B', fromPath: null, toPath: null,
    madeRoomFor: [], needsSpare: false,
  });
  const w = { title: 'x', startsAt: NOW, endsAt: NOW, afterWindow: 'keep' as const };

  test.each(['=1+2', '+1', '-1', '@SUM(A1)'])('a cell starting %s is prefixed with a quote mark', (what) => {
    expect(rowsOf(movesCsv([step(what)], w, 'UTC'))[1][3]).toBe(`'${what}`);
  });

  test('RFC 4180 examples: a line break inside a field is kept inside quotes; a plain field is not quoted', () => {
    const text = movesCsv([step('two\r\nlines')], w, 'UTC');
    expect(text).toContain('"two\r\nlines"');
    expect(text).toContain(',Move function,A,B,');
    expect(rowsOf(text)[1][3]).toBe('two\r\nlines');
  });

  test('file names keep ASCII words of the title and fall back when none are left', () => {
    expect(movesFileName('Harbour Fibre Splice — Åsby/Nord')).toBe('moves-harbour-fibre-splice-asby-nord.csv');
    expect(movesFileName('###')).toBe('moves-window.csv');
  });
});
