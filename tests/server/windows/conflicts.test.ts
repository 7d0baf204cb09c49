// Conflicts (DESIGN §4.4): shared elements, a joint split of the ring, a stranded slice; listed on both windows.
import { windowConflictsSchema } from '../../../shared/window-impact';
import { booking, insertRing } from './helpers/ring-fixture';
import { setupWindowsApp, type WindowsContext } from './helpers/windows-app';

// This file books in August 2027 only.
const NOW = new Date('2027-03-01T08:00:00Z');
const RANGE = 'from=2027-08-01T00:00:00Z&to=2027-09-01T00:00:00Z';
let ctx: WindowsContext;
let id: (name: string) => string;

beforeAll(async () => {
  ctx = await setupWindowsApp(NOW);
  ({ id } = await insertRing(ctx.db, { prefix: ctx.prefix, ownTenantId: ctx.tenantId }));
});
afterAll(async () => {
  await ctx.cleanup();
  await ctx.close();
});

type El = { kind: 'site' | 'span'; id: string; effect: 'down' | 'reduced'; fraction?: number };
const down = (kind: 'site' | 'span', name: string): El => ({ kind, id: id(name), effect: 'down' });

async function book(title: string, startsAt: string, endsAt: string, elements: El[]) {
  const res = await (await ctx.as('engineer'))('post', '/api/windows').send(booking(ctx.prefix, title, startsAt, endsAt, elements));
  expect(res.status).toBe(201);
  return res.body as { window: { id: string; version: number }; conflictCount: number };
}
const conflictsOf = async (windowId: string, role: 'planner' | 'tenant' = 'planner') => {
  const res = await (await ctx.as(role))('get', `/api/windows/${windowId}/conflicts`);
  expect(res.status).toBe(200);
  return windowConflictsSchema.parse(res.body).conflicts;
};
const listCounts = async (role: 'planner' | 'tenant' = 'planner') => {
  const res = await (await ctx.as(role))('get', `/api/windows?${RANGE}`);
  expect(res.status).toBe(200);
  return new Map((res.body.windows as { id: string; conflictCount: number }[]).map((w) => [w.id, w.conflictCount]));
};

test('overlapping windows sharing an element conflict, on both windows; a later one on the same span does not', async () => {
  const a = await book('shared-a', '2027-08-02T10:00:00Z', '2027-08-02T14:00:00Z', [down('span', 'r23')]);
  expect(a.conflictCount).toBe(0);
  const b = await book('shared-b', '2027-08-02T12:00:00Z', '2027-08-02T16:00:00Z', [{ kind: 'span', id: id('r23'), effect: 'reduced', fraction: 0.5 }]);
  expect(b.conflictCount).toBe(1); // checked at booking
  const c = await book('shared-c', '2027-08-02T16:00:00Z', '2027-08-02T18:00:00Z', [down('span', 'r23')]); // touches B's end only
  const onA = await conflictsOf(a.window.id);
  expect(onA).toHaveLength(1);
  expect(onA[0].window.id).toBe(b.window.id);
  expect(onA[0].reasons).toEqual([expect.objectContaining({ reason: 'shared-element', ids: [`span:${id('r23')}`] })]);
  // The message names the span by its two ends for any reader of the API; ids stay in `ids` only.
  expect(onA[0].reasons[0].message).toBe('Both take out span Ring 2 – Ring 3.');
  expect((await conflictsOf(b.window.id)).map((x) => x.window.id)).toEqual([a.window.id]);
  expect(await conflictsOf(c.window.id)).toEqual([]);
  const counts = await listCounts();
  expect([counts.get(a.window.id), counts.get(b.window.id), counts.get(c.window.id)]).toEqual([1, 1, 0]);
});

test('each window alone is harmless, together they cut the ring and strand a slice', async () => {
  const d = await book('split-d', '2027-08-10T10:00:00Z', '2027-08-10T14:00:00Z', [down('span', 'r23')]);
  const e = await book('split-e', '2027-08-10T11:00:00Z', '2027-08-10T13:00:00Z', [down('span', 'r56')]);
  const planner = await ctx.as('planner');
  for (const w of [d, e]) {
    const impact = await planner('post', `/api/windows/${w.window.id}/assess`).send({});
    expect(impact.body.splits).toBe(false); // alone, the ring stays in one piece
  }
  for (const [self, other] of [[d, e], [e, d]]) {
    const list = await conflictsOf(self.window.id);
    expect(list.map((x) => x.window.id)).toEqual([other.window.id]);
    expect(list[0].reasons.map((r) => r.reason)).toEqual(['joint-split', 'strands-slice']);
    // The ring falls into {R3, R4, R5} and {R6, R1, R2}: R1–R4 (own) and R5–R6 (other, rerouted the long way
    // round while r56 alone is out) are both cut off, though neither window alone would do it.
    expect([...list[0].reasons[1].ids].sort()).toEqual([id('other'), id('own')].sort());
    expect(list[0].reasons[1].message).toMatch(/^Together they cut off the slices "(Own control|Other video)" and "(Own control|Other video)"\.$/);
  }
  // Withdrawing one window clears the conflict on the other.
  await (await ctx.as('engineer'))('post', `/api/windows/${e.window.id}/transition`).send({ to: 'withdrawn', version: 2 });
  expect(await conflictsOf(d.window.id)).toEqual([]);
  expect((await listCounts()).get(d.window.id)).toBe(0);
});

test('the same elements at different times, or a reduced span instead of a cut, do not conflict', async () => {
  const f = await book('apart-f', '2027-08-20T10:00:00Z', '2027-08-20T12:00:00Z', [down('span', 'r23')]);
  await book('apart-g', '2027-08-20T12:00:00Z', '2027-08-20T14:00:00Z', [down('span', 'r56')]);
  await book('apart-h', '2027-08-20T10:30:00Z', '2027-08-20T11:30:00Z', [{ kind: 'span', id: id('r56'), effect: 'reduced', fraction: 0.3 }]);
  expect(await conflictsOf(f.window.id)).toEqual([]);
});

test('an edit that moves a window onto another one makes the conflict appear', async () => {
  const i = await book('edit-i', '2027-08-25T10:00:00Z', '2027-08-25T12:00:00Z', [down('site', 'R3')]);
  const j = await book('edit-j', '2027-08-26T10:00:00Z', '2027-08-26T12:00:00Z', [down('site', 'R3')]);
  const res = await (await ctx.as('engineer'))('patch', `/api/windows/${j.window.id}`)
    .send({ version: 1, startsAt: '2027-08-25T11:00:00Z', endsAt: '2027-08-25T13:00:00Z' });
  expect(res.body.conflictCount).toBe(1);
  expect((await conflictsOf(i.window.id)).map((x) => x.window.id)).toEqual([j.window.id]);
});

test('a tenant learns nothing of conflicts: the conflicts route does not find the window for it', async () => {
  const k = await book('tenant-k', '2027-08-28T10:00:00Z', '2027-08-28T14:00:00Z', [down('span', 'r23')]);
  await book('tenant-l', '2027-08-28T11:00:00Z', '2027-08-28T13:00:00Z', [down('span', 'r56')]);
  expect(await conflictsOf(k.window.id)).toHaveLength(1);
  // Conflicts name other windows (internal); tenants read only tenant views of notified work.
  const res = await (await ctx.as('tenant'))('get', `/api/windows/${k.window.id}/conflicts`);
  expect([res.status, res.body.error.code]).toEqual([404, 'WINDOW_NOT_FOUND']);
});
