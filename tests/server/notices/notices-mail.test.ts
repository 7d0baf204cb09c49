// The whole sending path: issueNotices queues through pg-boss, the mail worker sends with nodemailer to the
// local SMTP sink and marks the notice sent; the message, parsed with mailparser, carries the notice text and
// the invitation both as a text/calendar alternative and as an .ics attachment (RFC 6047 iMIP).
import { eq } from 'drizzle-orm';
import { simpleParser, type ParsedMail } from 'mailparser';
import { notices } from '../../../db/schema';
import { QUEUES, type JobQueue, type MailJob } from '../../../server/jobs/queue';
import { startMailSink, type MailSink } from '../../../server/mail/sink';
import { readSinkMessages } from '../../../server/queries/mail/sink-messages';
import { registerMailWorker } from '../../../server/mail/worker';
import { issueNotices } from '../../../server/services/notices/issue-notices';
import { withdrawNotices } from '../../../server/services/notices/withdraw-notices';
import { testConfig } from '../helpers/test-app';
import { startMailTestBoss, waitFor, type TestBoss } from '../mail/test-boss';
import { insertClearedWindow, NOW, setupNoticesApp, type NoticesContext } from './fixture';
import { expectRfc5545Event, parseInvitation } from './ics-check';

let ctx: NoticesContext;
let sink: MailSink;
let testBoss: TestBoss;
let jobs: JobQueue;

beforeAll(async () => {
  ctx = await setupNoticesApp();
  const config = testConfig({ SMTP_URL: 'sink', SMTP_SINK_PORT: '0' });
  sink = await startMailSink(config, ctx.db);
  testBoss = await startMailTestBoss(1);
  await registerMailWorker(testBoss.boss, { db: ctx.db, config, sinkPort: sink.port, pollingIntervalSeconds: 0.5 });
  jobs = { ...ctx.queue, sendMail: async (job: MailJob) => (await testBoss.boss.send(QUEUES.mail, job)) ?? '' };
});
afterAll(async () => {
  await testBoss.stop();
  await sink.stop();
  await ctx.close();
});

const ownAddress = () => `ops.${ctx.prefix}@own.example`;

/** The invitation inside a message: the text/calendar alternative (mailparser lists it among attachments). */
function calendarParts(mail: ParsedMail) {
  return mail.attachments.filter((a) => /calendar|ics/i.test(a.contentType) || /\.ics$/i.test(a.filename ?? ''));
}

test('a tenant receives its notice with the invitation; the notice is marked sent', async () => {
  const windowId = await insertClearedWindow(ctx, 'mail', 15);
  await ctx.db.transaction((tx) => issueNotices(tx, { jobs, config: ctx.config, now: NOW }, windowId, ctx.users.approver.id));
  const [row] = await ctx.db.select().from(notices).where(eq(notices.windowId, windowId)).then((rows) => rows.filter((r) => r.tenantId === ctx.tenantId));

  const received = await waitFor(() => readSinkMessages(ctx.db, { to: ownAddress() }), (rows) => rows.length > 0);
  const mail = await simpleParser(received[0].raw);
  expect(mail.subject).toBe(row.subject);
  expect(mail.text).toContain('Function "Crane gateway" moves to another site 11 km away.');
  expect(mail.text).toContain(`/notices/${row.id}`);
  const to = (Array.isArray(mail.to) ? mail.to : [mail.to]).flatMap((a) => a?.value ?? []).map((v) => v.address);
  expect(to).toEqual(expect.arrayContaining([ownAddress(), ctx.users.tenant.email.toLowerCase()]));

  const parts = calendarParts(mail);
  expect(parts.length).toBeGreaterThan(0);
  for (const part of parts) {
    const p = parseInvitation(part.content.toString('utf8'));
    expectRfc5545Event(p);
    expect([p.method, p.uid[0], p.sequence]).toEqual(['REQUEST', `${windowId}.${ctx.tenantId}@slackwater.invalid`, 0]);
  }
  // RFC 6047 §2.4: the calendar alternative names its iTIP method in the content type.
  expect(received[0].raw).toMatch(/content-type:\s*text\/calendar;[^]{0,80}?method=REQUEST/i);

  const sent = await waitFor(async () => (await ctx.db.select().from(notices).where(eq(notices.id, row.id)))[0], (n) => n.status === 'sent');
  expect(sent.sentAt).toBeInstanceOf(Date);
  expect(sent.attempts).toBe(1);

  // Withdrawal: the cancellation reaches the same mailbox with the same UID and a higher SEQUENCE.
  await ctx.db.transaction((tx) => withdrawNotices(tx, { jobs, config: ctx.config, now: NOW }, windowId, ctx.users.admin.id));
  const both = await waitFor(() => readSinkMessages(ctx.db, { to: ownAddress() }), (rows) => rows.length > 1);
  const cancel = await simpleParser(both[1].raw);
  expect(cancel.subject).toMatch(/^Cancelled: /);
  const p = parseInvitation(calendarParts(cancel)[0].content.toString('utf8'));
  expect([p.method, p.status, p.uid[0], p.sequence]).toEqual(['CANCEL', 'CANCELLED', `${windowId}.${ctx.tenantId}@slackwater.invalid`, 1]);
});
