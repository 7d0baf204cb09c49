// Wide screens: a dark rail on the left with the mark, the areas and the signed-in user at the foot.
import { Link } from 'expo-router';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { LogoMark } from '@/components/icons';
import { areasFor } from '@/components/shell/nav-areas';
import { labelWithBadge, NavBadge, useNavBadges } from '@/components/shell/nav-badges';
import { UserSummary } from '@/components/shell/user-summary';
import type { Me } from '@/shared/api';
import { colors, radii, space, type } from '@/constants/theme';

type Props = { user: Me; pathname: string; onSignOut: () => void; signingOut: boolean };

export function SideRail({ user, pathname, onSignOut, signingOut }: Props) {
  const badges = useNavBadges(user.roles);
  return (
    <View style={styles.rail} role="navigation" aria-label="Main" testID="side-rail">
      <View style={styles.brand}>
        <LogoMark size={32} />
        <Text style={styles.name}>Slackwater</Text>
      </View>
      <View style={styles.areas}>
        {areasFor(user.roles).map(({ key, label, href, matches, Icon }) => {
          const active = matches(pathname);
          const badge = badges[key];
          return (
            <Link key={key} href={href} asChild>
              <Pressable
                testID={`nav-${key}`} aria-current={active ? 'page' : undefined} style={styles.pressable}
                accessibilityLabel={labelWithBadge(label, badge)}
              >
                {/* Layout on an inner View: Link's asChild merge does not keep a Pressable style function. */}
                <View style={[styles.item, active && styles.itemActive]}>
                  <View style={[styles.mark, active && styles.markActive]} />
                  <Icon color={active ? colors.onAbyss : colors.onAbyssMuted} />
                  <Text style={[styles.label, active && styles.labelActive]}>{label}</Text>
                  {badge ? <View style={styles.badge}><NavBadge areaKey={key} badge={badge} /></View> : null}
                </View>
              </Pressable>
            </Link>
          );
        })}
      </View>
      <View style={styles.foot}>
        <UserSummary user={user} onSignOut={onSignOut} signingOut={signingOut} tone="dark" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  rail: { width: 240, backgroundColor: colors.abyss, paddingVertical: space.xl, paddingHorizontal: space.md },
  brand: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingHorizontal: space.sm, marginBottom: space.xl },
  name: { ...type.title, color: colors.onAbyss },
  areas: { flex: 1, gap: space.xs },
  pressable: { borderRadius: radii.md },
  item: { flexDirection: 'row', alignItems: 'center', gap: space.md, padding: space.sm, borderRadius: radii.md },
  itemActive: { backgroundColor: colors.ink },
  mark: { width: 3, height: 20, borderRadius: 2, backgroundColor: 'transparent' },
  markActive: { backgroundColor: colors.buoy },
  label: { ...type.bodyStrong, color: colors.onAbyssMuted },
  labelActive: { color: colors.onAbyss },
  badge: { marginLeft: 'auto' },
  foot: { borderTopWidth: 1, borderTopColor: colors.ink, paddingTop: space.lg },
});
