// A tenant user's feed: only the work its tenant was told of, each event in the words of its notice (summary and
// text as the e-mail has them) under the notice invitation's UID and SEQUENCE, so a calendar that holds both the
// invitation and the feed keeps one event. Nothing internal (window title, elements, owner, states) is read.
import { noticeContentSchema } from '../../../shared/notices';
import type { Queryable } from '../../../db/client';
import { selectTenantNotices, type TenantNoticeRow } from '../../queries/notices/tenant-notices';
import { noticePortalUrl } from '../notices/notice-version';
import { noticeBody } from '../notices/render-notice';
import type { ServerConfig } from '../../env';
import type { FeedEvent } from './feed-calendar';

function toEvent({ notice, windowStatus }: TenantNoticeRow, config: ServerConfig): FeedEvent {
  const content = noticeContentSchema.parse(notice.content);
  // A cancellation was sent, or the window was withdrawn before one could be: the work will not happen.
  const cancelled = content.cancelled || notice.method === 'CANCEL' || windowStatus === 'withdrawn';
  const url = noticePortalUrl(config, notice.id);
  return {
    uid: notice.uid, sequence: notice.sequence,
    startsAt: new Date(content.startsAt), endsAt: new Date(content.endsAt),
    // The invitation's own words (notice-ics.ts): "Cancelled: " before the summary of withdrawn work.
    summary: cancelled ? `Cancelled: ${content.summary}` : content.summary,
    description: noticeBody({ ...content, cancelled }, { sequence: notice.sequence, portalUrl: url }),
    status: cancelled ? 'cancelled' : 'confirmed', url, lastModified: notice.updatedAt,
  };
}

export async function tenantFeedEvents(
  db: Queryable, tenantId: string, range: { from: Date; to: Date }, config: ServerConfig,
): Promise<FeedEvent[]> {
  // A tenant user without a tenant reads nothing rather than everything.
  if (tenantId === '') return [];
  const rows = await selectTenantNotices(db, { tenantId, from: range.from, to: range.to });
  return rows.map((row) => toEvent(row, config));
}
