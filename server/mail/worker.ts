// Mail worker: sends QUEUES.mail jobs with nodemailer and records each notice's sending state.
// pg-boss retries a failed job (retryLimit, backoff: set on the queue in server/jobs/boss.ts); when the
// retries are used up the job lands in QUEUES.mailDead, whose handler marks the notice `failed`.
import type PgBoss from 'pg-boss';
import type { Db } from '../../db/client';
import { retryWhileDatabaseUnavailable } from '../db-unavailable';
import type { ServerConfig } from '../env';
import { QUEUES, type MailJob } from '../jobs/queue';
import { markNoticeAttemptFailed, markNoticeFailed, markNoticeSent } from '../queries/mail/notice-sending';
import { mailFailed, mailGivenUp, mailSent } from '../metrics/registry';
import { composeMail } from './compose';
import { noticeVersionState } from './notice-state';
import { createMailTransport } from './transport';

export type MailWorkerDeps = {
  db: Db;
  config: Pick<ServerConfig, 'smtp' | 'mailFrom'>;
  /** the in-process sink's actual port (config.smtp.sinkPort may be 0) */
  sinkPort?: number;
  /** how often an idle worker looks for jobs; pg-boss's default is 2 s */
  pollingIntervalSeconds?: number;
  now?: () => Date;
};

export interface MailWorker {
  workerIds: string[];
  /** stops taking mail jobs (a send in progress finishes) and closes the transport */
  stop(): Promise<void>;
}

/** Registers the workers for QUEUES.mail and QUEUES.mailDead. */
export async function registerMailWorker(boss: PgBoss, deps: MailWorkerDeps): Promise<MailWorker> {
  const transport = createMailTransport(deps.config, { sinkPort: deps.sinkPort });
  const now = deps.now ?? (() => new Date());
  const options = { pollingIntervalSeconds: deps.pollingIntervalSeconds ?? 2 };

  const sendId = await boss.work<MailJob>(QUEUES.mail, options, async (jobs) => {
    for (const job of jobs) await sendOne(job.data);
  });

  async function sendOne(mail: MailJob): Promise<void> {
    if (mail.noticeId) {
      const state = await noticeVersionState(deps.db, mail.noticeId, mail.noticeSequence);
      if (state === 'superseded' || state === 'sent') return;
      if (state === 'wait') throw new Error(`notice ${mail.noticeId} version ${mail.noticeSequence} is not committed yet`);
    }
    try {
      await transport.sendMail(composeMail(mail, deps.config.mailFrom));
    } catch (err) {
      mailFailed.inc();
      if (mail.noticeId) await markNoticeAttemptFailed(deps.db, mail.noticeId, mail.noticeSequence, readableMailError(err), now());
      throw err; // pg-boss retries it
    }
    mailSent.inc();
    // The mail is out: its record must land even if the database went away meanwhile, or a retry would send it again.
    const sentAt = now();
    if (mail.noticeId) await retryWhileDatabaseUnavailable(() => markNoticeSent(deps.db, mail.noticeId!, mail.noticeSequence, sentAt));
  }

  const deadId = await boss.work<MailJob>(QUEUES.mailDead, options, async (jobs) => {
    for (const job of jobs) {
      mailGivenUp.inc();
      if (job.data.noticeId) await markNoticeFailed(deps.db, job.data.noticeId, job.data.noticeSequence, now());
    }
  });
  return {
    workerIds: [sendId, deadId],
    async stop() {
      for (const id of [sendId, deadId]) await boss.offWork({ id }).catch(() => undefined);
      transport.close();
    },
  };
}

/** One line a person can act on: nodemailer's error code, the server's reply, or the message. */
export function readableMailError(err: unknown): string {
  if (!(err instanceof Error)) return String(err).slice(0, 500);
  const { code, response } = err as Error & { code?: string; response?: string };
  const detail = response && !err.message.includes(response) ? `${err.message} (${response})` : err.message;
  return (code ? `${code}: ${detail}` : detail).slice(0, 500);
}
