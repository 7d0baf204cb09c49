// A campaign's once-in-D-days rule also counts windows booked elsewhere: a start less than D nights from an active
// window touching one of the group's slices is no option, a withdrawn window does not count, and a group left with
// no start says which window and which slice.
import { dayNumber } from '../../../planner/campaign/compile-campaign';
import { nightOfInstant } from '../../../server/services/campaigns/booked-spacing';
import { loadBookedTouches } from '../../../server/services/campaigns/booked-touches';
import { planCampaign } from '../../../server/services/campaigns/plan-campaign';
import { slotEngine } from '../../../server/services/campaigns/slot-engine';
import { currentInventory } from '../../../server/services/inventory/inventory-cache';
import type { StoredSchedule } from '../../../server/services/campaigns/stored-schedule';
import { campaignCreateSchema } from '../../../shared/slots';
import { setupSlotsApp, type SlotsContext } from '../slots-api/helpers';

// This file books and plans in September 2029 only (the other campaign tests plan May, the slot searches March).
const NOW = new Date('2029-02-01T08:00:00Z');
const D = 7;
let ctx: SlotsContext;
let ductRepair: string;

/** Books a window on one span as the planner (network zone UTC−1: 01:00Z is local midnight); returns id and version. */
async function book(title: string, startsAt: string, endsAt: string, span: string): Promise<{ id: string; version: number }> {
  const res = await (await ctx.as('planner'))('post', '/api/windows').send({
    title: `${ctx.prefix} ${title}`, startsAt, endsAt, workType: 'fibre splice', elements: [{ kind: 'span', id: ctx.id(span), effect: 'down' }],
  });
  expect(res.status).toBe(201);
  return { id: res.body.window.id, version: res.body.window.version };
}

beforeAll(async () => {
  ctx = await setupSlotsApp(NOW);
  const planner = await ctx.as('planner');
  // Assessed (its stored impact names "Own control", which rides span p1), on the night of Mon 10 Sep 2029.
  const duct = await book('Duct repair in the shared trench', '2029-09-10T01:00:00Z', '2029-09-10T03:00:00Z', 'p1');
  expect((await planner('post', `/api/windows/${duct.id}/assess`).send({})).status).toBe(200);
  ductRepair = `${ctx.prefix} Duct repair in the shared trench`;
  // Withdrawn: on the night of 24 Sep it would rule out 18–30 Sep for the same slice.
  const survey = await book('Cable survey', '2029-09-24T01:00:00Z', '2029-09-24T03:00:00Z', 'p1');
  expect((await planner('post', `/api/windows/${survey.id}/transition`).send({ to: 'withdrawn', version: survey.version })).status).toBe(200);
  // A draft, never assessed: its slices ("Other video" on span p2) are computed from its elements; night of 17 Sep.
  await book('Pole swap', '2029-09-17T01:00:00Z', '2029-09-17T03:00:00Z', 'p2');
});
afterAll(async () => {
  await ctx.close();
});

async function plan(over: Record<string, unknown>): Promise<StoredSchedule> {
  const request = campaignCreateSchema.parse({
    title: `${ctx.prefix} Splice audit`,
    groups: [{ label: 'North splice', spans: [ctx.id('p1')] }, { label: 'South splice', spans: [ctx.id('p2')] }],
    durationHours: 2, from: '2029-09-01T00:00:00Z', to: '2029-10-01T00:00:00Z', hours: { start: '00:00', end: '04:00' },
    stepMinutes: 60, maxPerNight: 1, minDaysBetweenTouches: D, ...over,
  });
  return planCampaign({ db: ctx.db, engine: slotEngine, now: NOW, onProgress: () => undefined }, request);
}

const daysFrom = (night: string, day: string) => Math.abs(dayNumber(night) - dayNumber(day));
const nightsOf = (s: StoredSchedule, g: number) => new Set(s.groups[g].slots.map((slot) => slot.night));
const chosenNight = (s: StoredSchedule, g: number) => s.groups[g].slots[s.assignment[g]!].night;

describe('with D = 7 days', () => {
  let draft: StoredSchedule;
  beforeAll(async () => {
    draft = await plan({});
  });

  test('no start of a group lies within 7 days of an active window touching its slices, and none is chosen', () => {
    expect(draft.assignment.every((s) => s !== null)).toBe(true);
    for (const night of nightsOf(draft, 0)) expect(daysFrom(night, '2029-09-10')).toBeGreaterThanOrEqual(D);
    for (const night of nightsOf(draft, 1)) expect(daysFrom(night, '2029-09-17')).toBeGreaterThanOrEqual(D);
    expect(daysFrom(chosenNight(draft, 0), '2029-09-10')).toBeGreaterThanOrEqual(D);
    expect(daysFrom(chosenNight(draft, 1), '2029-09-17')).toBeGreaterThanOrEqual(D);
  });

  test('the edges are exact: 7 nights away is allowed, 6 is not', () => {
    expect(nightsOf(draft, 0)).toContain('2029-09-17');
    expect(nightsOf(draft, 0)).toContain('2029-09-03');
    expect(nightsOf(draft, 0)).not.toContain('2029-09-16');
    expect(nightsOf(draft, 0)).not.toContain('2029-09-04');
  });

  test('a withdrawn window does not count', () => {
    expect(nightsOf(draft, 0)).toContain('2029-09-24');
    expect(nightsOf(draft, 0)).toContain('2029-09-20');
  });

  test('a window touching other slices does not count (the draft on span p2 leaves the North splice alone)', () => {
    expect(nightsOf(draft, 0)).toContain('2029-09-19');
    expect(nightsOf(draft, 1)).toContain('2029-09-10');
  });
});

test('with D = 0 the nights next to a booked window are options again', async () => {
  const free = await plan({ minDaysBetweenTouches: 0 });
  expect(nightsOf(free, 0)).toContain('2029-09-11');
  expect(nightsOf(free, 0)).toContain('2029-09-09');
  expect(nightsOf(free, 1)).toContain('2029-09-16');
});

test('a group whose every start lies near a booked window is unscheduled, naming the window and the slice', async () => {
  const narrow = { groups: [{ label: 'North splice', spans: [ctx.id('p1')] }], from: '2029-09-05T00:00:00Z', to: '2029-09-15T00:00:00Z' };
  const usable = (await plan({ ...narrow, minDaysBetweenTouches: 0 })).groups[0].slots.length;
  expect(usable).toBeGreaterThan(1);
  const blocked = await plan(narrow);
  expect(blocked.groups[0].slots).toEqual([]);
  expect(blocked.assignment).toEqual([null]);
  expect(blocked.unscheduledReasons).toEqual([
    `Each of its ${usable} usable starts falls within 7 days of "${ductRepair}", which also takes out "Own control"; `
      + 'a slice may be touched at most once in 7 days.',
  ]);
  expect(blocked.unscheduledReasons[0]).not.toContain(ctx.id('S1'));
});

test('a window\'s night is the night its allowed period began on, as the slot finder names a slot\'s', () => {
  const overnight = { start: '22:00', end: '06:00' };
  // Network zone UTC−1: 02:00Z is 01:00 local on 11 Sep, inside the period that began on the evening of 10 Sep.
  expect(nightOfInstant(Date.parse('2029-09-11T02:00:00Z'), overnight, 'Etc/GMT+1')).toBe('2029-09-10');
  expect(nightOfInstant(Date.parse('2029-09-11T15:00:00Z'), overnight, 'Etc/GMT+1')).toBe('2029-09-11');
  expect(nightOfInstant(Date.parse('2029-09-11T02:00:00Z'), { start: '00:00', end: '04:00' }, 'Etc/GMT+1')).toBe('2029-09-11');
});

test('an assessed window\'s slices are read from its stored impact; a draft\'s are computed from its elements', async () => {
  const { inventory } = await currentInventory(ctx.db);
  const range = { fromMs: Date.parse('2029-09-01T00:00:00Z'), toMs: Date.parse('2029-10-01T00:00:00Z') };
  const hours = { start: '00:00', end: '04:00' };
  const slicesOf = async (title: string) => {
    const found = (await loadBookedTouches(ctx.db, inventory, range, hours, D)).filter((w) => w.title === `${ctx.prefix} ${title}`);
    expect(found).toHaveLength(1);
    return [...found[0].slices];
  };
  expect(await slicesOf('Duct repair in the shared trench')).toEqual([ctx.id('S1')]);
  expect(await slicesOf('Pole swap')).toEqual([ctx.id('S2')]);
  // Were the stored impact not read, the work on span p1 would still give "Own control".
  await ctx.pool.query(
    `update window_impacts set impact = jsonb_set(impact, '{affected,0,slice}', to_jsonb($1::text))
     where window_id = (select id from windows where title = $2)`, [ctx.id('S3'), ductRepair]);
  expect(await slicesOf('Duct repair in the shared trench')).toEqual([ctx.id('S3')]);
  expect(await loadBookedTouches(ctx.db, inventory, range, hours, 0)).toEqual([]);
});
