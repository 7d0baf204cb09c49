// Who is signed in (name and roles) and the sign-out action, in a light (top bar) or dark (rail) tone.
// The name leads to the user's own settings (time zone, one-time codes, open sessions), for every role.
// `compact` (phones) shows the sign-out action as an icon; its accessible name stays "Sign out".
import { Link } from 'expo-router';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { Me } from '@/shared/api';
import { PersonIcon, SignOutIcon } from '@/components/icons';
import { colors, radii, space, type } from '@/constants/theme';

type Props = { user: Me; onSignOut: () => void; signingOut: boolean; tone: 'light' | 'dark'; compact?: boolean };

export function UserSummary({ user, onSignOut, signingOut, tone, compact = false }: Props) {
  const dark = tone === 'dark';
  const ink = dark ? colors.onAbyss : colors.ink;
  const muted = dark ? colors.onAbyssMuted : colors.inkMuted;
  return (
    <View style={styles.row} testID="user-summary">
      {compact ? null : <PersonIcon color={muted} />}
      <Link href="/security" asChild>
        <Pressable
          role="link"
          testID="user-account"
          // Starts with the visible words, so speech users can say what they see.
          accessibilityLabel={`${user.name}, ${user.roles.join(', ')}: your time zone, codes, sessions and calendar subscription`}
          // Flattened: Link's asChild merge spreads a style array into an object, which crashes on the web.
          style={StyleSheet.flatten([styles.text, compact && styles.textCompact])}
        >
          <Text style={[styles.name, { color: ink }]} numberOfLines={1} testID="user-name">
            {user.name}
          </Text>
          <Text style={[styles.roles, { color: muted }]} numberOfLines={1} testID="user-roles">
            {/* The leading space (collapsed on screen) keeps name and roles apart in the link's text, which must read
                as the start of its accessible name. */}
            {` ${user.roles.join(' · ')}`}
          </Text>
        </Pressable>
      </Link>
      <Pressable
        testID="sign-out"
        role="button"
        accessibilityLabel="Sign out"
        disabled={signingOut}
        onPress={onSignOut}
        style={({ pressed }) => [styles.signOut, pressed && { backgroundColor: dark ? colors.ink : colors.primarySoft }]}
      >
        <SignOutIcon color={ink} />
        {compact ? null : (
          <Text style={[styles.signOutLabel, { color: ink }]}>{signingOut ? 'Signing out…' : 'Sign out'}</Text>
        )}
      </Pressable>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  text: { flex: 1, minWidth: 96 },
  textCompact: { alignItems: 'flex-end' },
  name: { ...type.bodyStrong },
  roles: { ...type.caption },
  signOut: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.xs,
    paddingVertical: space.xs + 2,
    paddingHorizontal: space.sm,
    borderRadius: radii.sm,
    minHeight: 36,
  },
  signOutLabel: { ...type.label },
});
