// A row's title cell: the name, with its id underneath in small type (ids are what files and tickets quote).
import { StyleSheet, Text, View } from 'react-native';
import { colors, type } from '@/constants/theme';

export function NameCell({ name, id, badge }: { name: string; id: string; badge?: React.ReactNode }) {
  return (
    <View style={styles.box}>
      <View style={styles.line}>
        <Text style={styles.name} numberOfLines={2}>
          {name}
        </Text>
        {badge}
      </View>
      {name !== id ? <Text style={styles.id}>{id}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { flexShrink: 1 },
  line: { flexDirection: 'row', alignItems: 'center', gap: 6, flexWrap: 'wrap' },
  name: { ...type.bodyStrong, color: colors.ink },
  id: { ...type.caption, color: colors.inkMuted },
});
