// The e-mails of sign-off: a request to every approver, and a send-back to the planner; sent after the commit.
import type { ServerConfig } from '../../env';
import type { SignoffWindow } from '../../queries/signoff/signoff-window';
import type { MailJob, MailQueue } from '../ports';

const when = (w: SignoffWindow) => `${w.startsAt.toISOString().replace('T', ' ').slice(0, 16)} – ${w.endsAt.toISOString().replace('T', ' ').slice(0, 16)} UTC`;

export function signoffRequestMail(config: ServerConfig, w: SignoffWindow, round: number, to: string[]): MailJob {
  return {
    to,
    subject: `Sign-off requested: ${w.title}`,
    text: [
      `A move plan for the maintenance window "${w.title}" is waiting for the change board's decision (review round ${round}).`,
      '', `When: ${when(w)}`, w.workType ? `Work: ${w.workType}` : null, '',
      `Review it and approve or send it back: ${config.publicUrl}/sign-off/${encodeURIComponent(w.id)}`,
    ].filter((line) => line !== null).join('\n'),
  };
}

export function sendBackMail(config: ServerConfig, w: SignoffWindow, approverName: string, comment: string, to: string[]): MailJob {
  return {
    to,
    subject: `Sent back: ${w.title}`,
    text: [
      `${approverName} sent the move plan for "${w.title}" back for more planning.`, '',
      'Their comment:', comment, '',
      `When: ${when(w)}`,
      `Open the window: ${config.publicUrl}/windows/${encodeURIComponent(w.id)}`,
    ].join('\n'),
  };
}

/** One mail per recipient, so one bad address does not hold up the others; returns how many were queued. */
export async function queueMails(jobs: MailQueue, make: (to: string[]) => MailJob, recipients: string[], log: (e: unknown) => void): Promise<number> {
  let queued = 0;
  for (const to of [...new Set(recipients)]) {
    try {
      await jobs.sendMail(make([to]));
      queued += 1;
    } catch (err) {
      log(err);
    }
  }
  return queued;
}
