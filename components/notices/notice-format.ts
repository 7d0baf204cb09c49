// Words and tones for notice states, shared by the tenant portal and the staff block on a window's page.
import type { Notice, NoticeEffect, NoticeStatusRow, PortalWorkItem } from '@/shared/notices';

type Tone = 'danger' | 'primary' | 'muted';

/** Where one upcoming piece of work stands for the tenant. */
export function workState(item: PortalWorkItem): { label: string; tone: Tone } {
  if (!item.notice) return { label: 'Details follow', tone: 'muted' };
  if (item.notice.content.cancelled) return { label: 'Cancelled', tone: 'muted' };
  if (item.notice.acknowledgedAt) return { label: 'Acknowledged', tone: 'primary' };
  return { label: 'Please acknowledge', tone: 'danger' };
}

export const EFFECT_LABEL: Record<NoticeEffect, string> = {
  none: 'No change',
  hitless: 'No interruption (make-before-break)',
  interruption: 'Interruption',
};

export function canAcknowledge(notice: Notice): boolean {
  return !notice.content.cancelled && notice.acknowledgedAt === null;
}

/** Staff wording for a notice's sending state. */
export function sendingLabel(row: NoticeStatusRow): { label: string; tone: Tone } {
  if (row.method === 'CANCEL') {
    if (row.status === 'blocked') return { label: 'Withdrawn before sending', tone: 'muted' };
    return { label: `Cancellation ${row.status}`, tone: row.status === 'failed' ? 'danger' : 'muted' };
  }
  const labels: Record<NoticeStatusRow['status'], { label: string; tone: Tone }> = {
    blocked: { label: `Held: less than ${row.leadDays} days ahead`, tone: 'danger' },
    queued: { label: 'Queued', tone: 'muted' },
    sent: { label: 'Sent', tone: 'primary' },
    failed: { label: 'Failed', tone: 'danger' },
  };
  return labels[row.status];
}
