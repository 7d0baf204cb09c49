// Phones: the areas as a tab bar along the bottom edge, clear of the home indicator.
import { Link } from 'expo-router';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import type { RoleName } from '@/shared/api';
import { areasFor } from '@/components/shell/nav-areas';
import { colors, space, type } from '@/constants/theme';

export function BottomTabs({ pathname, roles }: { pathname: string; roles: readonly RoleName[] }) {
  const insets = useSafeAreaInsets();
  return (
    <View style={[styles.bar, { paddingBottom: insets.bottom + space.xs }]} role="tablist" testID="bottom-tabs">
      {areasFor(roles).map(({ key, label, href, matches, Icon }) => {
        const active = matches(pathname);
        const tint = active ? colors.primary : colors.inkMuted;
        return (
          <Link key={key} href={href} asChild>
            <Pressable testID={`nav-${key}`} role="tab" aria-selected={active} style={styles.pressable}>
              <View style={styles.tab}>
                <View style={[styles.mark, active && styles.markActive]} />
                <Icon color={tint} />
                <Text style={[styles.label, { color: tint }]}>{label}</Text>
              </View>
            </Pressable>
          </Link>
        );
      })}
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
  markActive: { backgroundColor: colors.buoy },
  label: { ...type.caption },
});
