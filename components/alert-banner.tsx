// The red banner above a form that says why the last request failed; role="alert" so it is read out when it appears.
import { StyleSheet, Text, View } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

export function AlertBanner({ message, testID }: { message: string; testID: string }) {
  return (
    <View style={styles.banner} role="alert" testID={testID}>
      <Text style={styles.bannerText}>{message}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  banner: { backgroundColor: colors.dangerSoft, borderRadius: radii.md, padding: space.md },
  bannerText: { ...type.bodyStrong, color: colors.danger },
});
