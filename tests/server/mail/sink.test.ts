// The local SMTP sink: listens on loopback, keeps what nodemailer sends, refuses what is too large.
import nodemailer from 'nodemailer';
import type pg from 'pg';
import type { Db } from '../../../db/client';
import type { ServerConfig } from '../../../server/env';
import { SINK_MAX_BYTES, startMailSink, type MailSink } from '../../../server/mail/sink';
import { readSinkMessages } from '../../../server/mail/sink-messages';
import { createMailTransport } from '../../../server/mail/transport';
import { openMailTestDb, uniqueRecipient } from './mail-test-db';

let db: Db;
let pool: pg.Pool;
let config: ServerConfig;
let sink: MailSink;

beforeAll(async () => {
  ({ db, pool, config } = await openMailTestDb());
  sink = await startMailSink(config, db);
});
afterAll(async () => {
  await sink.stop();
  await pool.end();
});

test('port 0 asks for a free port: the sink reports the one it got', () => {
  expect(sink.port).toBeGreaterThan(0);
  expect(sink.port).not.toBe(25);
});

test('a message sent with nodemailer is stored with envelope, decoded subject, raw text and size', async () => {
  const to = uniqueRecipient('sink');
  const since = new Date(Date.now() - 1000);
  const transport = createMailTransport(config, { sinkPort: sink.port });
  await transport.sendMail({ from: 'ops@slackwater.invalid', to, cc: 'copy@tenant.example', subject: 'Wartung über Nacht', text: 'Hello from the test' });
  const rows = await readSinkMessages(db, { to, since });
  expect(rows).toHaveLength(1);
  const [row] = rows;
  expect(row.envelopeFrom).toBe('ops@slackwater.invalid');
  expect(row.envelopeTo.sort()).toEqual(['copy@tenant.example', to].sort());
  expect(row.subject).toBe('Wartung über Nacht'); // RFC 2047 encoded word decoded
  expect(row.raw).toContain('Hello from the test');
  expect(row.sizeBytes).toBe(Buffer.byteLength(row.raw));
  expect(row.receivedAt.getTime()).toBeGreaterThanOrEqual(since.getTime());
});

test('readSinkMessages filters by recipient case-insensitively and by time', async () => {
  const to = uniqueRecipient('filter');
  const transport = createMailTransport(config, { sinkPort: sink.port });
  await transport.sendMail({ from: 'ops@slackwater.invalid', to, subject: 'one', text: '1' });
  expect(await readSinkMessages(db, { to: to.toUpperCase() })).toHaveLength(1);
  expect(await readSinkMessages(db, { to, since: new Date(Date.now() + 60_000) })).toHaveLength(0);
});

test('a message over the size limit is refused with 552 and not stored', async () => {
  const to = uniqueRecipient('big');
  const transport = nodemailer.createTransport({ host: '127.0.0.1', port: sink.port, ignoreTLS: true });
  const big = 'x'.repeat(SINK_MAX_BYTES + 1024);
  await expect(transport.sendMail({ from: 'ops@slackwater.invalid', to, subject: 'big', text: big }))
    .rejects.toMatchObject({ responseCode: 552 });
  expect(await readSinkMessages(db, { to })).toHaveLength(0);
});

test('the sink is bound to loopback only', () => {
  expect(sink.host).toBe('127.0.0.1');
});

test('a port already in use fails with a message that names SMTP_SINK_PORT', async () => {
  const taken = { smtp: { mode: 'sink' as const, sinkPort: sink.port } };
  await expect(startMailSink(taken, db, { log: () => undefined })).rejects.toThrow(/port \d+ on 127\.0\.0\.1 is in use.*SMTP_SINK_PORT/);
});
