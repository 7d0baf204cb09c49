// Phones: the areas as a bar of links along the bottom edge, clear of the home indicator; to assistive technology
// the navigation landmark "Main", the current area marked aria-current="page". When there are more areas than fit
// (see phone-areas.ts), the last place is a More button opening a dialog with the rest.
import { useState } from 'react';
import type { ComponentType } from 'react';
import { Link } from 'expo-router';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import type { RoleName } from '@/shared/api';
import { MoreIcon } from '@/components/icons';
import { areasFor } from '@/components/shell/nav-areas';
import { MoreSheet } from '@/components/shell/more-sheet';
import { labelWithBadge, NavBadge, useNavBadges, type NavBadgeInfo } from '@/components/shell/nav-badges';
import { splitPhoneAreas } from '@/components/shell/phone-areas';
import { colors, space, type } from '@/constants/theme';

export function BottomTabs({ pathname, roles }: { pathname: string; roles: readonly RoleName[] }) {
  const insets = useSafeAreaInsets();
  const [moreOpen, setMoreOpen] = useState(false);
  const { tabs, more } = splitPhoneAreas(areasFor(roles));
  const badges = useNavBadges(roles);
  // More reads as active while the user is inside one of the areas it holds.
  const moreActive = more.some((area) => area.matches(pathname));
  return (
    <View style={[styles.bar, { paddingBottom: insets.bottom + space.xs }]} role="navigation" aria-label="Main" testID="bottom-tabs">
      {tabs.map(({ key, label, href, matches, Icon }) => (
        <Link key={key} href={href} asChild>
          <Pressable
            testID={`nav-${key}`} role="link" aria-current={matches(pathname) ? 'page' : undefined} style={styles.pressable}
            accessibilityLabel={labelWithBadge(label, badges[key])}
          >
            <TabFace label={label} Icon={Icon} active={matches(pathname)} areaKey={key} badge={badges[key]} />
          </Pressable>
        </Link>
      ))}
      {more.length > 0 && (
        <Pressable
          testID="nav-more" role="button" aria-haspopup="dialog" aria-expanded={moreOpen}
          onPress={() => setMoreOpen(true)} style={styles.pressable}
        >
          <TabFace label="More" Icon={MoreIcon} active={moreActive} />
        </Pressable>
      )}
      <MoreSheet areas={more} pathname={pathname} visible={moreOpen} onClose={() => setMoreOpen(false)} />
    </View>
  );
}

type FaceProps = { label: string; Icon: ComponentType<{ color?: string }>; active: boolean; areaKey?: string; badge?: NavBadgeInfo };

function TabFace({ label, Icon, active, areaKey, badge }: FaceProps) {
  const tint = active ? colors.primary : colors.inkMuted;
  return (
    <View style={styles.tab}>
      <View style={[styles.mark, active && styles.markActive]} />
      <Icon color={tint} />
      <Text style={[styles.label, { color: tint }]} numberOfLines={1}>{label}</Text>
      {/* After the label in reading order, so the tab's text reads "Sign-off 3" as its name begins; drawn over
          the icon's corner. */}
      {badge && areaKey ? <View style={styles.badge}><NavBadge areaKey={areaKey} badge={badge} /></View> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: {
    flexDirection: 'row',
    backgroundColor: colors.surface,
    borderTopWidth: 1,
    borderTopColor: colors.border,
    paddingTop: space.xs,
  },
  pressable: { flex: 1 },
  tab: { alignItems: 'center', gap: space.xxs, paddingVertical: space.xs, minHeight: 48 },
  mark: { width: 24, height: 3, borderRadius: 2, backgroundColor: 'transparent', marginBottom: space.xxs },
  markActive: { backgroundColor: colors.buoyDeep },
  label: { ...type.caption },
  // Over the icon's top-right corner (the icon is centred in the tab), as phones show unread counts.
  badge: { position: 'absolute', top: space.xs, left: '50%', marginLeft: space.xs },
});
