// A short way from a list of work to the calendar subscription on the Security screen.
import { Link } from 'expo-router';
import { Pressable, StyleSheet, Text } from 'react-native';
import { colors, type } from '@/constants/theme';

export function CalendarFeedLink({ what }: { what: string }) {
  return (
    <Link href="/security" asChild>
      {/* Flattened: Link's asChild merge spreads a style array into an object, which crashes on the web. */}
      <Pressable role="link" testID="calendar-feed-link" style={StyleSheet.flatten([styles.link])}>
        <Text style={styles.text}>{`Follow ${what} in your calendar app: calendar subscription`}</Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  link: { alignSelf: 'flex-start', minHeight: 24, justifyContent: 'center' },
  text: { ...type.label, color: colors.primary, textDecorationLine: 'underline' },
});
