// The slot finder on screen: the form's checks, the running search's progress, the ranked list with its figures and
// Book buttons, the excluded slots folded by reason, the empty answer, and the booking form filled from a slot.
import type { ReactElement } from 'react';
import { act, fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import { SlotFinder } from '@/components/slots/slot-finder';
import { SlotResults } from '@/components/slots/slot-results';
import { SearchProgressView } from '@/components/slots/search-progress';
import NewWindowScreen from '@/app/(main)/windows/new';
import { clearQueries, engineer, renderWithQueries, routedFetch } from './window-test-kit';
import { candidate, excluded, search } from './slot-kit';

const mockParams: Record<string, string> = {};
jest.mock('expo-router', () => ({
  Link: ({ children }: { children: ReactElement }) => children,
  useRouter: () => ({ push: jest.fn(), replace: jest.fn(), back: jest.fn(), canGoBack: () => false, setParams: jest.fn() }),
  useLocalSearchParams: () => mockParams,
  usePathname: () => '/windows/new',
}));

afterEach(() => {
  clearQueries();
  for (const key of Object.keys(mockParams)) delete mockParams[key];
});

const NOW_MS = Date.parse('2030-01-07T12:00:00.000Z');

test('the form lists what blocks the search and sends nothing until it is fixed', () => {
  const { calls } = routedFetch([]);
  renderWithQueries(<SlotFinder timeZone="UTC" searchId={null} onSearchId={jest.fn()} onOpen={jest.fn()} now={() => NOW_MS} />);
  expect(screen.getByTestId('slot-zone')).toHaveTextContent(/network's zone/);
  fireEvent.changeText(screen.getByTestId('slot-duration'), '');
  fireEvent.press(screen.getByTestId('slot-submit'));
  const summary = screen.getByTestId('slot-form-errors');
  expect(within(summary).getByText(/Pick at least one site or span/)).toBeTruthy();
  expect(within(summary).getByText(/how many hours the work takes/)).toBeTruthy();
  expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
});

test('while the search runs, the bar says how many slots are checked and the seconds taken; the list replaces it', async () => {
  let reply = search({ status: 'running', progress: { phase: 'evaluating', done: 30, total: 120, elapsedMs: 4200 } });
  routedFetch([{ method: 'GET', path: /\/api\/slot-searches\/s-1$/, reply: () => ({ status: 200, body: reply }) }]);
  renderWithQueries(<SlotFinder timeZone="UTC" searchId="s-1" onSearchId={jest.fn()} onOpen={jest.fn()} />);
  const bar = await screen.findByTestId('slot-progress-bar');
  expect(bar).toHaveProp('role', 'progressbar');
  expect(bar).toHaveProp('aria-label', 'Slots checked so far');
  expect(bar).toHaveProp('aria-valuenow', 25);
  expect(screen.getByTestId('slot-progress-text')).toHaveTextContent('30 of 120 slots checked');
  expect(screen.getByTestId('slot-progress-elapsed')).toHaveTextContent('Time taken: 4 s');
  reply = search({ candidates: [candidate()] });
  // The query polls every 500 ms while the search runs.
  await waitFor(() => expect(screen.getByTestId('slot-results')).toBeTruthy(), { timeout: 3000 });
  expect(screen.queryByTestId('slot-progress')).toBeNull();
});

test('usable slots show in rank order with their figures and units; Book opens the form filled with that slot', () => {
  const onBook = jest.fn();
  const s = search({
    candidates: [
      candidate({ rank: 2, start: '2030-01-12T01:00:00.000Z', end: '2030-01-12T05:00:00.000Z', explanation: 'Second best.', criticalTouched: 1 }),
      candidate({ rank: 1, explanation: 'Best: all slices kept.' }),
      excluded('FREEZE', '2030-01-08T01:00:00.000Z', 'Inside the freeze “Year end”.'),
      excluded('CRITICAL_STRANDED', '2030-01-09T01:00:00.000Z', 'Harbour ambulance slice would have no path.'),
    ],
  });
  renderWithQueries(<SlotResults search={s} timeZone="Europe/Oslo" onBook={onBook} />);
  const items = screen.getAllByTestId(/^slot-candidate-\d$/);
  expect(items.map((i) => i.props.testID)).toEqual(['slot-candidate-1', 'slot-candidate-2']);
  expect(screen.getByTestId('slot-candidate-1-explanation')).toHaveTextContent('Best: all slices kept.');
  expect(screen.getByTestId('slot-candidate-1-when-local')).toHaveTextContent('Thu 10 Jan, 02:00 – 06:00 CET');
  expect(screen.getByTestId('slot-candidate-1-when-utc')).toHaveTextContent('Thu 10 Jan, 01:00 – 05:00 UTC');
  expect(screen.getByTestId('slot-candidate-1-touched')).toHaveTextContent('Touched slices4 slices');
  expect(screen.getByTestId('slot-candidate-1-risk')).toHaveTextContent(/0\.40 % \(slices up to Low severity, on the slice severity scale\)$/);
  expect(screen.getByTestId('slot-candidate-1-notice')).toHaveTextContent(/6 days to spare for notices$/);
  expect(screen.getByTestId('slot-critical-caution')).toBeTruthy();
  fireEvent.press(screen.getByTestId('slot-book-2'));
  expect(onBook).toHaveBeenCalledWith(2);

  expect(screen.queryByTestId('slot-excluded-FREEZE')).toBeNull();
  fireEvent.press(screen.getByTestId('slot-excluded-toggle'));
  expect(screen.getByTestId('slot-excluded-toggle')).toHaveTextContent(/Excluded slots \(2\)/);
  expect(within(screen.getByTestId('slot-excluded-FREEZE')).getByText('Freeze (1)')).toBeTruthy();
  expect(within(screen.getByTestId('slot-excluded-CRITICAL_STRANDED')).getByText('A critical slice would be cut off (1)')).toBeTruthy();
  expect(screen.getByText('Harbour ambulance slice would have no path.')).toBeTruthy();
});

test('with no usable slot the answer says why in words and what to widen', () => {
  const s = search({ candidates: [excluded('LEAD_TIME', '2030-01-08T01:00:00.000Z', 'Harbour Health needs 7 days’ notice.')] });
  renderWithQueries(<SlotResults search={s} timeZone="UTC" onBook={jest.fn()} />);
  const empty = screen.getByTestId('slot-results-empty');
  expect(within(empty).getByText('Every possible slot is excluded: too late to give notice (1 slot).')).toBeTruthy();
  expect(within(empty).getByText(/wider range of nights, longer allowed hours/)).toBeTruthy();
});

test('the progress view waits in words while queued', () => {
  renderWithQueries(<SearchProgressView status="queued" progress={null} label="Slots checked so far" testID="slot-progress" />);
  expect(screen.getByTestId('slot-progress-text')).toHaveTextContent('Waiting for a worker to pick the search up…');
  expect(screen.getByTestId('slot-progress-bar')).toHaveProp('aria-valuenow', 0);
});

test('the booking form opened from a slot is filled and says so', async () => {
  Object.assign(mockParams, { start: '2030-01-10T01:00:00.000Z', end: '2030-01-10T05:00:00.000Z', sites: 'cell-pellow-sands' });
  routedFetch([
    { method: 'GET', path: /^\/api\/me$/, reply: () => ({ status: 200, body: { ...engineer, timeZone: 'UTC' } }) },
    { method: 'GET', path: /./, reply: () => new Promise(() => undefined) },
  ]);
  renderWithQueries(<NewWindowScreen />);
  expect(await screen.findByText('Filled from the slot finder')).toBeTruthy();
  await act(async () => undefined);
  expect(screen.getByTestId('window-start-date').props.value).toBe('2030-01-10');
  expect(screen.getByTestId('window-start-time').props.value).toBe('01:00');
  expect(screen.getByTestId('window-end-time').props.value).toBe('05:00');
  expect(screen.getByTestId('window-picked-cell-pellow-sands')).toBeTruthy();
});

test('the booking form opened plainly has no note', async () => {
  routedFetch([
    { method: 'GET', path: /^\/api\/me$/, reply: () => ({ status: 200, body: engineer }) },
    { method: 'GET', path: /./, reply: () => new Promise(() => undefined) },
  ]);
  renderWithQueries(<NewWindowScreen />);
  expect(await screen.findByTestId('window-title')).toBeTruthy();
  expect(screen.queryByTestId('window-prefill-note')).toBeNull();
  expect(screen.getByTestId('window-find-slot')).toBeTruthy();
});
