// Under the queue: the way to one-time codes, and for admins the sign-off policy.
import { StyleSheet, View } from 'react-native';
import { Button } from '@/components/button';
import { space } from '@/constants/theme';

export function QueueFooter({ isAdmin, onOpenCodes, onOpenPolicy }: { isAdmin: boolean; onOpenCodes: () => void; onOpenPolicy: () => void }) {
  return (
    <View style={styles.row}>
      <Button label="One-time codes" variant="quiet" onPress={onOpenCodes} testID="signoff-open-codes" />
      {isAdmin ? <Button label="Sign-off policy" variant="quiet" onPress={onOpenPolicy} testID="signoff-open-policy" /> : null}
    </View>
  );
}

const styles = StyleSheet.create({ row: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'center', gap: space.sm, padding: space.lg } });
