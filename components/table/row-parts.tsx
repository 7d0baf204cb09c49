// Pieces both table layouts share: the row that opens on a tap, the control that opens it (named by the row's title
// cell alone), the mark on the open row, and how a sort order is shown and read out.
import type { ReactNode } from 'react';
import { Pressable, StyleSheet, Text, View, type StyleProp, type TextStyle, type ViewStyle } from 'react-native';
import type { SortState } from './types';
import { colors, radii, space, type } from '@/constants/theme';

/** The arrow drawn after the sorted column's title (hidden from screen readers, which hear aria-sort instead). */
export function sortMark(sort: SortState | null, key: string): string {
  if (sort?.key !== key) return '';
  return sort.order === 'asc' ? ' ▲' : ' ▼';
}

export function ariaSort(sort: SortState | null, key: string): 'ascending' | 'descending' | undefined {
  if (sort?.key !== key) return undefined;
  return sort.order === 'asc' ? 'ascending' : 'descending';
}

/** A column title with its sort arrow; only the title is read out. */
export function SortTitle({ label, sort, columnKey, style }: { label: string; sort: SortState | null; columnKey: string; style: StyleProp<TextStyle> }) {
  const mark = sortMark(sort, columnKey);
  return (
    <Text style={style}>
      {label}
      {mark ? <Text aria-hidden>{mark}</Text> : null}
    </Text>
  );
}

type OpenProps = { testID: string; open: boolean; onPress?: () => void; children: ReactNode };

/**
 * The row's title cell as the one control that opens it, so a screen reader names the row by its title rather than
 * by every cell run together. Without an onPress the title is drawn as plain content.
 */
export function RowOpenButton({ testID, open, onPress, children }: OpenProps) {
  if (!onPress) return <View style={styles.title}>{children}</View>;
  return (
    <Pressable
      role="button"
      testID={testID}
      aria-current={open ? 'true' : undefined}
      onPress={onPress}
      style={styles.title}
    >
      {children}
    </Pressable>
  );
}

type RowLooks = { base: ViewStyle; selected: ViewStyle; pressed: ViewStyle };

/**
 * A table row (wide) or card (phone) that opens on a tap anywhere. It is no Tab stop: the keyboard's way in is its
 * title (OpenTitle), so each row is one stop, named by its title.
 */
export function OpenableRow({ testID, role, open, onOpen, looks, children }: {
  testID: string; role: 'row' | 'listitem'; open: boolean; onOpen?: () => void; looks: RowLooks; children: ReactNode;
}) {
  return (
    <Pressable
      testID={testID}
      role={role}
      aria-current={open ? 'true' : undefined}
      tabIndex={-1}
      disabled={!onOpen}
      onPress={onOpen}
      style={({ pressed }) => [looks.base, open && looks.selected, pressed && looks.pressed]}
    >
      {children}
    </Pressable>
  );
}

/** The row's title as the button that opens it, with the "Open" mark beside it on the open row. */
export function OpenTitle({ tableTestID, rowKey, open, onOpen, style, children }: {
  tableTestID: string; rowKey: string; open: boolean; onOpen?: () => void; style: StyleProp<ViewStyle>; children: ReactNode;
}) {
  return (
    <View style={style}>
      <RowOpenButton testID={`${tableTestID}-open-${rowKey}`} open={open} onPress={onOpen}>{children}</RowOpenButton>
      {open ? <OpenMark testID={`${tableTestID}-current-${rowKey}`} /> : null}
    </View>
  );
}

/** Marks the open row in words as well as by the bar and tint beside it. */
export function OpenMark({ testID }: { testID: string }) {
  return (
    <Text style={styles.mark} testID={testID}>
      Open
    </Text>
  );
}

const styles = StyleSheet.create({
  title: { flexShrink: 1, alignSelf: 'flex-start', borderRadius: radii.sm },
  mark: {
    ...type.label,
    color: colors.onPrimary,
    backgroundColor: colors.primary,
    paddingHorizontal: space.sm,
    paddingVertical: 1,
    borderRadius: radii.pill,
    overflow: 'hidden',
    alignSelf: 'flex-start',
  },
});
