// Component test of the reusable table: client-side search and sort, the empty state, row presses, both layouts.
import { fireEvent, render, screen, within } from '@testing-library/react-native';
import { DataTable } from '@/components/table/data-table';
import { useClientTable } from '@/components/table/use-client-table';
import { filterRows, nextSort, sortRows } from '@/components/table/table-logic';
import type { Column } from '@/components/table/types';

type Site = { id: string; name: string; cpu: number | null };

const SITES: Site[] = [
  { id: 's1', name: 'Harrowgate Core', cpu: 64 },
  { id: 's2', name: 'Ebbmoor Edge', cpu: 8 },
  { id: 's3', name: 'Cranwick Aggregation', cpu: 32 },
  { id: 's4', name: 'Ébbmoor Cell', cpu: null },
];

const COLUMNS: Column<Site>[] = [
  { key: 'name', label: 'Name', primary: true, render: (s) => s.name, sortValue: (s) => s.name },
  { key: 'cpu', label: 'vCPU', align: 'end', render: (s) => (s.cpu === null ? '—' : s.cpu), sortValue: (s) => s.cpu },
];

const searchText = (s: Site) => `${s.id} ${s.name}`;

function Harness({ rows, layout, onRowPress }: { rows: Site[]; layout: 'columns' | 'cards'; onRowPress?: (s: Site) => void }) {
  const table = useClientTable(rows, COLUMNS, searchText);
  return (
    <DataTable
      testID="sites"
      rows={table.rows}
      columns={COLUMNS}
      rowKey={(s) => s.id}
      sort={table.sort}
      onSortChange={table.setSort}
      query={table.query}
      onQueryChange={table.setQuery}
      onRowPress={onRowPress}
      emptyTitle="No sites match"
      layout={layout}
    />
  );
}

/** Row ids in the order they are drawn. */
function rowOrder(): string[] {
  return screen.getAllByTestId(/^sites-row-/).map((el) => String(el.props.testID).replace('sites-row-', ''));
}

describe.each(['columns', 'cards'] as const)('%s layout', (layout) => {
  test('sorting by a column orders rows ascending, then descending on a second press; blanks stay last', () => {
    render(<Harness rows={SITES} layout={layout} />);
    expect(rowOrder()).toEqual(['s1', 's2', 's3', 's4']);
    fireEvent.press(screen.getByTestId('sites-sort-cpu'));
    expect(rowOrder()).toEqual(['s2', 's3', 's1', 's4']);
    fireEvent.press(screen.getByTestId('sites-sort-cpu'));
    expect(rowOrder()).toEqual(['s1', 's3', 's2', 's4']);
    fireEvent.press(screen.getByTestId('sites-sort-name'));
    // Accents do not count: "Ébbmoor Cell" sorts before "Ebbmoor Edge".
    expect(rowOrder()).toEqual(['s3', 's4', 's2', 's1']);
  });

  test('search keeps only matching rows, ignoring case and accents', () => {
    render(<Harness rows={SITES} layout={layout} />);
    fireEvent.changeText(screen.getByTestId('sites-search'), 'EBBMOOR');
    expect(rowOrder()).toEqual(['s2', 's4']);
    fireEvent.changeText(screen.getByTestId('sites-search'), 'ebbmoor edge');
    expect(rowOrder()).toEqual(['s2']);
    expect(within(screen.getByTestId('sites-row-s2')).getByText('Ebbmoor Edge')).toBeTruthy();
  });

  test('a search with no match shows the empty state instead of rows', () => {
    render(<Harness rows={SITES} layout={layout} />);
    fireEvent.changeText(screen.getByTestId('sites-search'), 'nowhere');
    expect(screen.queryAllByTestId(/^sites-row-/)).toHaveLength(0);
    expect(screen.getByTestId('sites-empty')).toHaveTextContent('No sites match');
  });

  test('pressing a row hands that row to the caller', () => {
    const onRowPress = jest.fn();
    render(<Harness rows={SITES} layout={layout} onRowPress={onRowPress} />);
    fireEvent.press(screen.getByTestId('sites-row-s3'));
    expect(onRowPress).toHaveBeenCalledWith(SITES[2]);
  });
});

test('an empty list shows the empty state from the start', () => {
  render(<Harness rows={[]} layout="columns" />);
  expect(screen.getByTestId('sites-empty')).toBeTruthy();
});

test('loading and error states replace the rows but keep the search box', () => {
  const props = {
    testID: 't', rows: SITES, columns: COLUMNS, rowKey: (s: Site) => s.id, sort: null,
    onSortChange: jest.fn(), query: '', onQueryChange: jest.fn(), emptyTitle: 'none', layout: 'columns' as const,
  };
  const { rerender } = render(<DataTable {...props} status="loading" />);
  expect(screen.getByTestId('t-loading')).toBeTruthy();
  expect(screen.queryAllByTestId(/^t-row-/)).toHaveLength(0);
  const onRetry = jest.fn();
  rerender(<DataTable {...props} status="error" errorMessage="Server down" onRetry={onRetry} />);
  expect(screen.getByTestId('t-error')).toHaveTextContent(/Server down/);
  fireEvent.press(screen.getByText('Try again'));
  expect(onRetry).toHaveBeenCalled();
  expect(screen.getByTestId('t-search')).toBeTruthy();
});

test('pure helpers: nextSort flips the same column and starts a new one ascending; unknown columns keep order', () => {
  expect(nextSort(null, 'cpu')).toEqual({ key: 'cpu', order: 'asc' });
  expect(nextSort({ key: 'cpu', order: 'asc' }, 'cpu')).toEqual({ key: 'cpu', order: 'desc' });
  expect(nextSort({ key: 'cpu', order: 'desc' }, 'name')).toEqual({ key: 'name', order: 'asc' });
  expect(sortRows(SITES, COLUMNS, { key: 'nope', order: 'asc' }).map((s) => s.id)).toEqual(['s1', 's2', 's3', 's4']);
  expect(filterRows(SITES, '  ', searchText)).toHaveLength(4);
});
