// "Calendar subscription": the private address of the user's iCalendar feed, what it holds, copying it, opening it
// in a calendar app, and replacing it behind a confirmation that says the old address stops working.
import { useState } from 'react';
import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import { FEED_PAST_DAYS, type CalendarFeed } from '@/shared/calendar-feeds';
import { Button } from '@/components/button';
import { formatInstant } from '@/components/time';
import { colors, radii, space, type } from '@/constants/theme';

export type FeedNote = 'idle' | 'copied' | 'copy-failed' | 'open-failed';

const NOTES: Record<Exclude<FeedNote, 'idle'>, string> = {
  copied: 'Address copied.',
  'copy-failed': 'Copying is not available here: select the address above and copy it yourself.',
  'open-failed': 'No calendar app took the address: copy it and add it in your calendar app as a subscription.',
};

export type CalendarFeedSectionProps = {
  /** staff read every window with its state; tenants the work they were told of */
  audience: 'staff' | 'tenant' | 'none';
  feed: CalendarFeed | undefined;
  loadError: string | null;
  onRetry: () => void;
  timeZone: string;
  onCopy: (url: string) => void;
  /** the outcome of the last copy or open, said under the buttons */
  note: FeedNote;
  onOpen: (url: string) => void;
  replacing: boolean;
  replaceError: string | null;
  onReplace: () => void;
};

const HOLDS: Record<'staff' | 'tenant', string> = {
  staff: 'Add this address to your calendar app (as a subscription, "from URL" or "by address") to see every maintenance window with its state in the title. Your calendar fetches it again by itself, usually every few hours.',
  tenant: 'Add this address to your calendar app (as a subscription, "from URL" or "by address") to see the planned work on your slices, in the words of our notices. Your calendar fetches it again by itself, usually every few hours.',
};

function Replace({ busy, onConfirm }: { busy: boolean; onConfirm: () => void }) {
  const [confirming, setConfirming] = useState(false);
  if (!confirming) {
    return <Button label="Replace this address" variant="quiet" onPress={() => setConfirming(true)} testID="calendar-feed-replace" />;
  }
  return (
    <View style={styles.confirm} testID="calendar-feed-confirm">
      <Text style={styles.warning}>
        Replace the address? The current one stops working at once: every calendar subscribed to it stops updating until you add the new one.
      </Text>
      <View style={styles.buttons}>
        <Button label="Keep this address" variant="quiet" onPress={() => setConfirming(false)} disabled={busy} testID="calendar-feed-confirm-cancel" />
        <Button label="Replace address" busy={busy} onPress={() => { onConfirm(); setConfirming(false); }} testID="calendar-feed-confirm-submit" />
      </View>
    </View>
  );
}

function Address(props: CalendarFeedSectionProps & { feed: CalendarFeed }) {
  const { feed } = props;
  const note = props.note === 'idle' ? null : NOTES[props.note];
  return (
    <View style={styles.address} testID="calendar-feed-ready">
      <Text style={styles.url} selectable testID="calendar-feed-url" aria-label="Your calendar subscription address">{feed.url}</Text>
      <Text style={styles.muted} testID="calendar-feed-made">{`Address made ${formatInstant(feed.createdAt, props.timeZone)}`}</Text>
      <View style={styles.buttons}>
        <Button label="Copy address" onPress={() => props.onCopy(feed.url)} testID="calendar-feed-copy" />
        <Button label="Open in calendar app" variant="quiet" onPress={() => props.onOpen(feed.url)} testID="calendar-feed-open" />
      </View>
      {note ? <Text style={styles.muted} role="status" testID="calendar-feed-note">{note}</Text> : null}
      <Text style={styles.body}>
        Anyone who has this address can read your feed without signing in: keep it like a password. If it may have been shared, replace it.
      </Text>
      {props.replaceError ? <Text style={styles.warning} role="alert" testID="calendar-feed-replace-error">{props.replaceError}</Text> : null}
      <Replace busy={props.replacing} onConfirm={props.onReplace} />
    </View>
  );
}

function Body(props: CalendarFeedSectionProps) {
  if (props.audience === 'none') {
    return <Text style={styles.muted} testID="calendar-feed-empty">Your account has no role that reads maintenance work, so it has no calendar feed.</Text>;
  }
  if (props.loadError) {
    return (
      <View style={styles.state} testID="calendar-feed-error" role="alert">
        <Text style={styles.warning}>Your calendar address could not be loaded: {props.loadError}</Text>
        <Button label="Try again" variant="quiet" onPress={props.onRetry} testID="calendar-feed-retry" />
      </View>
    );
  }
  if (!props.feed) {
    return (
      <View style={styles.state} testID="calendar-feed-loading" aria-busy>
        <ActivityIndicator color={colors.primary} aria-label="Loading the calendar feed" />
        <Text style={styles.muted}>Loading your calendar address…</Text>
      </View>
    );
  }
  return <Address {...props} feed={props.feed} />;
}

export function CalendarFeedSection(props: CalendarFeedSectionProps) {
  return (
    <View style={styles.block} testID="calendar-feed">
      <Text style={styles.title} role="heading" aria-level={2}>Calendar subscription</Text>
      {props.audience === 'none' ? null : (
        <>
          <Text style={styles.body}>{HOLDS[props.audience]}</Text>
          <Text style={styles.body}>{`Withdrawn work stays in the feed, marked cancelled, until ${FEED_PAST_DAYS} days after its planned end, like all past work.`}</Text>
        </>
      )}
      <Body {...props} />
    </View>
  );
}

const styles = StyleSheet.create({
  block: { gap: space.md, marginTop: space.lg },
  address: { gap: space.sm },
  state: { gap: space.sm, alignItems: 'flex-start' },
  confirm: { gap: space.sm },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  title: { ...type.title, color: colors.abyss },
  body: { ...type.body, color: colors.ink },
  url: {
    ...type.body, color: colors.ink, backgroundColor: colors.surfaceSunken, borderRadius: radii.md,
    borderWidth: 1, borderColor: colors.border, padding: space.md,
  },
  muted: { ...type.caption, color: colors.inkMuted },
  warning: { ...type.bodyStrong, color: colors.danger },
});
