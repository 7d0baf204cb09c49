// Unknown URLs: say so and offer the way home.
import { Link } from 'expo-router';
import { StyleSheet, Text } from 'react-native';
import { AuthFrame } from '@/components/auth-frame';
import { colors, type } from '@/constants/theme';
import { usePageTitle } from '@/components/page-title';

export default function NotFoundScreen() {
  usePageTitle('Page not found');
  return (
    <AuthFrame title="This page does not exist">
      <Text style={styles.body}>The address may be mistyped, or the page has moved.</Text>
      <Link href="/" style={styles.link}>
        Go to the overview
      </Link>
    </AuthFrame>
  );
}

const styles = StyleSheet.create({
  body: { ...type.body, color: colors.inkMuted },
  link: { ...type.bodyStrong, color: colors.primary },
});
