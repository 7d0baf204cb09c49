// Component test of the table's accessible structure: table roles and aria-sort on wide panes, a list of cards on
// phones, each row opened by a control named by its title cell alone, the open row marked in words too.
import { fireEvent, render, screen, within } from '@testing-library/react-native';
import { DataTable } from '@/components/table/data-table';
import { sortChoiceName } from '@/components/table/table-cards-view';
import { useClientTable } from '@/components/table/use-client-table';
import type { Column } from '@/components/table/types';

type Site = { id: string; name: string; kind: string; cpu: number };

const SITES: Site[] = [
  { id: 's1', name: 'Harrowgate Core', kind: 'Core', cpu: 64 },
  { id: 's2', name: 'Ebbmoor Edge', kind: 'Edge', cpu: 8 },
  { id: 's3', name: 'Cranwick Aggregation', kind: 'Aggregation', cpu: 32 },
];

const COLUMNS: Column<Site>[] = [
  { key: 'name', label: 'Site', primary: true, render: (s) => s.name, sortValue: (s) => s.name },
  { key: 'kind', label: 'Kind', render: (s) => s.kind },
  { key: 'cpu', label: 'Compute', align: 'end', render: (s) => `${s.cpu} vCPU`, sortValue: (s) => s.cpu },
];

function Harness({ layout, selectedKey, onRowPress = jest.fn() }: { layout: 'columns' | 'cards'; selectedKey?: string; onRowPress?: (s: Site) => void }) {
  const table = useClientTable(SITES, COLUMNS, (s) => s.name, { key: 'name', order: 'asc' });
  return (
    <DataTable
      testID="sites" label="Sites" rows={table.rows} columns={COLUMNS} rowKey={(s) => s.id}
      sort={table.sort} onSortChange={table.setSort} onRowPress={onRowPress} selectedKey={selectedKey}
      emptyTitle="No sites" layout={layout}
    />
  );
}

const props = (testID: string) => screen.getByTestId(testID).props as Record<string, unknown>;

type Node = ReturnType<typeof screen.getByTestId>;
/** Host elements with this role, whether or not React Native counts them as accessible (role queries skip plain Views). */
function withRole(container: Node, role: string): Node[] {
  return container.findAll((n) => typeof n.type === 'string' && n.props.role === role);
}
const rootOf = () => screen.getByTestId('sites');

describe('wide layout', () => {
  test('is a named table of row groups, rows, column headers and cells', () => {
    render(<Harness layout="columns" />);
    const [table, ...more] = withRole(rootOf(), 'table');
    expect(more).toHaveLength(0);
    expect(table.props['aria-label']).toBe('Sites');
    expect(withRole(table, 'rowgroup')).toHaveLength(2);
    // One header row and one row per site.
    expect(withRole(table, 'row')).toHaveLength(1 + SITES.length);
    expect(withRole(table, 'columnheader')).toHaveLength(COLUMNS.length);
    expect(withRole(screen.getByTestId('sites-row-s2'), 'cell')).toHaveLength(COLUMNS.length);
  });

  test('aria-sort sits on the sorted column header and follows the order; the sort button is named by its title', () => {
    render(<Harness layout="columns" />);
    const header = (label: string) => withRole(rootOf(), 'columnheader').find((h) => within(h).queryByText(new RegExp(`^${label}`)))!;
    expect(header('Site').props['aria-sort']).toBe('ascending');
    expect(header('Compute').props['aria-sort']).toBeUndefined();
    const sortCompute = screen.getByTestId('sites-sort-cpu');
    expect(sortCompute.props.role).toBe('button');
    expect(sortCompute.props.accessibilityLabel).toBeUndefined();
    expect(within(sortCompute).getByText(/^Compute/)).toBeTruthy();
    fireEvent.press(sortCompute);
    expect(header('Compute').props['aria-sort']).toBe('ascending');
    expect(header('Site').props['aria-sort']).toBeUndefined();
    fireEvent.press(sortCompute);
    expect(header('Compute').props['aria-sort']).toBe('descending');
    // Kind has no sort control: its header is plain text.
    expect(within(header('Kind')).queryByRole('button')).toBeNull();
  });

  test('each row opens through one button holding only its title cell', () => {
    const onRowPress = jest.fn();
    render(<Harness layout="columns" onRowPress={onRowPress} />);
    const open = screen.getByTestId('sites-open-s3');
    expect(open.props.role).toBe('button');
    expect(within(open).getByText('Cranwick Aggregation')).toBeTruthy();
    expect(within(open).queryByText('Aggregation')).toBeNull();
    expect(within(open).queryByText('32 vCPU')).toBeNull();
    fireEvent.press(open);
    expect(onRowPress).toHaveBeenCalledWith(SITES[2]);
    // The row itself still takes a click, but is no Tab stop of its own.
    expect(props('sites-row-s3').tabIndex).toBe(-1);
    fireEvent.press(screen.getByTestId('sites-row-s1'));
    expect(onRowPress).toHaveBeenLastCalledWith(SITES[0]);
  });

  test('the open row carries aria-current and the word "Open"; the others neither', () => {
    render(<Harness layout="columns" selectedKey="s2" />);
    expect(props('sites-row-s2')['aria-current']).toBe('true');
    expect(props('sites-open-s2')['aria-current']).toBe('true');
    expect(screen.getByTestId('sites-current-s2')).toHaveTextContent('Open');
    expect(props('sites-row-s1')['aria-current']).toBeUndefined();
    expect(screen.queryByTestId('sites-current-s1')).toBeNull();
  });
});

describe('phone layout', () => {
  test('is a named list of cards, each opened by its title', () => {
    const onRowPress = jest.fn();
    render(<Harness layout="cards" selectedKey="s1" onRowPress={onRowPress} />);
    const [list] = withRole(rootOf(), 'list');
    expect(list.props['aria-label']).toBe('Sites');
    expect(withRole(list, 'listitem')).toHaveLength(SITES.length);
    expect(withRole(rootOf(), 'table')).toHaveLength(0);
    const open = screen.getByTestId('sites-open-s2');
    expect(within(open).getByText('Ebbmoor Edge')).toBeTruthy();
    expect(within(open).queryByText('8 vCPU')).toBeNull();
    fireEvent.press(open);
    expect(onRowPress).toHaveBeenCalledWith(SITES[1]);
    expect(props('sites-row-s1')['aria-current']).toBe('true');
    expect(screen.getByTestId('sites-current-s1')).toHaveTextContent('Open');
    expect(screen.queryByTestId('sites-current-s2')).toBeNull();
  });

  test('sort is a radio group with one Tab stop; arrows choose the next column, Space on the chosen one reverses', () => {
    render(<Harness layout="cards" />);
    const [group] = withRole(rootOf(), 'radiogroup');
    expect(group.props['aria-label']).toBe('Sort by');
    expect(screen.getByTestId('sites-sort-name')).toBeChecked();
    expect(props('sites-sort-name').tabIndex).toBe(0);
    expect(props('sites-sort-cpu').tabIndex).toBe(-1);
    fireEvent(screen.getByTestId('sites-sort-name'), 'keyDown', { key: 'ArrowRight', preventDefault: jest.fn() });
    expect(screen.getByTestId('sites-sort-cpu')).toBeChecked();
    expect(screen.getByTestId('sites-sort-name')).not.toBeChecked();
    expect(props('sites-sort-cpu').tabIndex).toBe(0);
    expect(props('sites-sort-name').tabIndex).toBe(-1);
    expect(props('sites-sort-cpu').accessibilityLabel).toBe('Compute, ascending');
    fireEvent(screen.getByTestId('sites-sort-cpu'), 'keyDown', { key: ' ', preventDefault: jest.fn() });
    expect(props('sites-sort-cpu').accessibilityLabel).toBe('Compute, descending');
    // Wrapping: right from the last choice comes back to the first.
    fireEvent(screen.getByTestId('sites-sort-cpu'), 'keyDown', { key: 'ArrowRight', preventDefault: jest.fn() });
    expect(screen.getByTestId('sites-sort-name')).toBeChecked();
  });

  test('a sort choice is named by its visible title first', () => {
    expect(sortChoiceName('Compute', null, 'cpu')).toBe('Compute');
    expect(sortChoiceName('Compute', { key: 'name', order: 'asc' }, 'cpu')).toBe('Compute');
    expect(sortChoiceName('Compute', { key: 'cpu', order: 'desc' }, 'cpu')).toBe('Compute, descending');
  });
});
