// The audit trail API: who may read it, its filters, paging newest first, names rather than ids, changed fields in
// words without secrets, the CSV download (header, RFC 4180 quoting, formula guard), and that a window's history
// is read from the very rows the trail's window filter returns.
import Papa from 'papaparse';
import { eq } from 'drizzle-orm';
import { auditLog, freezes, windows } from '../../db/schema';
import { insertAuditEntry } from '../../server/queries/audit/audit-log';
import { AUDIT_CSV_COLUMNS } from '../../server/services/audit/audit-trail';
import { auditPageSchema, type AuditEntry } from '../../shared/audit';
import { windowHistorySchema } from '../../shared/window-history';
import { insertPlannedWindow, setupSignoffApp, type SignoffTestContext } from './signoff/helpers';

const NOW = new Date('2027-05-03T09:00:00Z');
let ctx: SignoffTestContext;
let w1: string;
let w2: string;
let freezeId: string;
const hour = (h: number) => new Date(NOW.getTime() - (48 - h) * 3_600_000);

type Who = 'admin' | 'approver' | 'approver2' | 'engineer' | 'planner' | 'tenant' | 'noRoles';
const get = async (who: Who, path: string) => (await ctx.as(who))('get', path);
const page = async (query: string, who: Who = 'admin') => {
  const res = await get(who, `/api/audit${query}`);
  expect([query, res.status]).toEqual([query, 200]);
  return auditPageSchema.parse(res.body);
};

beforeAll(async () => {
  ctx = await setupSignoffApp('audit_trail', NOW);
  // Sign everyone in first: sign-ins write rows of their own, and the trail below starts from a known log.
  for (const who of ['admin', 'approver', 'approver2', 'engineer', 'planner', 'tenant', 'noRoles'] as const) await ctx.as(who);
  await ctx.db.delete(auditLog);
  ({ windowId: w1 } = await insertPlannedWindow(ctx, { key: 'one' }));
  ({ windowId: w2 } = await insertPlannedWindow(ctx, { key: 'two' }));
  await ctx.db.update(windows).set({ title: 'Splice, "north" ring' }).where(eq(windows.id, w2));
  freezeId = `${ctx.prefix}-fz`;
  await ctx.db.insert(freezes).values({ id: freezeId, title: '=HYPERLINK("x")', startsAt: hour(0), endsAt: hour(1), createdBy: ctx.users.admin.id });
  const rows = [
    { actorId: ctx.users.engineer.id, action: 'window.create', entity: 'window', entityId: w1, at: hour(1), after: { title: 'x', status: 'draft', version: 1 } },
    { actorId: ctx.users.engineer.id, action: 'window.create', entity: 'window', entityId: w2, at: hour(2), after: { status: 'draft', version: 1 } },
    { actorId: ctx.users.admin.id, action: 'freeze.create', entity: 'freeze', entityId: freezeId, at: hour(3), after: { title: '=HYPERLINK("x")', reason: '+SUM(A1:A9)' } },
    { actorId: ctx.users.admin.id, action: 'user.time-zone', entity: 'user', entityId: ctx.users.admin.id, at: hour(4),
      before: { timeZone: 'UTC', passwordHash: 'old-hash-value' }, after: { timeZone: 'Europe/Oslo', passwordHash: 'new-hash-value', token: 'tok-secret-1', otpSecret: 'JBSWY3DP' } },
    { actorId: null, action: 'plan.fail', entity: 'plan', entityId: `${ctx.prefix}-pl-one`, at: hour(5), before: { status: 'queued' }, after: { status: 'failed', error: 'worker stopped' } },
  ];
  for (const r of rows) await insertAuditEntry(ctx.db, r);
  // Real actions through the API: a submission and a send-back with a comment, written by the services.
  ctx.clock.now = hour(6);
  expect((await (await ctx.as('planner'))('post', `/api/windows/${w1}/submit`).send({})).status).toBe(200);
  ctx.clock.now = hour(7);
  const back = await (await ctx.as('approver'))('post', `/api/signoff/${w1}/decision`).send({ decision: 'send-back', comment: 'Move the work, after the regatta.' });
  expect(back.status).toBe(200);
  ctx.clock.now = NOW;
}, 60_000);
afterAll(async () => {
  await ctx.cleanup();
  await ctx.close();
});

test('admins and approvers read the trail; engineers and planners are refused, tenants told it does not exist', async () => {
  for (const who of ['admin', 'approver'] as const) {
    expect([who, (await get(who, '/api/audit')).status]).toEqual([who, 200]);
    expect([who, (await get(who, `/api/audit?window=${w1}&format=csv`)).status]).toEqual([who, 200]);
  }
  for (const who of ['engineer', 'planner', 'noRoles'] as const) {
    expect([who, (await get(who, `/api/audit?window=${w1}&format=csv`)).status]).toEqual([who, 403]);
    expect([who, (await get(who, '/api/audit/choices')).status]).toEqual([who, 403]);
  }
  const tenant = await get('tenant', `/api/audit?window=${w1}&format=csv`);
  expect([tenant.status, tenant.body.error.code]).toEqual([404, 'ROUTE_NOT_FOUND']);
});

test('newest first, with the person by name, the action in words and the window by name with its screen', async () => {
  const { items, total } = await page('');
  expect(total).toBe(8);
  const times = items.map((e) => Date.parse(e.at));
  expect(times).toEqual([...times].sort((a, b) => b - a));
  const created = items.find((e) => e.action === 'window.create' && e.subject?.href === `/windows/${w2}`)!;
  expect([created.who, created.what, created.subject?.name]).toEqual([`User ${ctx.users.engineer.id}`, 'Booked a window', 'Splice, "north" ring']);
  const decision = items.find((e) => e.action === 'signoff.decision')!;
  expect([decision.what, decision.who, decision.comment]).toEqual(['Sent a plan back', `User ${ctx.users.approver.id}`, 'Move the work, after the regatta.']);
  const failed = items.find((e) => e.action === 'plan.fail')!;
  expect([failed.who, failed.subject]).toEqual([null, { kind: 'Move plan for', name: `${ctx.prefix} window one`, href: `/windows/${w1}/plans/${ctx.prefix}-pl-one` }]);
  const ids = new Set([...Object.values(ctx.users).map((u) => u.id), ctx.userId('approver2')]);
  const shown = items.flatMap((e) => [e.who, e.what, e.subject?.name, ...e.changes, e.comment]);
  expect(shown.filter((text) => text && ids.has(text))).toEqual([]);
});

test('changed fields are summarised in words and never show passwords, hashes, tokens or secrets', async () => {
  const res = await get('admin', '/api/audit?action=user.time-zone');
  const [entry] = auditPageSchema.parse(res.body).items;
  expect(entry.changes).toEqual(['Time zone: UTC → Europe/Oslo']);
  expect(entry.subject).toEqual({ kind: 'Person', name: `User ${ctx.users.admin.id}`, href: null });
  for (const secret of ['old-hash-value', 'new-hash-value', 'tok-secret-1', 'JBSWY3DP', 'passwordHash', 'otpSecret']) {
    expect([secret, res.text.includes(secret)]).toEqual([secret, false]);
  }
  const [submitted] = (await page('?action=signoff.submit')).items;
  expect(submitted.changes).toEqual(['Status: Planned → In review', 'Sign-off round: 1', 'Sign-off risk class (lower or higher, from the sign-off policy): lower']);
});

test('filters by window, person, action and date range narrow the rows, and combine', async () => {
  const byWindow = await page(`?window=${w1}`);
  expect(byWindow.items.map((e) => e.action).sort()).toEqual(['plan.fail', 'signoff.decision', 'signoff.send-back', 'signoff.submit', 'window.create']);
  const byPerson = await page(`?person=${ctx.users.admin.id}`);
  expect(byPerson.items.map((e) => e.action).sort()).toEqual(['freeze.create', 'user.time-zone']);
  expect((await page('?action=window.create')).total).toBe(2);
  const range = await page(`?from=${hour(2).toISOString()}&to=${hour(4).toISOString()}`);
  expect(range.items.map((e) => e.action)).toEqual(['freeze.create', 'window.create']);
  const both = await page(`?window=${w1}&person=${ctx.users.engineer.id}&action=window.create`);
  expect(both.items.map((e) => e.subject?.href)).toEqual([`/windows/${w1}`]);
  expect((await page(`?window=${w1}&person=${ctx.users.admin.id}`)).total).toBe(0);
  // A bare day as the end of the range takes in the whole of that day.
  expect((await page(`?to=${hour(0).toISOString().slice(0, 10)}`)).total).toBeGreaterThan(0);
});

test('pages cover every row once, newest first, with the total on each', async () => {
  const all = (await page('?pageSize=100')).items.map((e) => e.id);
  const seen: string[] = [];
  for (let p = 1; p <= 5; p += 1) {
    const part = await page(`?pageSize=2&page=${p}`);
    expect([p, part.total, part.pageSize]).toEqual([p, all.length, 2]);
    seen.push(...part.items.map((e) => e.id));
  }
  expect(seen).toEqual(all);
});

test('bad filters are a clear 400 and change nothing', async () => {
  const before = await ctx.db.$count(auditLog);
  const reversed = await get('admin', `/api/audit?from=${hour(5).toISOString()}&to=${hour(1).toISOString()}`);
  expect([reversed.status, reversed.body.error.message]).toEqual([400, expect.stringContaining('after its end')]);
  expect((await get('admin', '/api/audit?pageSize=5000')).status).toBe(400);
  expect((await get('admin', '/api/audit?from=yesterday')).status).toBe(400);
  expect((await get('admin', '/api/audit?format=xml')).status).toBe(400);
  expect(await ctx.db.$count(auditLog)).toBe(before);
});

test('no route changes the trail: writes are not found and reads leave the log as it was', async () => {
  const before = await ctx.db.$count(auditLog);
  for (const method of ['post', 'patch', 'put', 'delete'] as const) {
    const res = await (await ctx.as('admin'))(method, '/api/audit').send({});
    expect([method, res.status]).toEqual([method, 404]);
  }
  await get('approver', '/api/audit?format=csv');
  await get('approver', '/api/audit/choices');
  expect(await ctx.db.$count(auditLog)).toBe(before);
});

const csvRows = (text: string) => Papa.parse<string[]>(text, { skipEmptyLines: true }).data;

test('the CSV holds the filtered rows under a header row, quoted per RFC 4180 and guarded against formulas', async () => {
  const res = await get('approver', `/api/audit?window=${w2}&format=csv`);
  expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
  expect(res.headers['content-disposition']).toMatch(/^attachment; filename="audit-trail-2027-05-03\.csv"$/);
  expect(res.text.split('\r\n')[0]).toBe(AUDIT_CSV_COLUMNS.join(','));
  const [header, ...rows] = csvRows(res.text);
  expect(header).toEqual([...AUDIT_CSV_COLUMNS]);
  expect(rows).toHaveLength(1);
  // A title with a comma and quotes is one quoted field with its quotes doubled.
  expect(res.text).toContain('"Window “Splice, ""north"" ring”"');
  expect(rows[0][2]).toBe(`User ${ctx.users.engineer.id}`);
  expect(rows[0][3]).toBe('Booked a window');
  const freeze = csvRows((await get('admin', '/api/audit?action=freeze.create&format=csv')).text)[1];
  expect(freeze[4]).toBe('Freeze “=HYPERLINK("x")”');
  expect(freeze[6]).toBe("'+SUM(A1:A9)");
  const unguarded = csvRows((await get('admin', '/api/audit?action=freeze.create&format=csv')).text).flat().filter((cell) => /^[=+\-@]/.test(cell));
  expect(unguarded).toEqual([]);
});

test('the CSV shows times in the reader’s zone and in UTC', async () => {
  await ctx.pool.query('update users set time_zone = $1 where id = $2', ['Europe/Oslo', ctx.users.admin.id]);
  const rows = csvRows((await get('admin', '/api/audit?action=freeze.create&format=csv')).text);
  // hour(3) is 2027-05-01 12:00 UTC, 14:00 in Oslo (CEST, GMT+2).
  expect(rows[1].slice(0, 2)).toEqual(['Sat, 1 May 2027, 14:00 CEST', 'Sat, 1 May 2027, 12:00 UTC']);
});

test('a window’s history is read from the very rows the trail’s window filter returns', async () => {
  const history = windowHistorySchema.parse((await get('admin', `/api/windows/${w1}/history`)).body);
  const trail = (await page(`?window=${w1}`)).items;
  const trailIds = new Set(trail.map((e: AuditEntry) => e.id));
  expect(history.events.map((e) => e.kind)).toEqual(['booked', 'run-failed', 'submitted', 'sent-back']);
  expect(history.events.filter((e) => !trailIds.has(e.id))).toEqual([]);
  expect(history.events.find((e) => e.kind === 'sent-back')?.comment).toBe('Move the work, after the regatta.');
});

test('the filter choices list people, windows and actions by name and words', async () => {
  const res = await get('approver', '/api/audit/choices');
  expect(res.status).toBe(200);
  expect(res.body.people.map((p: { name: string }) => p.name)).toEqual(expect.arrayContaining([`User ${ctx.users.admin.id}`, `User ${ctx.users.engineer.id}`]));
  expect(res.body.windows.map((w: { id: string }) => w.id).sort()).toEqual([w1, w2].sort());
  expect(res.body.actions).toEqual(expect.arrayContaining([{ code: 'freeze.create', words: 'Added a freeze' }]));
});
