// The operator's feed: every window an operator may list (the same rule as the window list), with its state in
// the summary ("[Planned] Fibre splice at …"), the elements by name, the owner and a link back to the window.
import type { Queryable } from '../../../db/client';
import type { WindowStatus } from '../../../shared/windows';
import { formatRangeIn, formatRangeUtc } from '../notices/notice-times';
import { namedElements } from '../signoff/summary-parts';
import { loadWindows, type LoadedWindow } from '../windows/window-view';
import type { FeedEvent } from './feed-calendar';

/** The screens' words for each state (components/windows/lifecycle.ts; a test keeps the two the same). */
export const FEED_STATUS_WORDS: Record<WindowStatus, string> = {
  draft: 'Draft', assessed: 'Assessed', planned: 'Planned', 'in-review': 'In review', cleared: 'Cleared',
  returned: 'Returned', notified: 'Notified', underway: 'Underway', done: 'Done', 'rolled-back': 'Rolled back',
  withdrawn: 'Withdrawn',
};

/** Withdrawn work will not happen and rolled-back work was undone: both are cancelled in a calendar. */
const CANCELLED: readonly WindowStatus[] = ['withdrawn', 'rolled-back'];
/** Signed off or later: the time is settled. Before that it may still move. */
const CONFIRMED: readonly WindowStatus[] = ['cleared', 'notified', 'underway', 'done'];

export function staffEventStatus(status: WindowStatus): FeedEvent['status'] {
  if (CANCELLED.includes(status)) return 'cancelled';
  return CONFIRMED.includes(status) ? 'confirmed' : 'tentative';
}

export function staffWindowUid(windowId: string): string {
  return `${windowId}@slackwater.invalid`;
}

type Named = { name: string; effect: 'down' | 'reduced'; fraction: number | null };

function elementLine(e: Named): string {
  if (e.effect === 'down') return `  - ${e.name}: down`;
  const left = e.fraction === null ? '' : ` to ${Math.round(e.fraction * 100)} % of its capacity`;
  return `  - ${e.name}: reduced${left}`;
}

function describe(w: LoadedWindow, elements: Named[], timeZone: string, url: string): string {
  const status = w.status as WindowStatus;
  const lines = [
    `State: ${FEED_STATUS_WORDS[status]}`,
    `When (${timeZone}): ${formatRangeIn(w.startsAt, w.endsAt, timeZone)}`,
    `When (UTC): ${formatRangeUtc(w.startsAt, w.endsAt)}`,
  ];
  if (w.workType) lines.push(`Work type: ${w.workType}`);
  lines.push(elements.length === 0 ? 'Elements: none chosen yet' : 'Elements:', ...elements.map(elementLine));
  if (w.ownerName) lines.push(`Owner: ${w.ownerName}`);
  if (w.touchesCritical === true) {
    lines.push('Touches a critical slice: coordinate with the service\'s own operations before the work.');
  }
  lines.push(`Open in Slackwater: ${url}`);
  return lines.join('\n');
}

export async function staffFeedEvents(
  db: Queryable, range: { from: Date; to: Date }, opts: { publicUrl: string; timeZone: string },
): Promise<FeedEvent[]> {
  const windows = await loadWindows(db, { from: range.from, to: range.to, scopeTenant: null });
  // One look-up of names for every window's elements, handed back window by window in the same order.
  const named = await namedElements(db, windows.flatMap((w) => w.elements));
  let offset = 0;
  return windows.map((w) => {
    const elements = named.slice(offset, offset + w.elements.length);
    offset += w.elements.length;
    const status = w.status as WindowStatus;
    const url = `${opts.publicUrl}/windows/${encodeURIComponent(w.id)}`;
    return {
      uid: staffWindowUid(w.id),
      // Versions start at 1 and every edit or change of state adds one; SEQUENCE starts at 0 (RFC 5545 §3.8.7.4).
      sequence: Math.max(0, w.version - 1),
      startsAt: w.startsAt, endsAt: w.endsAt,
      summary: `[${FEED_STATUS_WORDS[status]}] ${w.title}`,
      description: describe(w, elements, opts.timeZone, url),
      status: staffEventStatus(status), url, lastModified: w.updatedAt,
    };
  });
}
