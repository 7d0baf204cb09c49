// A sortable, searchable table: labelled columns when there is room, cards on a phone-width pane.
// Controlled: the caller owns search text and sort (client-side via useClientTable, or through the API).
import { useState, type ReactNode } from 'react';
import { ActivityIndicator, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { Button } from '@/components/button';
import { SearchField } from './search-field';
import { nextSort } from './table-logic';
import { TableCardsView } from './table-cards-view';
import { TableColumnsView } from './table-columns-view';
import type { Column, SortState } from './types';
import { colors, space, type } from '@/constants/theme';

/** A pane narrower than this shows cards: columns squeezed below it truncate every value. */
export const TABLE_COLUMNS_MIN_WIDTH_PX = 520;

export type DataTableProps<T> = {
  testID: string;
  /** What the table is called, read out when a screen reader enters it ("Slices"). */
  label?: string;
  rows: readonly T[];
  columns: readonly Column<T>[];
  rowKey: (row: T) => string;
  sort: SortState | null;
  onSortChange: (sort: SortState) => void;
  query?: string;
  onQueryChange?: (query: string) => void;
  searchLabel?: string;
  onRowPress?: (row: T) => void;
  selectedKey?: string | null;
  /** 'loading' and 'error' replace the rows but keep search and filters in place. */
  status?: 'ready' | 'loading' | 'error';
  errorMessage?: string;
  onRetry?: () => void;
  emptyTitle: string;
  emptyHint?: string;
  /** Filters drawn under the search box. */
  toolbar?: ReactNode;
  /** Paging or a count under the rows. */
  footer?: ReactNode;
  /** 'auto' picks by the pane's measured width; tests force one. */
  layout?: 'auto' | 'columns' | 'cards';
};

/** What replaces the rows: an error, a spinner or the empty note; null when there are rows to show. */
function bodyState({ status, errorMessage, onRetry, empty, emptyTitle, emptyHint, testID }: {
  status: 'ready' | 'loading' | 'error'; errorMessage?: string; onRetry?: () => void;
  empty: boolean; emptyTitle: string; emptyHint?: string; testID: string;
}) {
  if (status === 'error') {
    return (
      <View style={styles.state} testID={`${testID}-error`} role="alert">
        <Text style={styles.stateTitle}>Could not load this list</Text>
        {errorMessage ? <Text style={styles.stateHint}>{errorMessage}</Text> : null}
        {onRetry ? <Button label="Try again" variant="quiet" onPress={onRetry} /> : null}
      </View>
    );
  }
  if (status === 'loading') {
    return (
      <View style={styles.state} testID={`${testID}-loading`} aria-busy>
        <ActivityIndicator color={colors.primary} aria-label="Loading the rows" />
      </View>
    );
  }
  if (!empty) return null;
  return (
    <View style={styles.state} testID={`${testID}-empty`}>
      <Text style={styles.stateTitle}>{emptyTitle}</Text>
      {emptyHint ? <Text style={styles.stateHint}>{emptyHint}</Text> : null}
    </View>
  );
}

export function DataTable<T>(props: DataTableProps<T>) {
  const { testID, query, onQueryChange, searchLabel = 'Search', toolbar, footer, layout = 'auto' } = props;
  const window = useWindowDimensions();
  const [paneWidth, setPaneWidth] = useState<number | null>(null);
  const width = paneWidth ?? window.width;
  const columnsMode = layout === 'columns' || (layout === 'auto' && width >= TABLE_COLUMNS_MIN_WIDTH_PX);
  const status = props.status ?? 'ready';
  const body = bodyState({ ...props, status, empty: props.rows.length === 0 });
  const viewProps = {
    ...props,
    columns: columnsMode ? props.columns.filter((c) => !c.minPaneWidthPx || width >= c.minPaneWidthPx) : props.columns,
    body,
    onSortPress: (key: string) => props.onSortChange(nextSort(props.sort, key)),
  };
  return (
    <View style={styles.frame} testID={testID} onLayout={(event) => setPaneWidth(event.nativeEvent.layout.width)}>
      {onQueryChange ? (
        <SearchField value={query ?? ''} onChange={onQueryChange} label={searchLabel} testID={`${testID}-search`} />
      ) : null}
      {toolbar}
      {columnsMode ? <TableColumnsView {...viewProps} /> : <TableCardsView {...viewProps} />}
      {footer}
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { flex: 1, gap: space.sm },
  state: { alignItems: 'center', justifyContent: 'center', gap: space.sm, padding: space.xl, minHeight: 160 },
  stateTitle: { ...type.heading, color: colors.ink, textAlign: 'center' },
  stateHint: { ...type.body, color: colors.inkMuted, textAlign: 'center', maxWidth: 420 },
});
