// Inside a check thread: reads one upload per message and replies with the result or the error's code and status.
import { parentPort } from 'node:worker_threads';
import { AppError } from '../errors';
import { readUpload } from './read-upload';
import type { CheckReply, CheckRequest } from './check-thread-protocol';

function describe(err: unknown): Extract<CheckReply, { ok: false }>['error'] {
  if (err instanceof AppError) return { code: err.code, status: err.status, message: err.message };
  return { code: null, status: 500, message: err instanceof Error ? err.message : String(err) };
}

/** Called by the thread's bootstrap (server/jobs/ts-thread.ts) once this file is loaded. */
export function serve(): void {
  const port = parentPort;
  if (!port) throw new Error('check-thread-worker runs only inside a worker thread');
  port.on('message', ({ id, input }: CheckRequest) => {
    let reply: CheckReply;
    try {
      reply = { id, ok: true, value: readUpload(input) };
    } catch (err) {
      reply = { id, ok: false, error: describe(err) };
    }
    port.postMessage(reply);
  });
  // Loading this file (and compiling it) takes a while; the budget of an upload starts only after this.
  port.postMessage('ready');
}
