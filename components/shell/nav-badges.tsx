// Counts shown on an area's tab or rail item, and the badge that shows one. Only sign-off has one: the windows
// waiting for this approver's decision.
import { StyleSheet, Text, View } from 'react-native';
import type { RoleName } from '@/shared/api';
import { canSignOff } from '@/shared/permissions';
import { useSignoffWaitingCountQuery } from '@/hooks/queries/signoff';
import { colors, radii, space, type } from '@/constants/theme';

export type NavBadgeInfo = { count: number; /** what a screen reader says, e.g. "3 decisions waiting" */ label: string };
export type NavBadges = Partial<Record<string, NavBadgeInfo>>;

export const decisionsWaitingLabel = (n: number) => `${n} decision${n === 1 ? '' : 's'} waiting`;

/** Badges by area key; an area with nothing waiting has none. */
export function useNavBadges(roles: readonly RoleName[]): NavBadges {
  const approver = canSignOff(roles);
  const waiting = useSignoffWaitingCountQuery(approver).data?.waiting ?? 0;
  return approver && waiting > 0 ? { 'sign-off': { count: waiting, label: decisionsWaitingLabel(waiting) } } : {};
}

/** Past two digits the exact figure no longer helps on a badge; the label still says it. */
const BADGE_MAX = 99;

const shownCount = (badge: NavBadgeInfo) => (badge.count > BADGE_MAX ? `${BADGE_MAX}+` : String(badge.count));

/**
 * The figure on the tab. It has no name of its own: the tab's name says it in words (labelWithBadge). The leading
 * space, collapsed on screen, keeps the figure apart from the tab's label in the tab's text.
 */
export function NavBadge({ areaKey, badge }: { areaKey: string; badge: NavBadgeInfo }) {
  return (
    <View style={styles.badge} testID={`nav-badge-${areaKey}`}>
      <Text style={styles.text}>{` ${shownCount(badge)}`}</Text>
    </View>
  );
}

/**
 * The tab's accessible name with its badge: the visible words first, as speech users say them ("Sign-off 3"),
 * then in words ("Sign-off 3, 3 decisions waiting").
 */
export const labelWithBadge = (label: string, badge: NavBadgeInfo | undefined) => (badge ? `${label} ${shownCount(badge)}, ${badge.label}` : label);

const styles = StyleSheet.create({
  badge: {
    minWidth: 20, height: 20, paddingHorizontal: space.xs, borderRadius: radii.pill,
    backgroundColor: colors.buoy, alignItems: 'center', justifyContent: 'center',
  },
  text: { ...type.label, lineHeight: 16, color: colors.abyss },
});
