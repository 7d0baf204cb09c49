// Other windows this one collides with, each with the reasons in words (names, never ids) and a way to open it.
import { Fragment, type ReactNode } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { useSliceQuery } from '@/hooks/queries/slices';
import type { WindowConflict } from '@/shared/window-impact';
import { formatWindowRange } from '@/components/time';
import { calendarColors, colors, radii, space, type } from '@/constants/theme';
import { linkKeyProps } from '@/components/key-props';
import { ElementName } from '@/components/windows/element-name';

const REASON_LABELS: Record<WindowConflict['reasons'][number]['reason'], string> = {
  'shared-element': 'Shares equipment',
  'joint-split': 'Together they split the network',
  'strands-slice': 'Together they strand a slice',
};

type Reason = WindowConflict['reasons'][number];

function SliceName({ id }: { id: string }) {
  const slice = useSliceQuery(id);
  return <Text>{slice.data ? `"${slice.data.slice.name}"` : slice.isError ? 'a slice whose name could not be loaded' : 'a slice'}</Text>;
}

/** "A", "A and B", "A, B and C": nested texts, so each name can arrive on its own. */
function NameList({ parts }: { parts: readonly ReactNode[] }) {
  return parts.map((part, i) => (
    <Fragment key={i}>
      {i === 0 ? null : i === parts.length - 1 ? ' and ' : ', '}
      {part}
    </Fragment>
  ));
}

/**
 * A reason in words with names: the server's message names elements and slices by id ("site:core-vellaport"), so
 * the reasons that carry ids are written here from the ids, by name; the others read as the server words them.
 */
function ReasonWords({ reason: r }: { reason: Reason }) {
  if (r.reason === 'shared-element') {
    const parts = r.ids.map((key) => {
      const [kind, ...rest] = key.split(':');
      const id = rest.join(':');
      const noun = kind === 'site' ? 'site' : 'span';
      return <Fragment key={key}>{`${noun} `}<ElementName kind={noun} id={id} /></Fragment>;
    });
    return <Text style={styles.body}>Both windows take out <NameList parts={parts} />.</Text>;
  }
  if (r.reason === 'strands-slice') {
    const parts = r.ids.map((id) => <SliceName key={id} id={id} />);
    return <Text style={styles.body}>Together the windows cut off parts of {r.ids.length === 1 ? 'the slice' : 'the slices'} <NameList parts={parts} />.</Text>;
  }
  return <Text style={styles.body}>{r.message}</Text>;
}

type Props = { conflicts: readonly WindowConflict[]; timeZone: string; onOpenWindow: (id: string) => void };

export function ConflictsList({ conflicts, timeZone, onOpenWindow }: Props) {
  if (conflicts.length === 0) return <Text style={styles.muted} testID="window-no-conflicts">No other window collides with this one.</Text>;
  return (
    <View style={styles.list} testID="window-conflicts">
      {conflicts.map((c) => (
        <Pressable
          key={c.window.id}
          role="link"
          onPress={() => onOpenWindow(c.window.id)}
          {...linkKeyProps(() => onOpenWindow(c.window.id))}
          style={({ pressed }) => [styles.item, pressed && styles.pressed]}
          testID={`window-conflict-${c.window.id}`}
        >
          <Text style={styles.title}>{c.window.title}</Text>
          <Text style={styles.muted}>{formatWindowRange(c.window.startsAt, c.window.endsAt, timeZone)}</Text>
          {c.reasons.map((r) => (
            <View key={r.reason} style={styles.reason}>
              <Text style={styles.reasonLabel}>{REASON_LABELS[r.reason]}</Text>
              <ReasonWords reason={r} />
            </View>
          ))}
        </Pressable>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  item: { gap: space.xs, padding: space.md, borderRadius: radii.md, borderLeftWidth: 4, borderLeftColor: calendarColors.conflict, backgroundColor: calendarColors.conflictSoft },
  pressed: { opacity: 0.8 },
  title: { ...type.bodyStrong, color: colors.primary, textDecorationLine: 'underline' },
  reason: { gap: space.xxs },
  reasonLabel: { ...type.label, color: calendarColors.conflict },
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
});
