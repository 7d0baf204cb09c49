// Reads uploads in worker threads with a time budget and a memory cap, so a hostile file cannot stall the API:
// the event loop only waits for a message, and a thread over budget is stopped and refused with a code.
import { join } from 'node:path';
import type { Worker } from 'node:worker_threads';
import { AppError } from '../errors';
import { startTsThread } from '../jobs/ts-thread';
import { ImportFileError, ImportTooComplexError } from './errors';
import type { CheckReply } from './check-thread-protocol';
import type { UploadRead, UploadReadInput } from './read-upload';

const WORKER_FILE = join(__dirname, 'check-thread-worker.ts');

export type CheckLimits = { timeoutMs: number; maxOldGenerationSizeMb: number; threads: number; idleMs: number };

/** WARNING: a legitimate 5 MB GraphML reads in about 3 s on one core; lower the budget and it is refused. */
export const CHECK_LIMITS: CheckLimits = { timeoutMs: 4000, maxOldGenerationSizeMb: 256, threads: 2, idleMs: 10_000 };

/** A reply the thread sent (as opposed to an error raised about the thread). */
const isReply = (r: unknown): r is CheckReply => typeof r === 'object' && r !== null && 'ok' in r && 'id' in r;

/** A domain error again from what crossed the thread boundary; anything else is a plain (500) error. */
function rebuild(error: Extract<CheckReply, { ok: false }>['error']): Error {
  if (error.code && error.status === 400) return new ImportFileError(error.code, error.message);
  if (error.code === 'IMPORT_FILE_TOO_COMPLEX' || error.code === 'IMPORT_PARSE_TIMEOUT') return new ImportTooComplexError(error.code, error.message);
  return new Error(`reading the upload failed: ${error.message}`);
}

/** One thread, one upload at a time, under a heap cap (started the way every server thread is: server/jobs/ts-thread.ts). */
class CheckThread {
  private readonly worker: Worker;
  private settle: ((reply: CheckReply | Error) => void) | null = null;
  private idleTimer: NodeJS.Timeout | null = null;
  private readonly ready: Promise<void>;
  dead = false;

  constructor(private readonly limits: CheckLimits, private readonly onIdleExpired: (t: CheckThread) => void) {
    this.worker = startTsThread(WORKER_FILE, undefined, {
      resourceLimits: { maxOldGenerationSizeMb: limits.maxOldGenerationSizeMb, maxYoungGenerationSizeMb: 32 },
    });
    this.ready = new Promise<void>((resolve, reject) => {
      this.worker.on('message', (reply: CheckReply | 'ready') => (reply === 'ready' ? resolve() : this.settle?.(reply)));
      this.worker.on('error', (err: Error & { code?: string }) => { reject(err); this.settle?.(err); });
      this.worker.on('exit', (code) => {
        this.dead = true;
        const stopped = new Error(`the upload check thread stopped (code ${code})`);
        reject(stopped);
        this.settle?.(stopped);
      });
    });
    this.ready.catch(() => undefined);
    this.rest();
  }

  /** Idle: the thread must not keep the process alive, and goes away after a while without work. */
  rest(): void {
    this.worker.unref();
    this.idleTimer = setTimeout(() => this.onIdleExpired(this), this.limits.idleMs).unref();
  }

  async run(input: UploadReadInput): Promise<UploadRead> {
    if (this.idleTimer) clearTimeout(this.idleTimer);
    this.worker.ref();
    await this.ready;
    return new Promise<UploadRead>((resolve, reject) => {
      const timer = setTimeout(() => {
        this.settle?.(new ImportTooComplexError('IMPORT_PARSE_TIMEOUT',
          `"${input.fileName}" took longer than ${this.limits.timeoutMs / 1000} s to read and was refused; split it into smaller files.`));
        void this.terminate();
      }, this.limits.timeoutMs);
      this.settle = (reply) => {
        this.settle = null;
        clearTimeout(timer);
        if (reply instanceof AppError) return reject(reply);
        // Told apart by shape, not instanceof: Node's own worker errors (out of memory, a crash) come from its core
        // realm, which is not the realm of this module under jest's VM.
        if (!isReply(reply)) {
          const oom = (reply as { code?: string }).code === 'ERR_WORKER_OUT_OF_MEMORY';
          return reject(oom ? new ImportTooComplexError('IMPORT_FILE_TOO_COMPLEX',
            `"${input.fileName}" needs more than ${this.limits.maxOldGenerationSizeMb} MB of memory to read and was refused.`) : reply);
        }
        if (reply.ok) resolve(reply.value);
        else reject(rebuild(reply.error));
      };
      this.worker.postMessage({ id: 0, input });
    });
  }

  async terminate(): Promise<void> {
    this.dead = true;
    if (this.idleTimer) clearTimeout(this.idleTimer);
    await this.worker.terminate();
  }
}

/** Up to `threads` check threads, started on demand; further uploads wait their turn. */
export class CheckThreadPool {
  private idle: CheckThread[] = [];
  private running = new Set<CheckThread>();
  private waiting: (() => void)[] = [];

  constructor(private readonly limits: CheckLimits = CHECK_LIMITS) {}

  async read(input: UploadReadInput): Promise<UploadRead> {
    const thread = await this.take();
    try {
      return await thread.run(input);
    } finally {
      this.give(thread);
    }
  }

  private async take(): Promise<CheckThread> {
    for (;;) {
      const idle = this.idle.pop();
      if (idle) { this.running.add(idle); return idle; }
      if (this.running.size < this.limits.threads) {
        const fresh = new CheckThread(this.limits, (t) => this.expire(t));
        this.running.add(fresh);
        return fresh;
      }
      await new Promise<void>((resolve) => this.waiting.push(resolve));
    }
  }

  private give(thread: CheckThread): void {
    this.running.delete(thread);
    if (!thread.dead) { thread.rest(); this.idle.push(thread); }
    this.waiting.shift()?.();
  }

  private expire(thread: CheckThread): void {
    this.idle = this.idle.filter((t) => t !== thread);
    void thread.terminate();
  }

  /** Stops every thread (an upload in flight fails); the pool starts new ones if used again. */
  async close(): Promise<void> {
    const all = [...this.idle, ...this.running];
    this.idle = [];
    await Promise.all(all.map((t) => t.terminate()));
  }
}

/** The process's pool for import uploads; server/index.ts closes it on shutdown, tests after their file. */
export const uploadChecks = new CheckThreadPool();
