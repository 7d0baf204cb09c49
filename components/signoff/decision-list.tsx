// Decisions so far, newest round first, each with who, when (viewer's zone), the comment and whether a code confirmed it.
import { StyleSheet, Text, View } from 'react-native';
import type { SignoffDecisionView } from '@/shared/signoff';
import { formatInstant } from '@/components/time';
import { DECISION_WORDS } from '@/components/signoff/signoff-words';
import { colors, space, type } from '@/constants/theme';

export function DecisionList({ decisions, round, timeZone }: { decisions: SignoffDecisionView[]; round: number; timeZone: string }) {
  if (decisions.length === 0) return <Text style={styles.muted} testID="signoff-no-decisions">No decisions yet.</Text>;
  return (
    <View style={styles.list}>
      {decisions.map((d) => (
        <View key={`${d.round}-${d.approver.id}`} style={styles.item} testID={`signoff-decision-${d.round}-${d.approver.id}`}>
          <Text style={[styles.strong, { color: d.decision === 'approve' ? colors.primary : colors.danger }]}>
            {DECISION_WORDS[d.decision]} by {d.approver.name}
          </Text>
          <Text style={styles.muted}>
            {formatInstant(d.decidedAt, timeZone)}{d.round !== round ? ` · earlier round ${d.round}` : ''}{d.codeConfirmed ? ' · confirmed with a code' : ''}
          </Text>
          {d.comment ? <Text style={styles.body}>“{d.comment}”</Text> : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  item: { gap: space.xxs },
  strong: { ...type.bodyStrong },
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
});
