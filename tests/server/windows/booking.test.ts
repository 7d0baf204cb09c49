// POST /api/windows: booking rules with clear codes, nothing written on failure, freezes and the admin override.
import { windowMutationSchema } from '../../../shared/windows';
import { booking, insertRing } from './helpers/ring-fixture';
import { setupWindowsApp, type WindowsContext } from './helpers/windows-app';

// A fixed clock; this file books in April–June 2027 only, other files use other months.
const NOW = new Date('2027-03-01T08:00:00Z');
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

const r23 = () => ({ kind: 'span' as const, id: id('r23'), effect: 'down' as const });
const book = async (body: unknown, role: 'engineer' | 'admin' | 'planner' | 'approver' | 'tenant' = 'engineer') =>
  (await ctx.as(role))('post', '/api/windows').send(body as object);
const countTitled = async (title: string) =>
  Number((await ctx.pool.query('select count(*) from windows where title = $1', [`${ctx.prefix} ${title}`])).rows[0].count);

test('a valid booking is stored as a draft in UTC with its owner, elements and an audit row', async () => {
  const res = await book(booking(ctx.prefix, 'ok', '2027-04-06T22:00:00+02:00', '2027-04-07T02:00:00+02:00', [
    r23(), { kind: 'site', id: id('R5'), effect: 'reduced', fraction: 0.5 },
  ], { notes: 'splice' }));
  expect(res.status).toBe(201);
  const { window, reverted } = windowMutationSchema.parse(res.body);
  expect(reverted).toBe(false);
  expect(window).toMatchObject({
    startsAt: '2027-04-06T20:00:00.000Z', endsAt: '2027-04-07T00:00:00.000Z', durationHours: 4,
    status: 'draft', version: 1, owner: { id: ctx.users.engineer.id }, notes: 'splice', conflictCount: 0, touchesCritical: false,
  });
  expect(window.elements).toEqual([
    { kind: 'site', id: id('R5'), effect: 'reduced', fraction: 0.5 },
    { kind: 'span', id: id('r23'), effect: 'down', fraction: null },
  ]);
  const audit = await ctx.pool.query(`select actor_id, action, before, after from audit_log where entity = 'window' and entity_id = $1`, [window.id]);
  expect(audit.rows).toHaveLength(1);
  expect(audit.rows[0]).toMatchObject({ actor_id: ctx.users.engineer.id, action: 'window.create', before: null });
  expect(audit.rows[0].after).toMatchObject({ title: `${ctx.prefix} ok`, startsAt: '2027-04-06T20:00:00.000Z', status: 'draft' });
});

test.each([
  ['not a date', { startsAt: 'next tuesday' }, 'VALIDATION_FAILED'],
  ['no time-zone offset', { startsAt: '2027-04-10T10:00:00' }, 'VALIDATION_FAILED'],
  ['end before start', { startsAt: '2027-04-10T10:00:00Z', endsAt: '2027-04-10T09:00:00Z' }, 'WINDOW_ENDS_BEFORE_START'],
  ['end equal to start', { startsAt: '2027-04-10T10:00:00Z', endsAt: '2027-04-10T10:00:00Z' }, 'WINDOW_ENDS_BEFORE_START'],
  ['in the past', { startsAt: '2027-03-01T07:00:00Z', endsAt: '2027-03-01T09:00:00Z' }, 'WINDOW_IN_PAST'],
  ['longer than the 12 h policy', { startsAt: '2027-04-10T00:00:00Z', endsAt: '2027-04-10T13:00:00Z' }, 'WINDOW_TOO_LONG'],
  ['no elements', { elements: [] }, 'WINDOW_NO_ELEMENTS'],
  ['reduced without a fraction', { elements: [{ kind: 'span', id: 'x', effect: 'reduced' }] }, 'WINDOW_BAD_FRACTION'],
  ['reduced to 1', { elements: [{ kind: 'span', id: 'x', effect: 'reduced', fraction: 1 }] }, 'WINDOW_BAD_FRACTION'],
  ['an unknown kind', { elements: [{ kind: 'router', id: 'x', effect: 'down' }] }, 'VALIDATION_FAILED'],
])('refused (%s) with a clear code and nothing written', async (title, overrides, code) => {
  const body = { ...booking(ctx.prefix, title, '2027-04-10T10:00:00Z', '2027-04-10T12:00:00Z', [r23()]), ...overrides };
  const res = await book(body);
  expect(res.status).toBe(400);
  expect(res.body.error.code).toBe(code);
  expect(res.body.error.message.length).toBeGreaterThan(10);
  expect(await countTitled(title)).toBe(0);
});

test('duplicates are named', async () => {
  const res = await book(booking(ctx.prefix, 'dup', '2027-04-10T10:00:00Z', '2027-04-10T12:00:00Z', [r23(), r23()]));
  expect(res.status).toBe(400);
  expect(res.body.error).toMatchObject({ code: 'WINDOW_DUPLICATE_ELEMENTS' });
  expect(res.body.error.message).toContain(id('r23'));
});

test('unknown element ids are all listed and nothing is written', async () => {
  const res = await book(booking(ctx.prefix, 'unknown', '2027-04-10T10:00:00Z', '2027-04-10T12:00:00Z', [
    r23(), { kind: 'site', id: 'no-such-site', effect: 'down' }, { kind: 'span', id: id('R1'), effect: 'down' },
  ]));
  expect(res.status).toBe(400);
  expect(res.body.error.code).toBe('UNKNOWN_ELEMENTS');
  expect(res.body.error.message).toContain('site no-such-site');
  expect(res.body.error.message).toContain(`span ${id('R1')}`); // a site id used as a span is unknown too
  expect(res.body.error.message).not.toContain(id('r23'));
  expect(await countTitled('unknown')).toBe(0);
});

test('a start a moment ago is within the clock-skew allowance', async () => {
  const res = await book(booking(ctx.prefix, 'skew', '2027-03-01T07:58:00Z', '2027-03-01T09:00:00Z', [r23()]));
  expect(res.status).toBe(201);
});

test('approvers and tenants may not book', async () => {
  const body = booking(ctx.prefix, 'roles', '2027-04-12T10:00:00Z', '2027-04-12T12:00:00Z', [r23()]);
  expect((await book(body, 'approver')).status).toBe(403);
  expect((await book(body, 'tenant')).status).toBe(403);
  expect(await countTitled('roles')).toBe(0);
});

describe('time zones', () => {
  test('a window booked at +01:00 reads back as the same instant in UTC, whatever zone it is compared in', async () => {
    const res = await book(booking(ctx.prefix, 'tz', '2027-03-28T01:30:00+01:00', '2027-03-28T03:30:00+02:00', [r23()]));
    expect(res.status).toBe(201);
    const read = await (await ctx.as('planner'))('get', `/api/windows/${res.body.window.id}`);
    expect(read.body.startsAt).toBe('2027-03-28T00:30:00.000Z');
    expect(Date.parse(read.body.startsAt)).toBe(Date.parse('2027-03-27T19:30:00-05:00'));
    // 01:30 CET to 03:30 CEST is one real hour across the spring-forward gap, not two.
    expect(read.body.durationHours).toBe(1);
  });

  test('spring forward (Europe/Berlin, 2027-03-28): 00:00 CET → 13:00 CEST is 12 real hours and fits the 12 h policy', async () => {
    const res = await book(booking(ctx.prefix, 'dst-spring', '2027-03-28T00:00:00+01:00', '2027-03-28T13:00:00+02:00', [r23()]));
    expect(res.status).toBe(201);
    expect(res.body.window.durationHours).toBe(12);
  });

  test('fall back (Europe/Berlin, 2027-10-31): 00:00 CEST → 12:00 CET is 13 real hours and is too long', async () => {
    const res = await book(booking(ctx.prefix, 'dst-autumn', '2027-10-31T00:00:00+02:00', '2027-10-31T12:00:00+01:00', [r23()]));
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('WINDOW_TOO_LONG');
    expect(res.body.error.message).toContain('13 hours');
  });
});

describe('freezes', () => {
  let freezeId: string;
  const inside = () => booking(ctx.prefix, 'in-freeze', '2027-06-02T10:00:00+02:00', '2027-06-02T14:00:00+02:00', [r23()]);

  beforeAll(async () => {
    const res = await (await ctx.as('admin'))('post', '/api/freezes').send({
      title: `${ctx.prefix} Harbour festival`, startsAt: '2027-06-01T00:00:00Z', endsAt: '2027-06-05T00:00:00Z', reason: 'big event',
    });
    expect(res.status).toBe(201);
    freezeId = res.body.id;
  });

  test('booking inside a freeze is refused with 409 naming the freeze', async () => {
    const res = await book(inside());
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('FREEZE_CONFLICT');
    expect(res.body.error.message).toContain('Harbour festival');
    // Times in words, in the booker's zone (the network's UTC−1 until they choose one) and in UTC; never raw ISO.
    expect(res.body.error.message).toContain('31 May 2027, 23:00');
    expect(res.body.error.message).toContain('1 Jun 2027, 00:00');
    expect(res.body.error.message).toMatch(/GMT-1.*UTC/);
    expect(res.body.error.message).not.toMatch(/\d{4}-\d{2}-\d{2}T/);
    expect(await countTitled('in-freeze')).toBe(0);
  });

  test('an engineer cannot override it even with a reason; an admin without a reason cannot either', async () => {
    expect((await book({ ...inside(), freezeOverrideReason: 'urgent' })).body.error.code).toBe('FREEZE_CONFLICT');
    expect((await book(inside(), 'admin')).body.error.code).toBe('FREEZE_CONFLICT');
    expect(await countTitled('in-freeze')).toBe(0);
  });

  test('an admin with a written reason books it; the reason is on the window and in the audit row', async () => {
    const reason = 'Cable fault; the repair cannot wait for the festival to end.';
    const res = await book({ ...inside(), freezeOverrideReason: reason }, 'admin');
    expect(res.status).toBe(201);
    expect(res.body.window.freezeOverrideReason).toBe(reason);
    const audit = await ctx.pool.query(`select after from audit_log where entity_id = $1 and action = 'window.create'`, [res.body.window.id]);
    expect(audit.rows[0].after.freezeOverrideReason).toBe(reason);
  });

  test('freezes: staff read, tenants and engineers cannot write, admins edit and delete with audit rows', async () => {
    const list = await (await ctx.as('approver'))('get', '/api/freezes?from=2027-05-01T00:00:00Z&to=2027-07-01T00:00:00Z');
    expect(list.status).toBe(200);
    expect(list.body.freezes.map((f: { id: string }) => f.id)).toContain(freezeId);
    expect((await (await ctx.as('tenant'))('get', '/api/freezes')).status).toBe(403);
    expect((await (await ctx.as('engineer'))('post', '/api/freezes').send({ title: 'x', startsAt: '2027-06-01T00:00:00Z', endsAt: '2027-06-02T00:00:00Z' })).status).toBe(403);
    const admin = await ctx.as('admin');
    const bad = await admin('patch', `/api/freezes/${freezeId}`).send({ endsAt: '2027-05-01T00:00:00Z' });
    expect(bad.body.error.code).toBe('FREEZE_ENDS_BEFORE_START');
    const patched = await admin('patch', `/api/freezes/${freezeId}`).send({ endsAt: '2027-06-06T00:00:00Z' });
    expect(patched.body.endsAt).toBe('2027-06-06T00:00:00.000Z');
    expect((await admin('delete', `/api/freezes/${freezeId}`)).status).toBe(204);
    expect((await admin('delete', `/api/freezes/${freezeId}`)).status).toBe(404);
    const audit = await ctx.pool.query(`select action, before->>'endsAt' as b, after->>'endsAt' as a from audit_log where entity = 'freeze' and entity_id = $1 order by id`, [freezeId]);
    expect(audit.rows).toEqual([
      { action: 'freeze.create', b: null, a: '2027-06-05T00:00:00.000Z' },
      { action: 'freeze.update', b: '2027-06-05T00:00:00.000Z', a: '2027-06-06T00:00:00.000Z' },
      { action: 'freeze.delete', b: '2027-06-06T00:00:00.000Z', a: null },
    ]);
  });
});
