// Overview, approvers only: how many windows wait for their sign-off decision, one tap from the queue.
// Shows nothing when none wait or the viewer is not an approver.
import { Link } from 'expo-router';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { canSignOff } from '@/shared/permissions';
import { useMeQuery } from '@/hooks/queries/me';
import { useSignoffWaitingCountQuery } from '@/hooks/queries/signoff';
import { colors, radii, space, type } from '@/constants/theme';

export const waitingSentence = (n: number) => `${n} decision${n === 1 ? ' waits' : 's wait'} for you`;

export function WaitingDecisions() {
  const approver = canSignOff(useMeQuery().data?.roles ?? []);
  const waiting = useSignoffWaitingCountQuery(approver).data?.waiting ?? 0;
  if (!approver || waiting === 0) return null;
  return (
    <View style={styles.panel} testID="overview-waiting-decisions">
      <View style={styles.text}>
        <Text style={styles.lead} role="heading" aria-level={2}>{waitingSentence(waiting)}</Text>
        <Text style={styles.body}>Windows in review that need your approval or send-back before tenants can be told.</Text>
      </View>
      <Link href="/sign-off" asChild>
        <Pressable role="link" accessibilityLabel="Open the sign-off queue" testID="overview-waiting-decisions-open">
          <View style={styles.action}><Text style={styles.actionText}>Open the sign-off queue</Text></View>
        </Pressable>
      </Link>
    </View>
  );
}

const styles = StyleSheet.create({
  panel: {
    flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: space.md,
    backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border,
    borderLeftWidth: 4, borderLeftColor: colors.buoy, padding: space.lg,
  },
  text: { flex: 1, minWidth: 220, gap: space.xxs },
  lead: { ...type.heading, color: colors.ink },
  body: { ...type.body, color: colors.inkMuted },
  action: { borderRadius: radii.md, backgroundColor: colors.primary, paddingVertical: space.md, paddingHorizontal: space.lg, minHeight: 44, justifyContent: 'center' },
  actionText: { ...type.bodyStrong, color: colors.onPrimary },
});
