// The signed-in frame: a side rail from WIDE_LAYOUT_MIN_WIDTH_PX, otherwise a top bar plus bottom tabs.
import type { ReactNode } from 'react';
import { StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import type { Me } from '@/shared/api';
import { LogoMark } from '@/components/icons';
import { BottomTabs } from '@/components/shell/bottom-tabs';
import { SideRail } from '@/components/shell/side-rail';
import { UserSummary } from '@/components/shell/user-summary';
import { colors, space, type, WIDE_LAYOUT_MIN_WIDTH_PX } from '@/constants/theme';

type Props = { user: Me; pathname: string; onSignOut: () => void; signingOut: boolean; children: ReactNode };

export function AppShell({ user, pathname, onSignOut, signingOut, children }: Props) {
  const { width } = useWindowDimensions();
  const insets = useSafeAreaInsets();
  if (width >= WIDE_LAYOUT_MIN_WIDTH_PX) {
    return (
      <View style={styles.wide}>
        <SideRail user={user} pathname={pathname} onSignOut={onSignOut} signingOut={signingOut} />
        <View style={styles.content}>{children}</View>
      </View>
    );
  }
  return (
    <View style={styles.narrow}>
      <View style={[styles.topBar, { paddingTop: insets.top + space.sm }]}>
        <LogoMark size={28} />
        <Text style={styles.name}>Slackwater</Text>
        <View style={styles.user}>
          <UserSummary user={user} onSignOut={onSignOut} signingOut={signingOut} tone="light" compact />
        </View>
      </View>
      <View style={styles.content}>{children}</View>
      <BottomTabs pathname={pathname} roles={user.roles} />
    </View>
  );
}

const styles = StyleSheet.create({
  wide: { flex: 1, flexDirection: 'row', backgroundColor: colors.tide },
  narrow: { flex: 1, backgroundColor: colors.tide },
  content: { flex: 1 },
  topBar: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm,
    paddingHorizontal: space.lg,
    paddingBottom: space.sm,
    backgroundColor: colors.surface,
    borderBottomWidth: 1,
    borderBottomColor: colors.border,
  },
  name: { ...type.heading, color: colors.abyss },
  user: { flex: 1, marginLeft: space.md },
});
