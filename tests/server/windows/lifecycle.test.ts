// Assess, edit under optimistic locking, revert to draft, withdraw, refused transitions, MOP and the audit trail.
import { windowImpactSchema } from '../../../shared/window-impact';
import { booking, insertRing } from './helpers/ring-fixture';
import { setupWindowsApp, type WindowsContext } from './helpers/windows-app';

// This file books in July 2027 only.
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

async function bookOne(title: string, day: number) {
  const res = await (await ctx.as('engineer'))('post', '/api/windows').send(booking(ctx.prefix, title,
    `2027-07-${String(day).padStart(2, '0')}T22:00:00Z`, `2027-07-${String(day + 1).padStart(2, '0')}T02:00:00Z`,
    [{ kind: 'span', id: id('r23'), effect: 'down' }]));
  expect(res.status).toBe(201);
  return res.body.window as { id: string; version: number };
}

test('assessing computes the impact with risk, stores it and moves draft → assessed', async () => {
  const w = await bookOne('assess', 1);
  const res = await (await ctx.as('planner'))('post', `/api/windows/${w.id}/assess`).send({});
  expect(res.status).toBe(200);
  const impact = windowImpactSchema.parse(res.body);
  expect(impact.windowVersion).toBe(2);
  const own = impact.affected.find((a) => a.slice === id('own'));
  expect(own).toMatchObject({
    reasons: ['transit'], critical: true, severity: 'critical', sst: 2, priority: 1,
    tenant: { id: ctx.tenantId, name: `Tenant ${ctx.prefix}` },
  });
  // Stay-put risk over 4 h: sites R1–R4 (MTBF 50 000 h) and spans r12, r23, r34 (MTBF 20 000 h) on today's path.
  const rate = 4 / 50_000 + 3 / 20_000;
  expect(own!.failureProbability).toBeCloseTo(1 - Math.exp(-4 * rate), 10);
  // With r23 out, r56 becomes a bridge: the other slice keeps service but loses its protection (one level lower).
  expect(impact.affected.find((a) => a.slice === id('other'))).toMatchObject({ reasons: ['unprotected'], severity: 'low', unprotected: true });
  expect(impact.splits).toBe(false);
  expect(impact.touchesCritical).toBe(true);
  expect(impact.currentPaths.find((p) => p.slice === id('own'))).toEqual({ slice: id('own'),
    sites: { [id('own-f1')]: id('R1'), [id('own-f2')]: id('R4') }, paths: { [id('own-e1')]: [id('r12'), id('r23'), id('r34')] } });
  const read = await (await ctx.as('engineer'))('get', `/api/windows/${w.id}`);
  expect(read.body).toMatchObject({ status: 'assessed', version: 2, touchesCritical: true, impactStored: true });
  const stored = await (await ctx.as('engineer'))('get', `/api/windows/${w.id}/impact`);
  expect(stored.body).toEqual(res.body);
  expect((await (await ctx.as('approver'))('post', `/api/windows/${w.id}/assess`).send({})).status).toBe(403);
});

test('editing the times after assessment sends it back to draft, drops the impact and says so', async () => {
  const w = await bookOne('revert', 3);
  const planner = await ctx.as('planner');
  await planner('post', `/api/windows/${w.id}/assess`).send({});
  // The same instants written in another zone are not a change.
  const same = await planner('patch', `/api/windows/${w.id}`).send({ version: 2, startsAt: '2027-07-03T18:00:00-04:00', title: `${ctx.prefix} renamed` });
  expect(same.status).toBe(200);
  expect(same.body).toMatchObject({ reverted: false, window: { status: 'assessed', version: 3, impactStored: true } });
  const moved = await planner('patch', `/api/windows/${w.id}`).send({ version: 3, endsAt: '2027-07-04T03:00:00Z' });
  expect(moved.status).toBe(200);
  expect(moved.body).toMatchObject({ reverted: true, window: { status: 'draft', version: 4, impactStored: false, touchesCritical: false } });
  const impact = await planner('get', `/api/windows/${w.id}/impact`);
  expect(impact.status).toBe(404);
  expect(impact.body.error.code).toBe('IMPACT_NOT_FOUND');
  const audit = await ctx.pool.query(`select after from audit_log where entity_id = $1 and action = 'window.update' order by id`, [w.id]);
  expect(audit.rows.map((r) => [r.after.reverted, r.after.impactDropped, r.after.status])).toEqual([[false, false, 'assessed'], [true, true, 'draft']]);
});

test('a read of the impact always serves the stored one: after a re-assessment and after it is dropped', async () => {
  const w = await bookOne('reread', 7);
  const planner = await ctx.as('planner');
  const first = await planner('post', `/api/windows/${w.id}/assess`).send({});
  expect((await planner('get', `/api/windows/${w.id}/impact`)).body).toEqual(first.body);
  const again = await planner('post', `/api/windows/${w.id}/assess`).send({});
  expect(again.body.windowVersion).toBe(first.body.windowVersion + 1);
  const reread = await planner('get', `/api/windows/${w.id}/impact`);
  expect(reread.headers['content-type']).toMatch(/^application\/json/);
  expect(reread.body).toEqual(again.body);
  // The kept copy goes out compressed when the client takes it, and decodes to the same impact.
  for (const coding of ['gzip', 'br']) {
    const coded = await planner('get', `/api/windows/${w.id}/impact`).set('Accept-Encoding', coding);
    expect([coded.headers['content-encoding'], coded.headers.vary]).toEqual([coding, expect.stringMatching(/Accept-Encoding/i)]);
    expect(coded.body).toEqual(again.body);
  }
  await planner('patch', `/api/windows/${w.id}`).send({ version: again.body.windowVersion, endsAt: '2027-07-08T03:00:00Z' });
  expect((await planner('get', `/api/windows/${w.id}/impact`)).status).toBe(404);
});

test('changing the elements after assessment also reverts it', async () => {
  const w = await bookOne('revert-elements', 5);
  const planner = await ctx.as('planner');
  await planner('post', `/api/windows/${w.id}/assess`).send({});
  const res = await planner('patch', `/api/windows/${w.id}`).send({ version: 2, elements: [{ kind: 'site', id: id('R2'), effect: 'down' }] });
  expect(res.body).toMatchObject({ reverted: true, window: { status: 'draft', elements: [{ kind: 'site', id: id('R2') }] } });
});

test('a stale version is refused with 409 and a reload message, leaving the window untouched', async () => {
  const w = await bookOne('stale', 7);
  const engineer = await ctx.as('engineer');
  expect((await engineer('patch', `/api/windows/${w.id}`).send({ version: 1, notes: 'first' })).status).toBe(200);
  const stale = await engineer('patch', `/api/windows/${w.id}`).send({ version: 1, notes: 'second' });
  expect(stale.status).toBe(409);
  expect(stale.body.error).toEqual({ code: 'STALE_VERSION', message: 'This window was changed by someone else; reload and try again.' });
  expect((await engineer('get', `/api/windows/${w.id}`)).body).toMatchObject({ notes: 'first', version: 2 });
});

test('two concurrent edits with the same version: exactly one wins, the other gets 409', async () => {
  const w = await bookOne('race', 9);
  const [a, b] = await Promise.all([ctx.as('engineer'), ctx.as('planner')]);
  const results = await Promise.all([
    a('patch', `/api/windows/${w.id}`).send({ version: 1, notes: 'from engineer' }),
    b('patch', `/api/windows/${w.id}`).send({ version: 1, notes: 'from planner' }),
  ]);
  expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
  const winner = results.find((r) => r.status === 200)!;
  const read = await a('get', `/api/windows/${w.id}`);
  expect(read.body).toMatchObject({ version: 2, notes: winner.body.window.notes });
  const updates = await ctx.pool.query(`select count(*)::int as n from audit_log where entity_id = $1 and action = 'window.update'`, [w.id]);
  expect(updates.rows[0].n).toBe(1);
});

test('withdraw from draft; a withdrawn window can be neither edited nor moved again', async () => {
  const w = await bookOne('withdraw', 11);
  const engineer = await ctx.as('engineer');
  const res = await engineer('post', `/api/windows/${w.id}/transition`).send({ to: 'withdrawn', version: 1, reason: 'work cancelled' });
  expect(res.status).toBe(200);
  expect(res.body.window).toMatchObject({ status: 'withdrawn', version: 2 });
  const edit = await engineer('patch', `/api/windows/${w.id}`).send({ version: 2, notes: 'late' });
  expect(edit.body.error.code).toBe('WINDOW_NOT_EDITABLE');
  const again = await engineer('post', `/api/windows/${w.id}/transition`).send({ to: 'draft', version: 2 });
  expect(again.body.error.code).toBe('ILLEGAL_TRANSITION');
  const audit = await ctx.pool.query(`select before, after from audit_log where entity_id = $1 and action = 'window.transition'`, [w.id]);
  expect(audit.rows).toEqual([{ before: { status: 'draft', version: 1 }, after: { status: 'withdrawn', version: 2, reason: 'work cancelled' } }]);
});

test('illegal and not-yet-available transitions are refused and change nothing', async () => {
  const w = await bookOne('illegal', 13);
  const planner = await ctx.as('planner');
  const tryTo = (to: string, version: number) => planner('post', `/api/windows/${w.id}/transition`).send({ to, version });
  expect((await tryTo('done', 1)).body.error.code).toBe('ILLEGAL_TRANSITION');
  expect((await tryTo('planned', 1)).body.error.code).toBe('ILLEGAL_TRANSITION');
  expect((await tryTo('assessed', 1)).body.error.code).toBe('TRANSITION_GUARDED');
  expect((await tryTo('sideways', 1)).body.error.code).toBe('VALIDATION_FAILED');
  await planner('post', `/api/windows/${w.id}/assess`).send({});
  const guarded = await tryTo('planned', 2);
  expect(guarded.status).toBe(409);
  expect(guarded.body.error.code).toBe('TRANSITION_GUARDED');
  expect((await planner('get', `/api/windows/${w.id}`)).body).toMatchObject({ status: 'assessed', version: 2 });
});

test('the audit trail of one window lists every change in order with who made it', async () => {
  const w = await bookOne('trail', 15);
  const [engineer, planner] = await Promise.all([ctx.as('engineer'), ctx.as('planner')]);
  await planner('post', `/api/windows/${w.id}/assess`).send({});
  await engineer('patch', `/api/windows/${w.id}`).send({ version: 2, startsAt: '2027-07-15T23:00:00Z' });
  await engineer('post', `/api/windows/${w.id}/transition`).send({ to: 'withdrawn', version: 3 });
  const rows = (await ctx.pool.query(`select actor_id, action, before->>'status' as b, after->>'status' as a from audit_log where entity_id = $1 order by id`, [w.id])).rows;
  expect(rows).toEqual([
    { actor_id: ctx.users.engineer.id, action: 'window.create', b: null, a: 'draft' },
    { actor_id: ctx.users.planner.id, action: 'window.assess', b: 'draft', a: 'assessed' },
    { actor_id: ctx.users.engineer.id, action: 'window.update', b: 'assessed', a: 'draft' },
    { actor_id: ctx.users.engineer.id, action: 'window.transition', b: 'draft', a: 'withdrawn' },
  ]);
});

describe('method of procedure', () => {
  let windowId: string;
  beforeAll(async () => { windowId = (await bookOne('mop', 17)).id; });
  const pdf = Buffer.concat([Buffer.from('%PDF-1.4\n'), Buffer.alloc(2048, 0x20), Buffer.from('\n%%EOF\n')]);

  test('a PDF is stored with the window and downloads with its name and type', async () => {
    const engineer = await ctx.as('engineer');
    const put = await engineer('put', `/api/windows/${windowId}/mop`).attach('file', pdf, { filename: 'splice plan.pdf', contentType: 'application/pdf' });
    expect(put.status).toBe(200);
    expect(put.body).toMatchObject({ fileName: 'splice plan.pdf', mime: 'application/pdf', sizeBytes: pdf.length });
    const get = await engineer('get', `/api/windows/${windowId}/mop`).buffer(true).parse((res, cb) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(get.status).toBe(200);
    expect(get.headers['content-type']).toBe('application/pdf');
    expect(get.headers['content-disposition']).toBe('attachment; filename="splice plan.pdf"');
    expect(Buffer.compare(get.body as Buffer, pdf)).toBe(0);
    expect((await engineer('get', `/api/windows/${windowId}`)).body.mop).toMatchObject({ fileName: 'splice plan.pdf', sizeBytes: pdf.length });
    const audit = await ctx.pool.query(`select after from audit_log where entity_id = $1 and action = 'window.mop.upload'`, [windowId]);
    expect(audit.rows[0].after).toEqual({ fileName: 'splice plan.pdf', mime: 'application/pdf', sizeBytes: pdf.length });
  });

  test('plain text replaces it; other types, fake PDFs and oversized files are refused', async () => {
    const engineer = await ctx.as('engineer');
    const put = (body: Buffer, filename: string, contentType: string) =>
      engineer('put', `/api/windows/${windowId}/mop`).attach('file', body, { filename, contentType });
    expect((await put(Buffer.from('1. Call the NOC\n2. Splice\n'), 'steps.txt', 'text/plain')).body.mime).toBe('text/plain');
    expect((await put(Buffer.from([0x89, 0x50, 0x4e, 0x47]), 'a.png', 'image/png')).status).toBe(415);
    expect((await put(Buffer.from('not really'), 'fake.pdf', 'application/pdf')).body.error.code).toBe('MOP_UNSUPPORTED_TYPE');
    const big = await put(Buffer.alloc(10 * 1024 * 1024 + 1, 0x41), 'big.txt', 'text/plain');
    expect(big.status).toBe(413);
    expect(big.body.error.code).toBe('MOP_TOO_LARGE');
    expect((await engineer('get', `/api/windows/${windowId}`)).body.mop).toMatchObject({ fileName: 'steps.txt', mime: 'text/plain' });
    const audit = await ctx.pool.query(`select before, after from audit_log where entity_id = $1 and action = 'window.mop.upload' order by id`, [windowId]);
    expect(audit.rows).toHaveLength(2); // refused uploads leave no row
    expect(audit.rows[1]).toMatchObject({ before: { fileName: 'splice plan.pdf' }, after: { fileName: 'steps.txt', mime: 'text/plain' } });
  });

  test('tenants cannot download it; a window without one answers 404', async () => {
    // Tenants get tenant views only: an internal sub-resource answers as if it did not exist for them.
    expect((await (await ctx.as('tenant'))('get', `/api/windows/${windowId}/mop`)).status).toBe(404);
    const other = await bookOne('no-mop', 19);
    expect((await (await ctx.as('planner'))('get', `/api/windows/${other.id}/mop`)).body.error.code).toBe('MOP_NOT_FOUND');
  });
});
