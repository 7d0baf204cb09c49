// The sink as the server process runs it: only when SMTP_URL=sink, with its address logged once.
import type { Db } from '../../db/client';
import type { ServerConfig } from '../env';
import { startMailSink, type MailSink } from './sink';

/** Starts the sink when config.smtp.mode is `sink`; null when mail goes to a real relay. */
export async function startSinkIfConfigured(
  config: Pick<ServerConfig, 'smtp'>,
  db: Db,
  log: (line: string) => void = () => undefined,
): Promise<MailSink | null> {
  if (config.smtp.mode !== 'sink') return null;
  const sink = await startMailSink(config, db, {
    log: (message, err) => log(`mail sink: ${message}${err ? `: ${err instanceof Error ? err.message : String(err)}` : ''}`),
  });
  log(`Mail sink on smtp://${sink.host}:${sink.port} (every message is kept for the Outbox)`);
  return sink;
}
