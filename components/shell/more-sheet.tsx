// Phones: the areas that did not fit the bottom bar, as links in a dialog rising from the bottom edge. On the web
// the modal is a dialog named "More areas" that keeps focus inside while open (first link focused), closes on
// Escape, and hands focus back to the More button on closing.
import { Link } from 'expo-router';
import { Modal, Pressable, StyleSheet, Text, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import type { NavArea } from '@/components/shell/nav-areas';
import { colors, radii, space, type } from '@/constants/theme';

type Props = { areas: readonly NavArea[]; pathname: string; visible: boolean; onClose: () => void };

export function MoreSheet({ areas, pathname, visible, onClose }: Props) {
  const insets = useSafeAreaInsets();
  return (
    <Modal visible={visible} transparent animationType="fade" onRequestClose={onClose} aria-label="More areas">
      <View style={styles.frame}>
        {/* The sheet comes first so that it, not the backdrop, takes focus when the dialog opens. */}
        <View style={[styles.sheet, { paddingBottom: insets.bottom + space.lg }]} testID="nav-more-sheet">
          <View style={styles.grip} />
          <Text style={styles.heading}>More areas</Text>
          {areas.map(({ key, label, href, matches, Icon }) => {
            const active = matches(pathname);
            return (
              <Link key={key} href={href} asChild onPress={onClose}>
                <Pressable testID={`nav-${key}`} role="link" aria-current={active ? 'page' : undefined}>
                  <View style={[styles.row, active && styles.rowActive]}>
                    <View style={[styles.mark, active && styles.markActive]} />
                    <Icon color={active ? colors.primary : colors.ink} />
                    <Text style={[styles.label, active && styles.labelActive]}>{label}</Text>
                  </View>
                </Pressable>
              </Link>
            );
          })}
          <Pressable testID="nav-more-close" role="button" onPress={onClose} style={styles.close}>
            <Text style={styles.closeLabel}>Close</Text>
          </Pressable>
        </View>
        {/* Tapping the dimmed page closes the sheet, as do Close, Escape and the system back gesture
            (onRequestClose); a pointer convenience only, so out of the Tab order and the accessibility tree. */}
        <Pressable style={styles.backdrop} onPress={onClose} testID="nav-more-backdrop" focusable={false} aria-hidden />
      </View>
    </Modal>
  );
}

const styles = StyleSheet.create({
  frame: { flex: 1, justifyContent: 'flex-end' },
  backdrop: { position: 'absolute', top: 0, right: 0, bottom: 0, left: 0, backgroundColor: colors.abyss, opacity: 0.4 },
  sheet: {
    zIndex: 1,
    backgroundColor: colors.surface,
    borderTopLeftRadius: radii.lg,
    borderTopRightRadius: radii.lg,
    paddingTop: space.sm,
    paddingHorizontal: space.lg,
    gap: space.xs,
  },
  grip: { alignSelf: 'center', width: 40, height: 4, borderRadius: radii.pill, backgroundColor: colors.border, marginBottom: space.sm },
  heading: { ...type.label, color: colors.inkMuted, marginBottom: space.xs },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, minHeight: 48, paddingHorizontal: space.sm, borderRadius: radii.md },
  rowActive: { backgroundColor: colors.primarySoft },
  mark: { width: 3, height: 20, borderRadius: 2, backgroundColor: 'transparent' },
  markActive: { backgroundColor: colors.buoyDeep },
  label: { ...type.bodyStrong, color: colors.ink },
  labelActive: { color: colors.primary },
  close: { alignItems: 'center', justifyContent: 'center', minHeight: 48, marginTop: space.xs, borderRadius: radii.md },
  closeLabel: { ...type.bodyStrong, color: colors.primary },
});
