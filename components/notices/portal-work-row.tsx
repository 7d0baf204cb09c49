// One upcoming piece of work in the tenant portal: what, when (tenant's zone), and where its notice stands.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { PortalWorkItem } from '@/shared/notices';
import { Badge, CriticalBadge } from '@/components/inventory/badges';
import { formatWindowRange } from '@/components/time';
import { colors, radii, space, type } from '@/constants/theme';
import { EFFECT_LABEL, workState } from './notice-format';

type Props = { item: PortalWorkItem; timeZone: string; selected: boolean; onOpen: (noticeId: string) => void };

export function PortalWorkRow({ item, timeZone, selected, onOpen }: Props) {
  const state = workState(item);
  const notice = item.notice;
  const body = (
    <>
      <View style={styles.top}>
        <Text style={styles.summary}>{item.summary}</Text>
        <View style={styles.state}>
          <Badge label={state.label} tone={state.tone} testID={`work-state-${item.windowId}`} />
        </View>
      </View>
      <Text style={styles.when}>{formatWindowRange(item.startsAt, item.endsAt, timeZone)}</Text>
      <View style={styles.badges}>
        {item.critical ? <CriticalBadge /> : null}
        {notice && !notice.content.cancelled ? <Badge label={EFFECT_LABEL[notice.content.effect]} /> : null}
      </View>
      {notice ? null : <Text style={styles.hint}>You will get a notice with the details once the work is signed off.</Text>}
    </>
  );
  if (!notice) return <View style={styles.row} testID={`work-row-${item.windowId}`}>{body}</View>;
  return (
    <Pressable
      role="link"
      testID={`notice-row-${notice.id}`}
      aria-current={selected ? 'true' : undefined}
      onPress={() => onOpen(notice.id)}
      style={({ pressed }) => [styles.row, selected && styles.selected, pressed && styles.pressed]}
    >
      {body}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: {
    gap: space.xs, padding: space.md, borderRadius: radii.md, borderWidth: 1,
    borderColor: colors.border, backgroundColor: colors.surface, minHeight: 44,
  },
  // A bar on the leading edge as well as the tint: the open notice differs by shape too, not by colour alone.
  selected: { borderColor: colors.primary, backgroundColor: colors.primarySoft, borderLeftWidth: 6 },
  pressed: { backgroundColor: colors.surfaceSunken },
  top: { flexDirection: 'row', alignItems: 'flex-start', justifyContent: 'space-between', gap: space.sm },
  summary: { ...type.bodyStrong, color: colors.ink, flexShrink: 1 },
  // The state keeps its width; the summary wraps instead.
  state: { flexShrink: 0 },
  when: { ...type.body, color: colors.ink },
  badges: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  hint: { ...type.caption, color: colors.inkMuted },
});
