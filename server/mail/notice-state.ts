// Whether the mail worker may send a notice's version: committed, not yet visible, or superseded by a newer one.
// (The sending state it writes afterwards lives in server/queries/mail/notice-sending.ts.)
import type { Db } from '../../db/client';
import { selectNoticeSequence } from '../queries/mail/notice-sending';

/**
 * `send`: the notice holds this version, committed. `wait`: not visible yet (the transaction that queued it
 * has not committed, or rolled back); the job is retried and, if it never appears, nothing is sent.
 * `superseded`: a newer version replaced it; this mail must not go out. `sent`: this version already went out
 * (the job ran again because its completion could not be recorded, e.g. during a database outage); not again.
 */
export async function noticeVersionState(
  db: Db, noticeId: string, sequence: number | undefined,
): Promise<'send' | 'wait' | 'superseded' | 'sent'> {
  const current = await selectNoticeSequence(db, noticeId);
  if (current === null) return 'wait';
  if (sequence === undefined || current.sequence === sequence) return current.status === 'sent' ? 'sent' : 'send';
  return current.sequence > sequence ? 'superseded' : 'wait';
}
