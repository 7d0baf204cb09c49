// One cell's content: strings and numbers become text in the table's type, anything else is drawn as given.
import type { ReactNode } from 'react';
import { StyleSheet, Text } from 'react-native';
import { colors, type } from '@/constants/theme';

export function Cell({ value, strong = false, align = 'start' }: { value: ReactNode; strong?: boolean; align?: 'start' | 'end' }) {
  if (typeof value === 'string' || typeof value === 'number') {
    return (
      <Text style={[strong ? styles.strong : styles.text, align === 'end' && styles.end]} numberOfLines={2}>
        {value}
      </Text>
    );
  }
  return <>{value}</>;
}

const styles = StyleSheet.create({
  text: { ...type.body, color: colors.ink },
  strong: { ...type.bodyStrong, color: colors.ink },
  end: { textAlign: 'right' },
});
