// POST /api/windows with an Idempotency-Key: a double submit books one window (the repeat answers 200 with it),
// the key with another body is refused, and a key older than a day books anew.
import { randomUUID } from 'node:crypto';
import { windowMutationSchema } from '../../../shared/windows';
import { booking, insertRing } from '../windows/helpers/ring-fixture';
import { setupWindowsApp, type WindowsContext } from '../windows/helpers/windows-app';

// A fixed clock; this file books in November 2027 only.
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

const body = (title: string, day = 3) => booking(ctx.prefix, title, `2027-11-0${day}T22:00:00Z`, `2027-11-0${day + 1}T02:00:00Z`,
  [{ kind: 'span' as const, id: id('r23'), effect: 'down' as const }]);
const book = async (key: string, payload: object, role: 'engineer' | 'planner' = 'engineer') =>
  (await ctx.as(role))('post', '/api/windows').set('Idempotency-Key', key).send(payload);
const windowsTitled = async (title: string) =>
  (await ctx.pool.query('select id from windows where title = $1', [`${ctx.prefix} ${title}`])).rows.map((r) => r.id as string);
const createAudits = async (windowIds: string[]) =>
  Number((await ctx.pool.query(`select count(*) from audit_log where action = 'window.create' and entity_id = any($1)`, [windowIds])).rows[0].count);

test('two parallel bookings with one key make one window; both answers carry it (201 and 200)', async () => {
  const key = randomUUID();
  const answers = await Promise.all([book(key, body('double')), book(key, body('double'))]);
  expect(answers.map((a) => a.status).sort()).toEqual([200, 201]);
  const ids = answers.map((a) => windowMutationSchema.parse(a.body).window.id);
  expect(ids[0]).toBe(ids[1]);
  expect(await windowsTitled('double')).toEqual([ids[0]]);
  expect(await createAudits([ids[0]])).toBe(1);
});

test('a later repeat answers 200 with the first window; the same key with another body is refused, nothing booked', async () => {
  const key = randomUUID();
  const first = await book(key, body('repeat'));
  expect(first.status).toBe(201);
  const again = await book(key, body('repeat'));
  expect(again.status).toBe(200);
  expect(again.body.window.id).toBe(first.body.window.id);
  const other = await book(key, body('repeat changed', 5));
  expect(other.status).toBe(409);
  expect(other.body.error.code).toBe('IDEMPOTENCY_KEY_REUSED');
  expect(other.body.error.message).toMatch(/Idempotency-Key/);
  expect(await windowsTitled('repeat changed')).toEqual([]);
  expect(await windowsTitled('repeat')).toEqual([first.body.window.id]);
});

test('keys are per user, a key older than 24 hours books anew, and a malformed key is a 400', async () => {
  const key = randomUUID();
  const engineers = await book(key, body('per user'));
  const planners = await book(key, body('per user'), 'planner');
  expect([engineers.status, planners.status]).toEqual([201, 201]);
  expect(planners.body.window.id).not.toBe(engineers.body.window.id);
  await ctx.pool.query(`update window_idempotency_keys set created_at = created_at - interval '25 hours' where key = $1 and user_id = $2`,
    [key, ctx.users.engineer.id]);
  const expired = await book(key, body('per user'));
  expect(expired.status).toBe(201);
  expect((await windowsTitled('per user')).length).toBe(3);
  const bad = await book('has space', body('bad key'));
  expect([bad.status, bad.body.error.code]).toEqual([400, 'BAD_IDEMPOTENCY_KEY']);
  expect(await windowsTitled('bad key')).toEqual([]);
});

test('without a key every booking makes a window, as before', async () => {
  const engineer = await ctx.as('engineer');
  const statuses = await Promise.all([1, 2].map(async () => (await engineer('post', '/api/windows').send(body('no key'))).status));
  expect(statuses).toEqual([201, 201]);
  expect((await windowsTitled('no key')).length).toBe(2);
});
