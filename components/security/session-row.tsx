// One signed-in session: browser and address, when it began, was last used and ends (zone named); others can be ended.
import { StyleSheet, Text, View } from 'react-native';
import type { SessionInfo } from '@/shared/sessions';
import { Button } from '@/components/button';
import { formatInstant } from '@/components/time';
import { colors, radii, space, type } from '@/constants/theme';

type Props = { session: SessionInfo; timeZone: string; ending: boolean; onEnd: (id: string) => void };

export function SessionRow({ session, timeZone, ending, onEnd }: Props) {
  const where = session.address ? ` · ${session.address}` : '';
  return (
    <View style={styles.row} testID={`session-${session.id}`}>
      <View style={styles.head}>
        <Text style={styles.name}>{session.userAgent ?? 'Unknown browser'}{where}</Text>
        {session.current ? <Text style={styles.badge} testID="session-this-device">This device</Text> : null}
      </View>
      <Text style={styles.when}>Signed in {formatInstant(session.createdAt, timeZone)}</Text>
      <Text style={styles.when}>Last used {formatInstant(session.lastActiveAt, timeZone)}</Text>
      <Text style={styles.when}>Ends {formatInstant(session.expiresAt, timeZone)} if not used before then</Text>
      {session.current ? null : (
        <View style={styles.action}>
          <Button label="Sign this device out" variant="quiet" busy={ending} onPress={() => onEnd(session.id)} testID={`session-${session.id}-end`} />
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.xs, paddingVertical: space.md, borderBottomWidth: 1, borderColor: colors.border },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  name: { ...type.bodyStrong, color: colors.ink },
  badge: {
    ...type.label, color: colors.primary, backgroundColor: colors.primarySoft,
    borderRadius: radii.sm, paddingHorizontal: space.sm, overflow: 'hidden',
  },
  when: { ...type.caption, color: colors.inkMuted },
  action: { alignSelf: 'flex-start' },
});
