// Local SMTP sink: the fake for a hosted mail service. Listens on loopback only and keeps every message
// it receives in `sink_messages`, where the admin Outbox and tests read them.
import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer, type SMTPServerDataStream, type SMTPServerSession } from 'smtp-server';
import type { Db } from '../../db/client';
import type { ServerConfig } from '../env';
import { insertSinkMessage } from '../queries/mail/sink-messages';

/** Largest message the sink accepts (advertised with SIZE, RFC 1870); larger ones get 552. */
export const SINK_MAX_BYTES = 10 * 1024 * 1024;
// WARNING: loopback only. The sink accepts mail from anyone without authentication.
const SINK_HOST = '127.0.0.1';

export interface MailSink {
  /** the address the sink is bound to (always loopback) */
  host: string;
  port: number;
  stop(): Promise<void>;
}

/** The client's fault (answered with an SMTP error code), not the sink's: not logged. */
class SinkRefusal extends Error {
  constructor(readonly responseCode: number, message: string) {
    super(message);
  }
}

type SinkLog = (message: string, err?: unknown) => void;

/** Starts the sink on 127.0.0.1:`config.smtp.sinkPort` (0 = any free port). */
export async function startMailSink(
  config: Pick<ServerConfig, 'smtp'>,
  db: Db,
  options: { log?: SinkLog } = {},
): Promise<MailSink> {
  const requestedPort = config.smtp.mode === 'sink' ? config.smtp.sinkPort : 0;
  const log: SinkLog = options.log ?? (() => undefined);
  const server = new SMTPServer({
    name: 'slackwater-sink',
    banner: 'Slackwater local SMTP sink (messages are kept, never delivered)',
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    size: SINK_MAX_BYTES,
    logger: false,
    onData(stream, session, callback) {
      receive(db, stream, session).then(
        () => callback(),
        (err: unknown) => {
          if (!(err instanceof SinkRefusal)) log('could not store a message', err);
          callback(err instanceof Error ? err : new Error(String(err)));
        },
      );
    },
  });
  server.on('error', (err) => log('server error', err));
  const address = await new Promise<AddressInfo>((resolve, reject) => {
    const failed = (err: NodeJS.ErrnoException) => reject(err.code === 'EADDRINUSE'
      ? new Error(`SMTP sink: port ${requestedPort} on ${SINK_HOST} is in use (another Slackwater running?). `
        + 'Set SMTP_SINK_PORT to a free port, or 0 for any free port.')
      : err);
    server.server.once('error', failed);
    server.listen(requestedPort, SINK_HOST, () => {
      server.server.off('error', failed);
      resolve(server.server.address() as AddressInfo);
    });
  });
  let stopped: Promise<void> | null = null;
  return {
    host: address.address,
    port: address.port,
    stop: () => (stopped ??= new Promise<void>((resolve) => server.close(() => resolve()))),
  };
}

async function receive(db: Db, stream: SMTPServerDataStream, session: SMTPServerSession): Promise<void> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(chunk as Buffer);
  if (stream.sizeExceeded) {
    throw new SinkRefusal(552, `Message exceeds the sink's limit of ${SINK_MAX_BYTES} bytes`);
  }
  const bytes = Buffer.concat(chunks);
  // PostgreSQL text cannot hold NUL; mail should never contain it (RFC 5322 §2.3), so drop any.
  const raw = bytes.toString('utf8').replace(/\0/g, '');
  const from = session.envelope.mailFrom;
  await insertSinkMessage(db, {
    envelopeFrom: from ? from.address : null,
    envelopeTo: session.envelope.rcptTo.map((r) => r.address),
    subject: await subjectOf(raw),
    raw,
    sizeBytes: bytes.length,
    meta: { remoteAddress: session.remoteAddress, clientHostname: session.clientHostname },
  });
}

/** The decoded Subject header (RFC 2047 encoded words included), or null when absent or unreadable. */
async function subjectOf(raw: string): Promise<string | null> {
  const headerEnd = raw.search(/\r?\n\r?\n/);
  const head = headerEnd >= 0 ? raw.slice(0, headerEnd) + '\r\n\r\n' : raw;
  try {
    const parsed = await simpleParser(head, { skipHtmlToText: true, skipTextToHtml: true, skipImageLinks: true });
    return parsed.subject ?? null;
  } catch {
    return null;
  }
}
