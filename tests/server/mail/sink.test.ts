// The local SMTP sink: listens on loopback, keeps what nodemailer sends, refuses what is too large.
import nodemailer from 'nodemailer';
import { SINK_MAX_BYTES, startMailSink } from '../../../server/mail/sink';
import { readSinkMessages } from '../../../server/queries/mail/sink-messages';
import { createMailTransport } from '../../../server/mail/transport';
import { uniqueRecipient, useMailSink } from './mail-test-db';

const fx = useMailSink();

test('port 0 asks for a free port: the sink reports the one it got', () => {
  expect(fx.sink.port).toBeGreaterThan(0);
  expect(fx.sink.port).not.toBe(25);
});

test('a message sent with nodemailer is stored with envelope, decoded subject, raw text and size', async () => {
  const to = uniqueRecipient('sink');
  const since = new Date(Date.now() - 1000);
  const transport = createMailTransport(fx.config, { sinkPort: fx.sink.port });
  await transport.sendMail({ from: 'ops@slackwater.invalid', to, cc: 'copy@tenant.example', subject: 'Wartung über Nacht', text: 'Hello from the test' });
  const rows = await readSinkMessages(fx.db, { to, since });
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
  const transport = createMailTransport(fx.config, { sinkPort: fx.sink.port });
  await transport.sendMail({ from: 'ops@slackwater.invalid', to, subject: 'one', text: '1' });
  expect(await readSinkMessages(fx.db, { to: to.toUpperCase() })).toHaveLength(1);
  expect(await readSinkMessages(fx.db, { to, since: new Date(Date.now() + 60_000) })).toHaveLength(0);
});

test('a message over the size limit is refused with 552 and not stored', async () => {
  const to = uniqueRecipient('big');
  const transport = nodemailer.createTransport({ host: '127.0.0.1', port: fx.sink.port, ignoreTLS: true });
  const big = 'x'.repeat(SINK_MAX_BYTES + 1024);
  await expect(transport.sendMail({ from: 'ops@slackwater.invalid', to, subject: 'big', text: big }))
    .rejects.toMatchObject({ responseCode: 552 });
  expect(await readSinkMessages(fx.db, { to })).toHaveLength(0);
});

test('the sink is bound to loopback only', () => {
  expect(fx.sink.host).toBe('127.0.0.1');
});

test('a port already in use fails with a message that names SMTP_SINK_PORT', async () => {
  const taken = { smtp: { mode: 'sink' as const, sinkPort: fx.sink.port } };
  await expect(startMailSink(taken, fx.db, { log: () => undefined })).rejects.toThrow(/port \d+ on 127\.0\.0\.1 is in use.*SMTP_SINK_PORT/);
});
