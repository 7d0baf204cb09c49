// The table's column and sort contracts, shared by the column view, the card view and the client-side helpers.
import type { ReactNode } from 'react';

export type SortOrder = 'asc' | 'desc';
export type SortState = { key: string; order: SortOrder };

export type Column<T> = {
  key: string;
  label: string;
  /** Cell content; plain strings and numbers are drawn as text. */
  render: (row: T) => ReactNode;
  /** Client-side sort value; a column with a sortValue (or `sortable`) gets a sort control. */
  sortValue?: (row: T) => string | number | null | undefined;
  /** Sortable by the server (no sortValue needed when the caller sorts through the API). */
  sortable?: boolean;
  /** Relative width in the column view. */
  flex?: number;
  align?: 'start' | 'end';
  /** The row's title in the card view (one column should set this). */
  primary?: boolean;
  /** Left out of the card view (e.g. a detail that only fits a wide row). */
  hideInCards?: boolean;
  /** Left out of the column view when the pane is narrower than this, so the other columns keep room. */
  minPaneWidthPx?: number;
};

export function isSortable<T>(column: Column<T>): boolean {
  return column.sortable === true || column.sortValue !== undefined;
}
