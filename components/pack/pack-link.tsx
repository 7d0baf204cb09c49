// The way into a window's change-board pack from the window screen, for the roles that may read it.
import { StyleSheet, View } from 'react-native';
import type { Me } from '@/shared/api';
import { canReadChangePack } from '@/shared/permissions';
import { Button } from '@/components/button';
import { space } from '@/constants/theme';

export function PackLink({ me, onOpen, testID = 'window-open-pack' }: { me: Me; onOpen: () => void; testID?: string }) {
  if (!canReadChangePack(me.roles)) return null;
  return (
    <View style={styles.row}>
      <Button label="Change-board pack (print, PDF, moves CSV)" variant="quiet" onPress={onOpen} testID={testID} />
    </View>
  );
}

const styles = StyleSheet.create({ row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm } });
