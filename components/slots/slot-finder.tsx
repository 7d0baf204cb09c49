// The slot finder's body: the form, then the running search's progress, then its ranked slots. The search's id
// lives in the address (?search=…), so a reload or a shared link shows the same answer.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { SlotSearch } from '@/shared/slots';
import { useSlotSearchCreateMutation, useSlotSearchQuery } from '@/hooks/queries/slot-searches';
import { Button } from '@/components/button';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { ZoneNote } from '@/components/time/zoned-when';
import { colors, radii, space, type } from '@/constants/theme';
import { SearchProgressView } from './search-progress';
import { SlotForm } from './slot-form';
import type { SlotFormValues } from './slot-form-state';
import { SlotResults } from './slot-results';
import { bookingHref } from './slot-prefill';
import { defaultTiming } from './timing-form-state';

type Props = {
  timeZone: string;
  searchId: string | null;
  onSearchId: (id: string | null) => void;
  onOpen: (href: string) => void;
  now?: () => number;
};

export function SlotFinder({ timeZone, searchId, onSearchId, onOpen, now = Date.now }: Props) {
  const [values, setValues] = useState<SlotFormValues>(() => ({ ...defaultTiming(now()), elements: [] }));
  const create = useSlotSearchCreateMutation();
  if (!searchId) {
    return (
      <SlotForm
        initialValues={values}
        submitting={create.isPending}
        submitError={create.error?.message ?? null}
        onSubmit={(request, typed) => {
          setValues(typed);
          create.mutate(request, { onSuccess: ({ id }) => onSearchId(id) });
        }}
      />
    );
  }
  return <SearchView searchId={searchId} timeZone={timeZone} onNewSearch={() => { create.reset(); onSearchId(null); }} onOpen={onOpen} />;
}

function SearchView({ searchId, timeZone, onNewSearch, onOpen }: { searchId: string; timeZone: string; onNewSearch: () => void; onOpen: (href: string) => void }) {
  const search = useSlotSearchQuery(searchId);
  if (search.isError && !search.data) return <ErrorState message={search.error.message} onRetry={() => void search.refetch()} />;
  if (!search.data) return <LoadingState label="Loading the search…" />;
  const s = search.data;
  const book = (rank: number) => {
    const slot = s.candidates.find((c) => c.rank === rank);
    if (slot) onOpen(bookingHref({ start: slot.start, end: slot.end, sites: s.request.sites, spans: s.request.spans }));
  };
  return (
    <View style={styles.stack}>
      <SearchSummary search={s} />
      <View style={styles.actions}>
        <Button label="Change the search" variant="quiet" onPress={onNewSearch} testID="slot-new-search" />
      </View>
      {s.status === 'queued' || s.status === 'running' ? (
        <SearchProgressView status={s.status} progress={s.progress} label="Slots checked so far" testID="slot-progress" />
      ) : null}
      {s.status === 'failed' ? (
        <Text style={styles.failed} role="alert" testID="slot-failed">The search stopped: {s.error ?? 'no reason given'}. Change it or try again.</Text>
      ) : null}
      {s.status === 'done' ? (
        <>
          <ZoneNote timeZone={timeZone} testID="slot-zone-note" />
          <SlotResults search={s} timeZone={timeZone} onBook={book} />
        </>
      ) : null}
    </View>
  );
}

/** What was asked: the elements by name, the hours of work and the allowed hours. */
function SearchSummary({ search }: { search: SlotSearch }) {
  const names = search.elements.map((e) => e.name).join(', ') || 'the picked sites and spans';
  const { durationHours, hours } = search.request;
  return (
    <View style={styles.summary} testID="slot-search-summary">
      <Text style={styles.summaryTitle}>{durationHours} h on {names}</Text>
      <Text style={styles.muted}>Allowed {hours.start}–{hours.end} in the network’s zone{search.request.weekdays ? ', on the nights picked' : ', every night'}.</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  summary: { gap: space.xxs, padding: space.md, borderRadius: radii.md, backgroundColor: colors.surfaceSunken },
  summaryTitle: { ...type.bodyStrong, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  failed: { ...type.bodyStrong, color: colors.danger, backgroundColor: colors.dangerSoft, padding: space.md, borderRadius: radii.md },
});
