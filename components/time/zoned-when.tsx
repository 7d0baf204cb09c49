// The pieces every screen uses to show times: the zone named once (ZoneNote), and a span in the viewer's zone
// with UTC on a quieter second line (ZonedWhen), so people in different places can compare without guessing.
import { StyleSheet, Text, View, type StyleProp, type TextStyle } from 'react-native';
import { colors, space, type } from '@/constants/theme';
import { formatUtcRange, isUtcZone, timesInLabel } from './zone-label';
import { formatInstant, formatWindowRange } from './zoned-format';

export function ZoneNote({ timeZone, testID = 'zone-note', style }: { timeZone: string; testID?: string; style?: StyleProp<TextStyle> }) {
  return <Text style={[styles.note, style]} testID={testID}>{timesInLabel(timeZone)}</Text>;
}

type WhenProps = {
  startsAt: string;
  /** Leave out for a single instant. */
  endsAt?: string;
  timeZone: string;
  testID?: string;
  style?: StyleProp<TextStyle>;
};

export function ZonedWhen({ startsAt, endsAt, timeZone, testID, style }: WhenProps) {
  const local = endsAt ? formatWindowRange(startsAt, endsAt, timeZone) : formatInstant(startsAt, timeZone);
  const utc = endsAt ? formatUtcRange(startsAt, endsAt) : formatInstant(startsAt, 'UTC');
  return (
    <View style={styles.when} testID={testID}>
      <Text style={style} testID={testID ? `${testID}-local` : undefined}>{local}</Text>
      {isUtcZone(timeZone) ? null : <Text style={styles.utc} testID={testID ? `${testID}-utc` : undefined}>{utc}</Text>}
    </View>
  );
}

const styles = StyleSheet.create({
  note: { ...type.caption, color: colors.inkMuted },
  when: { gap: space.xxs },
  utc: { ...type.caption, color: colors.inkFaint },
});
