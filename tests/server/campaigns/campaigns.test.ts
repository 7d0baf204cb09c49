// Campaigns through the API: who may plan and read them, what a bad request answers, a plan worked by the job
// handler into a draft, a planner's moves checked against the rules and the version, and booking all or nothing.
import {
  campaignBookedSchema, campaignCreateSchema, campaignListSchema, campaignSchema, type Campaign, type SearchProgress,
} from '../../../shared/slots';
import { withCampaignThread } from '../../../server/jobs/campaign-thread';
import { runSlotJob } from '../../../server/jobs/slot-search-handler';
import { planCampaign } from '../../../server/services/campaigns/plan-campaign';
import { slotEngine } from '../../../server/services/campaigns/slot-engine';
import type { SlotEngine } from '../../../server/services/campaigns/engine';
import { freezes } from '../../../db/schema';
import { setupSlotsApp, type SlotsContext } from '../slots-api/helpers';

// This file plans and books in May and June 2029 only (the slot-search tests search March 2029).
const NOW = new Date('2029-02-01T08:00:00Z');
let ctx: SlotsContext;

beforeAll(async () => {
  ctx = await setupSlotsApp(NOW);
});
afterAll(async () => {
  await ctx.close();
});

const quiet = () => undefined;

/** Two splices, three nights of 00:00–04:00 (network zone) with two-hour slots, at most one window a night. */
function campaignRequest(over: Record<string, unknown> = {}) {
  return {
    title: `${ctx.prefix} Fibre audit`,
    groups: [{ label: 'North splice', spans: [ctx.id('p1')] }, { label: 'South splice', spans: [ctx.id('p2')] }],
    durationHours: 2, from: '2029-05-07T00:00:00Z', to: '2029-05-10T00:00:00Z', hours: { start: '00:00', end: '04:00' },
    stepMinutes: 60, maxPerNight: 1, minDaysBetweenTouches: 0, ...over,
  };
}

async function read(id: string, who: 'planner' | 'engineer' | 'admin' = 'planner'): Promise<Campaign> {
  const res = await (await ctx.as(who))('get', `/api/campaigns/${id}`);
  expect(res.status).toBe(200);
  return campaignSchema.parse(res.body);
}

/** Creates a campaign as the planner and plans it with the job handler: a draft. */
async function plannedDraft(over: Record<string, unknown> = {}): Promise<Campaign> {
  const res = await (await ctx.as('planner'))('post', '/api/campaigns').send(campaignRequest(over));
  expect(res.status).toBe(201);
  const id = res.body.id as string;
  expect(ctx.queue.slotJobs.at(-1)).toEqual({ kind: 'campaign', id });
  expect((await read(id)).status).toBe('queued');
  await runSlotJob({ db: ctx.db, engine: slotEngine, log: quiet, now: () => NOW, progressEveryMs: 0 }, { id: 'job', data: { kind: 'campaign', id } });
  return read(id);
}

async function campaignWindowCount(title: string): Promise<number> {
  const { rows } = await ctx.pool.query('select count(*)::int as n from windows where title like $1', [`${title} — %`]);
  return rows[0].n as number;
}

describe('roles and validation', () => {
  test('only planners create; a tenant finds no such route; engineers and admins read', async () => {
    expect((await (await ctx.as('engineer'))('post', '/api/campaigns').send(campaignRequest())).status).toBe(403);
    expect((await (await ctx.as('admin'))('post', '/api/campaigns').send(campaignRequest())).status).toBe(403);
    expect((await (await ctx.as('tenant'))('post', '/api/campaigns').send(campaignRequest())).status).toBe(404);
    expect((await (await ctx.as('tenant'))('get', '/api/campaigns')).status).toBe(404);
    expect((await (await ctx.as('approver'))('get', '/api/campaigns')).status).toBe(403);
    const created = await (await ctx.as('planner'))('post', '/api/campaigns').send(campaignRequest());
    expect(created.status).toBe(201);
    expect(created.body.id).toMatch(/^cp-/);
    for (const who of ['engineer', 'admin'] as const) expect((await read(created.body.id, who)).status).toBe('queued');
    expect((await (await ctx.as('tenant'))('get', `/api/campaigns/${created.body.id}`)).status).toBe(404);
  });

  test('no groups, an empty group, an unknown element, bad rules: 400 with words', async () => {
    const planner = await ctx.as('planner');
    const none = await planner('post', '/api/campaigns').send(campaignRequest({ groups: [] }));
    expect(none.status).toBe(400);
    expect(none.body.error.message).toContain('Add at least one group');
    const empty = await planner('post', '/api/campaigns').send(campaignRequest({ groups: [{ label: 'Empty', sites: [] }] }));
    expect(empty.body.error.message).toContain('Group "Empty" needs at least one site or span.');
    const unknown = await planner('post', '/api/campaigns').send(campaignRequest({ groups: [{ label: 'Lost', sites: ['nowhere-site'] }] }));
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.code).toBe('SLOT_REQUEST_INVALID');
    expect(unknown.body.error.message).toContain('nowhere-site');
    const rules = await planner('post', '/api/campaigns').send(campaignRequest({ maxPerNight: 0 }));
    expect(rules.status).toBe(400);
    expect(rules.body.error.details[0].path).toBe('$.maxPerNight');
  });
});

describe('a draft', () => {
  let draft: Campaign;

  beforeAll(async () => {
    draft = await plannedDraft();
  });

  test('planning gives one window per group on different nights, costs and progress', () => {
    expect(draft.status).toBe('draft');
    expect(draft.windows.map((w) => w.label)).toEqual(['North splice', 'South splice']);
    expect(new Set(draft.windows.map((w) => w.night)).size).toBe(2);
    expect(draft.unscheduled).toEqual([]);
    expect(draft.totalCost).toBeCloseTo(draft.windows.reduce((s, w) => s + w.cost, 0));
    // The start's figure is its windows' sum in points, never the scheduler's penalty for a group left out.
    expect(draft.startCost).toBeGreaterThanOrEqual(draft.totalCost!);
    expect(draft.startCost).toBeLessThan(10_000);
    expect(draft.startScheduled).toBe(2);
    expect(draft.progress).toMatchObject({ phase: 'finishing', done: 2, total: 2 });
    expect(draft.windows[0].elements).toEqual([{ kind: 'span', id: ctx.id('p1'), name: 'Site A – Site B' }]);
    for (const w of draft.windows) expect(w.alternatives.length).toBeGreaterThan(0);
    expect(draft.createdBy).toEqual({ id: ctx.users.planner.id, name: `User ${ctx.users.planner.id}` });
  });

  test('the calendar lists drafts by status and range', async () => {
    const engineer = await ctx.as('engineer');
    const list = campaignListSchema.parse((await engineer('get', '/api/campaigns?status=draft')).body);
    expect(list.campaigns.map((c) => c.id)).toContain(draft.id);
    expect(list.campaigns.every((c) => c.status === 'draft')).toBe(true);
    const inMay = campaignListSchema.parse((await engineer('get', '/api/campaigns?status=draft&from=2029-05-01T00:00:00Z&to=2029-06-01T00:00:00Z')).body);
    expect(inMay.campaigns.map((c) => c.id)).toContain(draft.id);
    const inApril = campaignListSchema.parse((await engineer('get', '/api/campaigns?status=draft&from=2029-04-01T00:00:00Z&to=2029-05-01T00:00:00Z')).body);
    expect(inApril.campaigns.map((c) => c.id)).not.toContain(draft.id);
    const bad = await engineer('get', '/api/campaigns?status=pending');
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toContain('must be one of');
  });

  test('a window moves to another usable start; the version goes up', async () => {
    const [north, south] = draft.windows;
    const target = north.alternatives.find((a) => a.night !== south.night)!;
    expect(target).toBeDefined();
    const res = await (await ctx.as('planner'))('patch', `/api/campaigns/${draft.id}`).send({ version: draft.version, windows: [{ group: 0, start: target.start }] });
    expect(res.status).toBe(200);
    const moved = campaignSchema.parse(res.body);
    expect(moved.version).toBe(draft.version + 1);
    expect(moved.windows[0]).toMatchObject({ start: target.start, night: target.night });
    expect(moved.windows[1].start).toBe(south.start);
    draft = moved;
  });

  test('a move onto a night that already has its one window: 400 CAMPAIGN_RULES, nothing changes', async () => {
    const [north, south] = draft.windows;
    const sameNight = south.alternatives.find((a) => a.night === north.night);
    expect(sameNight).toBeDefined();
    const res = await (await ctx.as('planner'))('patch', `/api/campaigns/${draft.id}`).send({ version: draft.version, windows: [{ group: 1, start: sameNight!.start }] });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('CAMPAIGN_RULES');
    expect(res.body.error.message).toContain('the campaign allows at most 1 a night');
    expect(res.body.error.message).toContain('North splice');
    expect(await read(draft.id)).toEqual(draft);
  });

  test('a start that is not one of the group\'s usable ones, or an unknown group: 400 CAMPAIGN_RULES naming them', async () => {
    const planner = await ctx.as('planner');
    const off = await planner('patch', `/api/campaigns/${draft.id}`).send({ version: draft.version, windows: [{ group: 0, start: '2029-05-08T13:17:00Z' }] });
    expect(off.status).toBe(400);
    expect(off.body.error).toMatchObject({ code: 'CAMPAIGN_RULES' });
    expect(off.body.error.message).toContain('Group "North splice" cannot start then');
    const nobody = await planner('patch', `/api/campaigns/${draft.id}`).send({ version: draft.version, windows: [{ group: 7, start: draft.windows[0].start }] });
    expect(nobody.body.error.message).toContain('The campaign has no group 8.');
  });

  test('a stale version: 409 STALE_VERSION; an engineer may not change it', async () => {
    const stale = await (await ctx.as('planner'))('patch', `/api/campaigns/${draft.id}`).send({ version: draft.version - 1, title: `${ctx.prefix} Renamed` });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('STALE_VERSION');
    expect((await (await ctx.as('engineer'))('patch', `/api/campaigns/${draft.id}`).send({ version: draft.version, title: 'x' })).status).toBe(403);
  });

  test('booking is all or nothing: a freeze over one window books none, and says which group', async () => {
    const south = draft.windows[1];
    await ctx.db.insert(freezes).values({
      id: `${ctx.prefix}-freeze`, title: 'Quarter-end freeze', startsAt: new Date(south.start), endsAt: new Date(south.end),
    });
    try {
      const res = await (await ctx.as('planner'))('post', `/api/campaigns/${draft.id}/book`).send({ version: draft.version });
      expect(res.status).toBe(409);
      expect(res.body.error.code).toBe('FREEZE_CONFLICT');
      expect(res.body.error.message).toContain('group "South splice"');
      expect(res.body.error.message).toContain('Quarter-end freeze');
    } finally {
      await ctx.pool.query('delete from freezes where id = $1', [`${ctx.prefix}-freeze`]);
    }
    expect(await campaignWindowCount(draft.title)).toBe(0);
    expect(await read(draft.id)).toMatchObject({ status: 'draft', version: draft.version, bookedWindowIds: [] });
  });

  test('a clean booking books every window at once; booking again is refused', async () => {
    const planner = await ctx.as('planner');
    const res = await planner('post', `/api/campaigns/${draft.id}/book`).send({ version: draft.version });
    expect(res.status).toBe(201);
    const booked = campaignBookedSchema.parse(res.body);
    expect(booked.windowIds).toHaveLength(2);
    expect(booked.campaign).toMatchObject({ status: 'booked', version: draft.version + 1, bookedWindowIds: booked.windowIds });
    const { rows } = await ctx.pool.query(
      `select w.title, w.starts_at, w.status, e.element_id, e.effect from windows w join window_elements e on e.window_id = w.id
       where w.id = any($1) order by w.title`, [booked.windowIds]);
    expect(rows.map((r) => [r.title, new Date(r.starts_at).toISOString(), r.status, r.element_id, r.effect])).toEqual([
      [`${draft.title} — North splice`, draft.windows[0].start, 'draft', ctx.id('p1'), 'down'],
      [`${draft.title} — South splice`, draft.windows[1].start, 'draft', ctx.id('p2'), 'down'],
    ]);
    const audit = await ctx.pool.query("select count(*)::int as n from audit_log where action = 'campaign.book' and entity_id = $1", [draft.id]);
    expect(audit.rows[0].n).toBe(1);

    const again = await planner('post', `/api/campaigns/${draft.id}/book`).send({ version: booked.campaign.version });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('CAMPAIGN_NOT_DRAFT');
    const stale = await planner('post', `/api/campaigns/${draft.id}/book`).send({ version: draft.version });
    expect(stale.status).toBe(409);
    expect(await campaignWindowCount(draft.title)).toBe(2);
  });
});

test('while planning, the campaign is running and its progress counts groups', async () => {
  const res = await (await ctx.as('planner'))('post', '/api/campaigns').send(campaignRequest({ title: `${ctx.prefix} Watched audit` }));
  const id = res.body.id as string;
  const seen: string[] = [];
  const watching: SlotEngine = {
    ...slotEngine,
    findSlotsForGroups: (db, timing, groups, opts) => slotEngine.findSlotsForGroups(db, timing, groups, {
      ...opts,
      onProgress: async (p) => {
        await opts.onProgress?.(p);
        const now = await read(id);
        seen.push(`${now.status}:${now.progress?.total}`);
        expect(now.progress!.done).toBeLessThanOrEqual(2);
      },
    }),
  };
  await runSlotJob({ db: ctx.db, engine: watching, log: quiet, now: () => NOW, progressEveryMs: 0 }, { id: 'job', data: { kind: 'campaign', id } });
  expect(seen.length).toBeGreaterThan(0);
  expect(new Set(seen)).toEqual(new Set(['running:2']));
  expect((await read(id)).status).toBe('draft');
});

test('with the scheduling in a thread, as the slot jobs run it, a plan drafts the same and reports the same steps', async () => {
  const request = campaignCreateSchema.parse(campaignRequest());
  const plan = async (engine: SlotEngine) => {
    const progress: SearchProgress[] = [];
    const draft = await planCampaign({ db: ctx.db, engine, now: NOW, onProgress: (p) => { progress.push(p); } }, request);
    return { draft, steps: progress.filter((p) => p.phase === 'scheduling').map(({ done, total }) => [done, total]) };
  };
  const here = await plan(slotEngine);
  const there = await plan(withCampaignThread(slotEngine));
  expect(there.draft).toEqual(here.draft);
  expect(there.draft.assignment.filter((s) => s !== null)).toHaveLength(2);
  expect(there.steps).toEqual(here.steps);
  // The phase's opening (of the groups), then the search's steps up to its budget.
  expect(there.steps[0]).toEqual([0, 2]);
  expect(there.steps.length).toBeGreaterThan(1);
  const [done, total] = there.steps.at(-1)!;
  expect(done).toBe(total);
  expect(total).toBeGreaterThan(2);
});

test('a discarded draft leaves the calendar and can no longer be booked', async () => {
  const draft = await plannedDraft({ title: `${ctx.prefix} Second audit` });
  const planner = await ctx.as('planner');
  const res = await planner('delete', `/api/campaigns/${draft.id}`).send({ version: draft.version });
  expect(res.status).toBe(200);
  expect(campaignSchema.parse(res.body).status).toBe('discarded');
  const list = campaignListSchema.parse((await planner('get', '/api/campaigns')).body);
  expect(list.campaigns.map((c) => c.id)).not.toContain(draft.id);
  const book = await planner('post', `/api/campaigns/${draft.id}/book`).send({ version: draft.version + 1 });
  expect(book.body.error.code).toBe('CAMPAIGN_NOT_DRAFT');
});

test('booking checks the once-in-D-days rule again: a window booked since planning on a shared slice refuses it', async () => {
  // June 2029: one group on span p1 (which "Own control" rides), a slice touched at most once in 7 days.
  const draft = await plannedDraft({
    title: `${ctx.prefix} Spacing audit`, groups: [{ label: 'North splice', spans: [ctx.id('p1')] }],
    from: '2029-06-04T00:00:00Z', to: '2029-06-07T00:00:00Z', minDaysBetweenTouches: 7,
  });
  expect(draft.windows).toHaveLength(1);
  const planner = await ctx.as('planner');
  // Booked after the draft, two days after its night, on the same span.
  const later = new Date(Date.parse(draft.windows[0].start) + 2 * 86_400_000);
  const elsewhere = await planner('post', '/api/windows').send({
    title: `${ctx.prefix} Late duct repair`, startsAt: later.toISOString(), endsAt: new Date(later.getTime() + 2 * 3_600_000).toISOString(),
    workType: 'fibre splice', elements: [{ kind: 'span', id: ctx.id('p1'), effect: 'down' }],
  });
  expect(elsewhere.status).toBe(201);

  const refused = await planner('post', `/api/campaigns/${draft.id}/book`).send({ version: draft.version });
  expect(refused.status).toBe(409);
  expect(refused.body.error.code).toBe('CAMPAIGN_SPACING');
  expect(refused.body.error.message).toContain('group "North splice"');
  expect(refused.body.error.message).toContain(`within 7 days of "${ctx.prefix} Late duct repair", which also takes out "Own control"`);
  expect(refused.body.error.message).not.toContain(ctx.id('S1'));
  expect(await campaignWindowCount(draft.title)).toBe(0);
  expect(await read(draft.id)).toMatchObject({ status: 'draft', version: draft.version });

  // Withdrawn, the other window no longer counts and the draft books.
  const w = elsewhere.body.window as { id: string; version: number };
  expect((await planner('post', `/api/windows/${w.id}/transition`).send({ to: 'withdrawn', version: w.version })).status).toBe(200);
  expect((await planner('post', `/api/campaigns/${draft.id}/book`).send({ version: draft.version })).status).toBe(201);
  expect(await campaignWindowCount(draft.title)).toBe(1);
});
