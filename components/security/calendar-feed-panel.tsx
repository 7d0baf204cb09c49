// The calendar subscription wired to the API: the user's feed address, copying it, and replacing it.
import { useState } from 'react';
import { Linking } from 'react-native';
import { useCalendarFeedQuery, useReplaceCalendarFeedMutation } from '@/hooks/queries/calendar-feed';
import { useMeQuery } from '@/hooks/queries/me';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { holdsAnyRole, tenantScopeOf, WINDOW_READER_ROLES } from '@/shared/permissions';
import { CalendarFeedSection, type FeedNote } from './calendar-feed-section';
import { copyText, webcalAddress } from './copy-text';

export function CalendarFeedPanel() {
  const me = useMeQuery().data;
  const readsWindows = me !== undefined && holdsAnyRole(me.roles, WINDOW_READER_ROLES);
  const feed = useCalendarFeedQuery(readsWindows);
  const replace = useReplaceCalendarFeedMutation();
  const timeZone = useViewerTimeZone();
  const [note, setNote] = useState<FeedNote>('idle');
  const audience = me === undefined ? 'staff' : !readsWindows ? 'none' : tenantScopeOf(me) === null ? 'staff' : 'tenant';
  return (
    <CalendarFeedSection
      audience={audience}
      feed={me === undefined ? undefined : feed.data}
      loadError={feed.isError ? feed.error.message : null}
      onRetry={() => void feed.refetch()}
      timeZone={timeZone}
      note={note}
      onCopy={(url) => void copyText(url).then((ok) => setNote(ok ? 'copied' : 'copy-failed'))}
      onOpen={(url) => void Linking.openURL(webcalAddress(url)).catch(() => setNote('open-failed'))}
      replacing={replace.isPending}
      replaceError={replace.error ? `The address was not replaced: ${replace.error.message}` : null}
      onReplace={() => replace.mutate(undefined, { onSuccess: () => setNote('idle') })}
    />
  );
}
