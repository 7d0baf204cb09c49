// Mail worker: a queued notice mail reaches the sink and marks the notice sent; an unreachable server records
// each failed attempt and, when pg-boss's retries are used up (dead letter), marks the notice failed.
import { createServer } from 'node:net';
import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { notices, tenants, windows } from '../../../db/schema';
import { QUEUES, type MailJob } from '../../../server/jobs/queue';
import { readSinkMessages } from '../../../server/queries/mail/sink-messages';
import { readableMailError, registerMailWorker } from '../../../server/mail/worker';
import { testConfig } from '../helpers/test-app';
import { uniqueRecipient, useMailSink } from './mail-test-db';
import { startMailTestBoss, waitFor, type TestBoss } from './test-boss';

const bosses: TestBoss[] = [];
// Registered first so the bosses (and their mail workers) stop before the sink and the pool do.
afterAll(async () => {
  for (const b of bosses) await b.stop();
});
const fx = useMailSink();

/** A window, a tenant and a queued notice for them, all with ids of their own. */
async function insertNotice(): Promise<string> {
  const key = `mailw-${randomUUID().slice(0, 8)}`;
  await fx.db.insert(tenants).values({ id: `${key}-tenant`, name: `Tenant ${key}`, noticeDays: 7 });
  await fx.db.insert(windows).values({
    id: `${key}-window`, title: `Window ${key}`, status: 'cleared',
    startsAt: new Date('2031-03-04T22:00:00Z'), endsAt: new Date('2031-03-05T02:00:00Z'),
  });
  await fx.db.insert(notices).values({
    id: `${key}-notice`, windowId: `${key}-window`, tenantId: `${key}-tenant`, uid: `${key}@slackwater.invalid`,
    subject: 'Notice', body: 'Body', content: {}, ics: 'BEGIN:VCALENDAR\r\nEND:VCALENDAR\r\n',
  });
  return `${key}-notice`;
}

const readNotice = async (id: string) => (await fx.db.select().from(notices).where(eq(notices.id, id)))[0];

/** A loopback port nothing listens on (bound, then released). */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as { port: number };
  await new Promise<void>((resolve) => server.close(() => resolve()));
  return port;
}

test('success: the mail reaches the sink and the notice is sent, with attempts 1 and no error', async () => {
  const testBoss = await startMailTestBoss(2);
  bosses.push(testBoss);
  await registerMailWorker(testBoss.boss, { db: fx.db, config: fx.config, sinkPort: fx.sink.port, pollingIntervalSeconds: 0.5 });
  const noticeId = await insertNotice();
  const to = uniqueRecipient('worker-ok');
  const job: MailJob = { to: [to], subject: 'Planned work notice', text: 'Hello', noticeId };
  await testBoss.boss.send(QUEUES.mail, job);

  const notice = await waitFor(() => readNotice(noticeId), (n) => n.status === 'sent');
  expect(notice.attempts).toBe(1);
  expect(notice.lastError).toBeNull();
  expect(notice.sentAt).toBeInstanceOf(Date);
  const received = await readSinkMessages(fx.db, { to });
  expect(received.map((m) => m.subject)).toEqual(['Planned work notice']);
});

test('failure: every attempt records a readable error, and after the last retry the notice is failed', async () => {
  const retryLimit = 2;
  const testBoss = await startMailTestBoss(retryLimit);
  bosses.push(testBoss);
  const deadConfig = testConfig({ SMTP_URL: `smtp://127.0.0.1:${await closedPort()}` });
  await registerMailWorker(testBoss.boss, { db: fx.db, config: deadConfig, pollingIntervalSeconds: 0.5 });
  const noticeId = await insertNotice();
  await testBoss.boss.send(QUEUES.mail, { to: [uniqueRecipient('worker-fail')], subject: 'x', text: 'y', noticeId } satisfies MailJob);

  const notice = await waitFor(() => readNotice(noticeId), (n) => n.status === 'failed', 40_000);
  expect(notice.attempts).toBe(retryLimit + 1); // the first try and each retry
  expect(notice.lastError).toMatch(/ECONNECTION|ECONNREFUSED/);
  expect(notice.sentAt).toBeNull();
});

test('a job without a notice id (e.g. a sign-off request) is sent as well', async () => {
  const testBoss = await startMailTestBoss(0);
  bosses.push(testBoss);
  await registerMailWorker(testBoss.boss, { db: fx.db, config: fx.config, sinkPort: fx.sink.port, pollingIntervalSeconds: 0.5 });
  const to = uniqueRecipient('worker-plain');
  await testBoss.boss.send(QUEUES.mail, { to: [to], subject: 'Sign-off requested', text: 'Please review.' } satisfies MailJob);
  const received = await waitFor(() => readSinkMessages(fx.db, { to }), (rows) => rows.length > 0);
  expect(received[0].subject).toBe('Sign-off requested');
});

test('readableMailError names the code and the server reply', () => {
  const err = Object.assign(new Error('Message failed'), { code: 'EMESSAGE', response: '550 5.1.1 mailbox unknown' });
  expect(readableMailError(err)).toBe('EMESSAGE: Message failed (550 5.1.1 mailbox unknown)');
  expect(readableMailError('plain')).toBe('plain');
});

test('a notice mail waits until its version is committed, and a superseded version is never sent', async () => {
  const testBoss = await startMailTestBoss(5);
  bosses.push(testBoss);
  await registerMailWorker(testBoss.boss, { db: fx.db, config: fx.config, sinkPort: fx.sink.port, pollingIntervalSeconds: 0.5 });
  const noticeId = await insertNotice();
  // Version 1 queued before it is written (as from a transaction that has not committed yet).
  const early = uniqueRecipient('worker-early');
  await testBoss.boss.send(QUEUES.mail, { to: [early], subject: 'Version 1', text: 'v1', noticeId, noticeSequence: 1 } satisfies MailJob);
  // Version 0 is stale once version 1 lands; it must not go out.
  const stale = uniqueRecipient('worker-stale');
  await new Promise((r) => setTimeout(r, 1500));
  expect(await readSinkMessages(fx.db, { to: early })).toEqual([]);
  await fx.db.update(notices).set({ sequence: 1 }).where(eq(notices.id, noticeId));
  await testBoss.boss.send(QUEUES.mail, { to: [stale], subject: 'Version 0', text: 'v0', noticeId, noticeSequence: 0 } satisfies MailJob);

  const notice = await waitFor(() => readNotice(noticeId), (n) => n.status === 'sent');
  expect(notice.sequence).toBe(1);
  expect((await readSinkMessages(fx.db, { to: early })).map((m) => m.subject)).toEqual(['Version 1']);
  await new Promise((r) => setTimeout(r, 1500));
  expect(await readSinkMessages(fx.db, { to: stale })).toEqual([]);
});
