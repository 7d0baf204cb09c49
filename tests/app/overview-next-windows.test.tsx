// The overview's list of next windows says how many rows it shows and which of them the 30-day tile counts.
import type { ReactElement } from 'react';
import { fireEvent, screen } from '@testing-library/react-native';
import { NextWindows } from '@/components/overview/next-windows';
import { nextWindowsCaption } from '@/components/overview/next-windows-caption';
import { clearQueries, renderWithQueries, routedFetch } from './window-test-kit';

const mockPush = jest.fn();
jest.mock('expo-router', () => ({
  Link: ({ href, children }: { href: unknown; children: ReactElement<{ onPress?: () => void }> }) =>
    require('react').cloneElement(children, { href, onPress: () => mockPush(href) }),
}));

beforeEach(() => { routedFetch([]); mockPush.mockReset(); });
afterEach(clearQueries);

const NOW = new Date('2030-03-01T12:00:00Z');
const at = (days: number) => new Date(NOW.getTime() + days * 86_400_000).toISOString();
const win = (id: string, startDays: number) => ({ id, title: `Window ${id}`, startsAt: at(startDays), endsAt: at(startDays + 0.2), status: 'planned' });

const rows = [win('a', -0.1), win('b', 2), win('c', 10), win('d', 29), win('e', 45)];

test('five rows above a tile of 3: the caption accounts for every row', () => {
  renderWithQueries(<NextWindows windows={rows} inHorizon={3} now={NOW} />);
  expect(screen.getByTestId('overview-next-windows-caption'))
    .toHaveTextContent('5 windows shown, soonest first: 1 under way, 3 starting in the next 30 days, 1 later');
  expect(screen.getAllByTestId(/^next-window-/)).toHaveLength(5);
});

test('when more start within 30 days than the list holds, it says how many in all', () => {
  expect(nextWindowsCaption(rows.slice(1, 4), 7, NOW))
    .toBe('3 windows shown, soonest first: 3 starting in the next 30 days (7 start in the next 30 days in all; the calendar shows every one)');
});

test('each row is a link that opens its window, its stage in words', () => {
  renderWithQueries(<NextWindows windows={[{ ...rows[1], status: 'in-review' }]} inHorizon={1} now={NOW} />);
  const row = screen.getByTestId('next-window-b');
  expect(row.props.role).toBe('link');
  expect(row.props.href).toEqual({ pathname: '/windows/[id]', params: { id: 'b' } });
  expect(row).toHaveTextContent(/Window b.*In review/);
  fireEvent.press(row);
  expect(mockPush).toHaveBeenCalledWith({ pathname: '/windows/[id]', params: { id: 'b' } });
});

test('the rows form a list named like the panel, one list item per window', () => {
  renderWithQueries(<NextWindows windows={rows} inHorizon={3} now={NOW} />);
  const list = screen.getByTestId('overview-next-windows-list');
  expect(list.props.role).toBe('list');
  expect(list.props['aria-label']).toBe('Next windows');
  const items = list.findAll((n) => typeof n.type === 'string' && n.props.role === 'listitem');
  expect(items).toHaveLength(rows.length);
});
