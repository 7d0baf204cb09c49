// One dedicated PostgreSQL connection per process LISTENing for new inventory revisions, so that a write made by
// any process warms this process's cache before its next read. A lost connection comes back with a growing pause;
// what was announced while it was away is caught up by asking for the current revision once it is back (and every
// read checks the revision anyway, so nothing is ever served stale, only built later).
import pg from 'pg';
import { CONNECT_TIMEOUT_MS } from '../../../db/client';
import { INVENTORY_CHANNEL } from '../../queries/inventory/inventory-revision';

export type InventoryListenerOptions = {
  url: string;
  /** a revision was announced */
  onRevision: (revision: number) => void;
  /** the connection is (again) listening: anything announced while it was away is unknown */
  onListening: () => void;
  /** the connection failed or was lost; it is tried again after `retryInMs` */
  onLost?: (err: Error, retryInMs: number) => void;
  /** first pause before reconnecting, doubled per failed attempt up to maxRetryMs */
  retryMs?: number;
  maxRetryMs?: number;
};

const noop = () => undefined;

export class InventoryListener {
  private client: pg.Client | null = null;
  private timer: NodeJS.Timeout | null = null;
  private closed = false;
  private retryMs: number;

  constructor(private readonly options: InventoryListenerOptions) {
    this.retryMs = options.retryMs ?? 500;
  }

  /** Resolves once listening, or once the first attempt failed (retries go on in the background). */
  start(): Promise<void> {
    return this.attempt();
  }

  get listening(): boolean {
    return this.client !== null;
  }

  async close(): Promise<void> {
    this.closed = true;
    if (this.timer) clearTimeout(this.timer);
    const client = this.client;
    this.client = null;
    await client?.end().catch(noop);
  }

  private async attempt(): Promise<void> {
    this.timer = null;
    if (this.closed) return;
    const client = new pg.Client({
      connectionString: this.options.url, keepAlive: true, connectionTimeoutMillis: CONNECT_TIMEOUT_MS,
      application_name: 'slackwater inventory listener',
    });
    client.on('notification', (msg) => {
      const revision = Number(msg.payload);
      if (msg.channel === INVENTORY_CHANNEL && Number.isFinite(revision)) this.options.onRevision(revision);
    });
    client.on('error', (err) => this.lost(client, err));
    client.on('end', () => this.lost(client, new Error('the listening connection ended')));
    try {
      await client.connect();
      await client.query(`LISTEN ${INVENTORY_CHANNEL}`);
    } catch (err) {
      this.lost(client, err instanceof Error ? err : new Error(String(err)));
      return;
    }
    if (this.closed) {
      await client.end().catch(noop);
      return;
    }
    this.client = client;
    this.retryMs = this.options.retryMs ?? 500;
    this.options.onListening();
  }

  private lost(client: pg.Client, err: Error): void {
    if (this.client !== null && this.client !== client) return;
    this.client = null;
    client.removeAllListeners('end');
    client.on('error', noop);
    void client.end().catch(noop);
    if (this.closed || this.timer) return;
    const wait = this.retryMs;
    this.retryMs = Math.min(wait * 2, this.options.maxRetryMs ?? 30_000);
    this.options.onLost?.(err, wait);
    this.timer = setTimeout(() => void this.attempt(), wait);
    this.timer.unref();
  }
}
