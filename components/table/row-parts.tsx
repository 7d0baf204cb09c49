// Pieces both table layouts share: the control that opens a row (named by the row's title cell alone), the mark on
// the open row, and how a sort order is shown and read out.
import type { ReactNode } from 'react';
import { Pressable, StyleSheet, Text, View, type StyleProp, type TextStyle } from 'react-native';
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
