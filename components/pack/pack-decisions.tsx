// The pack's record of the board: every sign-off decision (who, what, when in the reader's zone, the comment), and
// the other comments and reasons given along the window's history.
import { StyleSheet, Text, View } from 'react-native';
import type { ChangePack } from '@/shared/change-pack';
import { DECISION_WORDS } from '@/components/signoff/signoff-words';
import { formatInstant } from '@/components/time';
import { Section } from '@/components/windows/section';
import { eventSentence } from '@/components/windows/window-timeline';
import { colors, space, type } from '@/constants/theme';
import { PackTable } from './pack-table';

type Props = { pack: ChangePack; timeZone: string };

export function PackDecisions({ pack, timeZone }: Props) {
  return (
    <Section title="Sign-off decisions" testID="pack-decisions">
      {pack.decisions.length === 0 ? <Text style={styles.body} testID="pack-decisions-none">No decisions yet.</Text> : (
        <PackTable
          label="Sign-off decisions" testID="pack-decisions-table"
          columns={[{ label: 'Approver', flex: 2 }, { label: 'Decision', flex: 1.5 }, { label: 'When', flex: 2 }, { label: 'Comment', flex: 4 }]}
          rows={pack.decisions.map((d, i) => ({
            key: `${d.round}-${i}`, testID: `pack-decision-${i}`,
            cells: [
              d.approverName, `${DECISION_WORDS[d.decision]} (round ${d.round})${d.codeConfirmed ? ', confirmed with a code' : ''}`,
              formatInstant(d.decidedAt, timeZone), d.comment ? `“${d.comment}”` : 'No comment',
            ],
          }))}
        />
      )}
    </Section>
  );
}

export function PackComments({ pack, timeZone }: Props) {
  return (
    <Section title="Comments" testID="pack-comments">
      {pack.comments.length === 0 ? <Text style={styles.body} testID="pack-comments-none">No other comments.</Text> : (
        <View style={styles.list}>
          {pack.comments.map((e, i) => (
            <View key={e.id} style={styles.item} testID={`pack-comment-${i}`}>
              <Text style={styles.muted}>{eventSentence(e)} · by {e.by ?? 'the system or someone no longer listed'} · {formatInstant(e.at, timeZone)}</Text>
              <Text style={styles.body}>“{e.comment}”</Text>
            </View>
          ))}
        </View>
      )}
    </Section>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  item: { gap: space.xxs },
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
});
