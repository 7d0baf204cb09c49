// The signed-in frame: a side rail from WIDE_LAYOUT_MIN_WIDTH_PX, otherwise a top bar plus bottom tabs. Around
// every page: the skip link, the `main` landmark, focus on the new page's h1 after a move, and a polite live
// region naming the page moved to.
import { useCallback, useRef, useState, type ReactNode } from 'react';
import { StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import type { Me } from '@/shared/api';
import { LogoMark } from '@/components/icons';
import { PageTitleContext } from '@/components/page-title';
import { BottomTabs } from '@/components/shell/bottom-tabs';
import { useFocusHeadingOnNavigation } from '@/components/shell/navigation-focus';
import { SideRail } from '@/components/shell/side-rail';
import { SkipLink } from '@/components/shell/skip-link';
import { UserSummary } from '@/components/shell/user-summary';
import { colors, space, type, WIDE_LAYOUT_MIN_WIDTH_PX } from '@/constants/theme';

type Props = { user: Me; pathname: string; onSignOut: () => void; signingOut: boolean; children: ReactNode };

export function AppShell({ user, pathname, onSignOut, signingOut, children }: Props) {
  const { width } = useWindowDimensions();
  const insets = useSafeAreaInsets();
  const mainRef = useRef<View>(null);
  const [pageTitle, setPageTitle] = useState('');
  const getMain = useCallback(() => mainRef.current, []);
  const navigated = useFocusHeadingOnNavigation(pathname, getMain);
  const main = (
    // tabIndex -1: the skip link can focus the content without adding a Tab stop.
    <View ref={mainRef} role="main" tabIndex={-1} testID="main-content" nativeID="main-content" style={styles.content}>
      {children}
    </View>
  );
  const frame = width >= WIDE_LAYOUT_MIN_WIDTH_PX ? (
    <View style={styles.wide}>
      <SideRail user={user} pathname={pathname} onSignOut={onSignOut} signingOut={signingOut} />
      {main}
    </View>
  ) : (
    <View style={styles.narrow}>
      <View style={[styles.topBar, { paddingTop: insets.top + space.sm }]} role="banner">
        <LogoMark size={28} />
        <Text style={styles.name}>Slackwater</Text>
        <View style={styles.user}>
          <UserSummary user={user} onSignOut={onSignOut} signingOut={signingOut} tone="light" compact />
        </View>
      </View>
      {main}
      <BottomTabs pathname={pathname} roles={user.roles} />
    </View>
  );
  return (
    <PageTitleContext.Provider value={setPageTitle}>
      <View style={styles.root}>
        <SkipLink onSkip={() => mainRef.current?.focus()} />
        {frame}
        {/* Said once a move has happened: the first page's title is the browser's to announce. */}
        <Text style={styles.offscreen} aria-live="polite" testID="nav-live-region">
          {navigated ? pageTitle : ''}
        </Text>
      </View>
    </PageTitleContext.Provider>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1 },
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
  // Heard, not seen: outside the viewport but not hidden from assistive technology.
  offscreen: { position: 'absolute', left: -10000, top: 0, width: 1, height: 1, overflow: 'hidden' },
});
