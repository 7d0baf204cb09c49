// Outbox API: admin only (tenants 404, other roles 403), newest first with paging, parsed message, raw download.
import request from 'supertest';
import { simpleParser } from 'mailparser';
import { outboxListSchema, outboxMessageSchema } from '../../../shared/outbox';
import type { MailJob } from '../../../server/jobs/queue';
import { composeMail } from '../../../server/mail/compose';
import { startMailSink, type MailSink } from '../../../server/mail/sink';
import { readSinkMessages } from '../../../server/queries/mail/sink-messages';
import { createMailTransport } from '../../../server/mail/transport';
import { signInAs } from '../helpers/sign-in';
import { setupTestApp, type TestContext, type TestUsers } from '../helpers/test-app';
import { uniqueRecipient } from './mail-test-db';

let ctx: TestContext;
let sink: MailSink;
const cookies = {} as Record<keyof TestUsers, string>;
const ids: { plain: number; invite: number } = { plain: 0, invite: 0 };
const inviteTo = uniqueRecipient('outbox-invite');

const ICS = [
  'BEGIN:VCALENDAR', 'VERSION:2.0', 'PRODID:-//Slackwater//Test//EN', 'METHOD:REQUEST', 'BEGIN:VEVENT',
  'UID:w-9.t-1@slackwater.invalid', 'DTSTAMP:20310201T090000Z',
  'DTSTART;TZID=Europe/Berlin:20310304T230000', 'DTEND;TZID=Europe/Berlin:20310305T030000',
  'SEQUENCE:1', 'STATUS:CONFIRMED',
  // a long SUMMARY folded over two lines, with an escaped comma (RFC 5545 §3.1, §3.3.11)
  'SUMMARY:Planned work on the eastern aggregation ring\\, slices move before ', ' the work starts',
  'END:VEVENT', 'END:VCALENDAR', '',
].join('\r\n');

async function send(job: MailJob): Promise<number> {
  await createMailTransport(ctx.config, { sinkPort: sink.port }).sendMail(composeMail(job, ctx.config.mailFrom));
  const rows = await readSinkMessages(ctx.db, { to: job.to[0] });
  return rows[rows.length - 1].id;
}

beforeAll(async () => {
  ctx = await setupTestApp();
  sink = await startMailSink({ smtp: { mode: 'sink', sinkPort: 0 } }, ctx.db);
  for (const key of Object.keys(ctx.users) as (keyof TestUsers)[]) cookies[key] = await signInAs(ctx.app, ctx.users[key].email);
  ids.plain = await send({ to: [uniqueRecipient('outbox-plain')], subject: 'Sign-off requested', text: 'Please review.' });
  ids.invite = await send({
    to: [inviteTo], subject: 'Planned work notice', text: 'Your slices move.',
    calendar: { method: 'REQUEST', content: ICS, filename: 'notice.ics' },
  });
});
afterAll(async () => {
  await sink.stop();
  await ctx.close();
});

const routes = [
  { route: 'GET /api/outbox', path: () => '/api/outbox' },
  { route: 'GET /api/outbox/:id', path: () => `/api/outbox/${ids.invite}` },
  { route: 'GET /api/outbox/:id/raw', path: () => `/api/outbox/${ids.invite}/raw` },
];

describe.each(routes)('$route', ({ path }) => {
  test.each(['engineer', 'planner', 'approver', 'noRoles'] as const)('as %s: 403', async (who) => {
    const res = await request(ctx.app).get(path()).set('Cookie', cookies[who]);
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('FORBIDDEN');
  });
  test('as a tenant: 404, as if there were no outbox', async () => {
    const res = await request(ctx.app).get(path()).set('Cookie', cookies.tenant);
    expect(res.status).toBe(404);
    expect(JSON.stringify(res.body)).not.toContain('Planned work');
  });
  test('without a session: 401', async () => {
    expect((await request(ctx.app).get(path())).status).toBe(401);
  });
  test('as admin: 200', async () => {
    expect((await request(ctx.app).get(path()).set('Cookie', cookies.admin)).status).toBe(200);
  });
});

test('the list is newest first, flags invitations, and pages', async () => {
  const list = outboxListSchema.parse((await request(ctx.app).get('/api/outbox?pageSize=100').set('Cookie', cookies.admin)).body);
  expect(list.total).toBeGreaterThanOrEqual(2);
  const order = list.items.map((m) => m.id);
  expect(order.indexOf(ids.invite)).toBeGreaterThanOrEqual(0);
  expect(order.indexOf(ids.invite)).toBeLessThan(order.indexOf(ids.plain)); // sent later, listed first
  const times = list.items.map((m) => Date.parse(m.receivedAt));
  expect([...times].sort((a, b) => b - a)).toEqual(times);

  const page = (n: number) => request(ctx.app).get(`/api/outbox?pageSize=1&page=${n}`).set('Cookie', cookies.admin);
  const pageOne = outboxListSchema.parse((await page(1)).body);
  const pageTwo = outboxListSchema.parse((await page(2)).body);
  expect(pageOne).toMatchObject({ page: 1, pageSize: 1 });
  expect(pageOne.items).toHaveLength(1);
  expect(pageOne.items[0].id).not.toBe(pageTwo.items[0].id);
  expect((await request(ctx.app).get('/api/outbox?pageSize=1000').set('Cookie', cookies.admin)).status).toBe(400);
});

test('the summary of an invitation: envelope recipient, subject, size and hasCalendar', async () => {
  const all = outboxListSchema.parse((await request(ctx.app).get('/api/outbox?pageSize=100').set('Cookie', cookies.admin)).body);
  const invite = all.items.find((m) => m.id === ids.invite);
  const plain = all.items.find((m) => m.id === ids.plain);
  expect(invite).toMatchObject({ to: [inviteTo], subject: 'Planned work notice', hasCalendar: true });
  expect(invite!.sizeBytes).toBeGreaterThan(ICS.length);
  expect(plain?.hasCalendar).toBe(false);
});

test('the message: headers, body, the .ics attachment, and the invitation read with its zone and folding', async () => {
  const res = await request(ctx.app).get(`/api/outbox/${ids.invite}`).set('Cookie', cookies.admin);
  const message = outboxMessageSchema.parse(res.body);
  expect(message).toMatchObject({
    id: ids.invite, to: inviteTo, subject: 'Planned work notice', text: expect.stringContaining('Your slices move.'),
    envelope: { from: expect.stringContaining('@'), to: [inviteTo] }, hasHtml: false,
  });
  expect(Date.parse(message.date!)).not.toBeNaN();
  expect(message.attachments).toEqual([{ filename: 'notice.ics', contentType: 'application/ics', sizeBytes: expect.any(Number) }]);
  expect(message.calendar?.method).toBe('REQUEST');
  expect(message.calendar?.text.replace(/\r\n/g, '\n')).toBe(ICS.replace(/\r\n/g, '\n'));
  expect(message.calendar?.event).toMatchObject({
    uid: 'w-9.t-1@slackwater.invalid',
    summary: 'Planned work on the eastern aggregation ring, slices move before the work starts',
    start: { value: '20310304T230000', timeZone: 'Europe/Berlin', iso: null },
    sequence: 1,
    status: 'CONFIRMED',
  });
});

test('raw: the stored message as message/rfc822, parseable again', async () => {
  const res = await request(ctx.app).get(`/api/outbox/${ids.invite}/raw`).set('Cookie', cookies.admin).buffer(true).parse((r, cb) => {
    const chunks: Buffer[] = [];
    r.on('data', (c: Buffer) => chunks.push(c));
    r.on('end', () => cb(null, Buffer.concat(chunks)));
  });
  expect(res.headers['content-type']).toMatch(/^message\/rfc822/);
  expect(res.headers['content-disposition']).toMatch(/^attachment; filename="?outbox-\d+\.eml"?$/);
  const mail = await simpleParser(res.body as Buffer);
  expect(mail.subject).toBe('Planned work notice');
});

test('unknown and malformed ids', async () => {
  const missing = await request(ctx.app).get('/api/outbox/999999999').set('Cookie', cookies.admin);
  expect(missing.status).toBe(404);
  expect(missing.body.error.code).toBe('MESSAGE_NOT_FOUND');
  const bad = await request(ctx.app).get('/api/outbox/abc').set('Cookie', cookies.admin);
  expect(bad.status).toBe(400);
  expect(bad.body.error.code).toBe('VALIDATION_FAILED');
});
