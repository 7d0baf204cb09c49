// The nodemailer transport for the configured mail route: the local sink on loopback, or a real SMTP relay.
import nodemailer, { type Transporter } from 'nodemailer';
import type { ServerConfig } from '../env';

/** Short enough that a dead relay fails a job quickly (the queue retries it), long enough for a slow one. */
const CONNECTION_TIMEOUT_MS = 15_000;
const SOCKET_TIMEOUT_MS = 60_000;

/** The SMTP URL mail goes to: the sink's actual port when it runs in this process, else the configured one. */
export function mailTransportUrl(config: Pick<ServerConfig, 'smtp'>, sinkPort?: number): string {
  if (config.smtp.mode === 'relay') return config.smtp.url;
  return `smtp://127.0.0.1:${sinkPort ?? config.smtp.sinkPort}`;
}

/** Settings in the URL's query string (e.g. `?tls.rejectUnauthorized=false`) override these defaults. */
export function createMailTransport(config: Pick<ServerConfig, 'smtp'>, options: { sinkPort?: number } = {}): Transporter {
  return nodemailer.createTransport({
    url: mailTransportUrl(config, options.sinkPort),
    // The sink has no TLS (loopback only); never try STARTTLS against it.
    ignoreTLS: config.smtp.mode === 'sink',
    connectionTimeout: CONNECTION_TIMEOUT_MS,
    socketTimeout: SOCKET_TIMEOUT_MS,
  });
}
