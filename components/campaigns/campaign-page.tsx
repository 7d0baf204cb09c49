// One campaign: its run's progress while it schedules, then the draft with the planner's actions, or what became of it.
import { StyleSheet, Text, View } from 'react-native';
import type { Campaign } from '@/shared/slots';
import {
  useCampaignBookMutation, useCampaignDiscardMutation, useCampaignPatchMutation,
} from '@/hooks/queries/campaigns';
import { SearchProgressView } from '@/components/slots/search-progress';
import { colors, radii, space, type } from '@/constants/theme';
import { CampaignDraft } from './campaign-draft';
import { CAMPAIGN_STATUS_LABELS } from './campaign-words';

type Props = {
  campaign: Campaign;
  timeZone: string;
  canEdit: boolean;
  onShowCalendar: (day: string | null) => void;
  onOpenWindow: (id: string) => void;
};

export function CampaignPage({ campaign: c, timeZone, canEdit, onShowCalendar, onOpenWindow }: Props) {
  const patch = useCampaignPatchMutation(c.id);
  const book = useCampaignBookMutation(c.id);
  const discard = useCampaignDiscardMutation(c.id);
  const busy = patch.isPending ? 'move' : book.isPending ? 'book' : discard.isPending ? 'discard' : null;
  // Each action resets the others first, so at most one refusal is on screen: the latest.
  const error = patch.error ?? book.error ?? discard.error;
  const reset = () => { patch.reset(); book.reset(); discard.reset(); };
  const firstNight = [...c.windows].sort((a, b) => a.start.localeCompare(b.start))[0]?.night ?? null;
  return (
    <View style={styles.stack}>
      <Text style={styles.status} testID="campaign-status">{CAMPAIGN_STATUS_LABELS[c.status]}</Text>
      {c.status === 'queued' || c.status === 'running' ? (
        <SearchProgressView status={c.status} progress={c.progress} unit="groups" label="Campaign scheduling progress" testID="campaign-progress" />
      ) : null}
      {c.status === 'failed' ? (
        <Text style={styles.failed} role="alert" testID="campaign-failed">The scheduling stopped: {c.error ?? 'no reason given'}.</Text>
      ) : null}
      {c.status === 'discarded' ? <Text style={styles.body} testID="campaign-discarded">This draft was discarded; nothing was booked.</Text> : null}
      {c.status === 'booked' ? (
        <View style={styles.booked} testID="campaign-booked">
          <Text style={styles.bodyStrong}>All {c.bookedWindowIds.length} windows are booked.</Text>
          <Text style={styles.body}>Each is now a window of its own: assess it, plan it and notify its tenants as usual.</Text>
          {c.bookedWindowIds.map((id, i) => (
            <Text key={id} role="link" style={styles.link} onPress={() => onOpenWindow(id)} testID={`campaign-booked-${i}`}>
              Open the window for {c.windows[i]?.label ?? `group ${i + 1}`}
            </Text>
          ))}
        </View>
      ) : null}
      {c.status === 'draft' || c.status === 'booked' ? (
        <CampaignDraft
          campaign={c}
          timeZone={timeZone}
          canEdit={canEdit}
          busy={busy}
          error={error}
          onMove={(group, start) => { reset(); patch.mutate({ version: c.version, windows: [{ group, start }] }); }}
          onBook={() => { reset(); book.mutate(c.version); }}
          onDiscard={() => { reset(); discard.mutate(c.version); }}
          onShowCalendar={() => onShowCalendar(firstNight)}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.md },
  status: { ...type.label, color: colors.primary, alignSelf: 'flex-start', borderWidth: 1, borderColor: colors.primary, borderRadius: radii.pill, paddingHorizontal: space.sm, paddingVertical: space.xxs },
  body: { ...type.body, color: colors.ink },
  bodyStrong: { ...type.bodyStrong, color: colors.ink },
  link: { ...type.bodyStrong, color: colors.primary, textDecorationLine: 'underline', minHeight: 44, paddingVertical: space.sm },
  booked: { gap: space.xs, padding: space.md, borderRadius: radii.md, backgroundColor: colors.primarySoft },
  failed: { ...type.bodyStrong, color: colors.danger, backgroundColor: colors.dangerSoft, padding: space.md, borderRadius: radii.md },
});
