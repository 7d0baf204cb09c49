// The audit trail screen: entries read by name and in words with times in the viewer's zone and UTC, filters that
// ask the API for what was picked (days turned into the viewer's day boundaries), paging, the CSV link, the empty
// states, and the refusal for roles that may not read it.
import { act, fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import { Linking } from 'react-native';
import AuditScreen from '@/app/(main)/audit/index';
import { auditParams, NO_FILTERS, rangeProblem } from '@/components/audit/audit-filters';
import type { AuditEntry } from '@/shared/audit';
import { admin, clearQueries, engineer, renderWithQueries, routedFetch } from './window-test-kit';

const mockParams: { window?: string } = {};
jest.mock('expo-router', () => ({
  useLocalSearchParams: () => mockParams,
  Link: ({ href, children }: { href: unknown; children: ReactElementWithHref }) => require('react').cloneElement(children, { href }),
}));
type ReactElementWithHref = import('react').ReactElement<{ href?: unknown }>;

afterEach(() => { clearQueries(); delete mockParams.window; });

const entry = (id: number, extra: Partial<AuditEntry> = {}): AuditEntry => ({
  id: String(id), at: '2030-01-10T21:00:00.000Z', who: 'Ines Engineer', action: 'window.create', what: 'Booked a window',
  subject: { kind: 'Window', name: 'Fibre splice, Gullhaven ring', href: '/windows/w-17' }, changes: ['Status: Draft'], comment: null, ...extra,
});

const CHOICES = {
  people: [{ id: 'u-ines', name: 'Ines Engineer' }, { id: 'u-ada', name: 'Ada Approver' }],
  windows: [{ id: 'w-17', title: 'Fibre splice, Gullhaven ring' }],
  actions: [{ code: 'window.create', words: 'Booked a window' }, { code: 'signoff.decision', words: 'Decided on a plan' }],
};

function serve(me = admin, items: AuditEntry[] = [entry(2), entry(1, {
  who: 'Ada Approver', action: 'signoff.decision', what: 'Sent a plan back', changes: [], comment: 'After the regatta, please.',
})], total = items.length) {
  return routedFetch([
    { method: 'GET', path: /\/api\/me$/, reply: () => ({ status: 200, body: { ...me, timeZone: 'Europe/Oslo', timeZoneChosen: true } }) },
    { method: 'GET', path: /\/api\/audit\/choices$/, reply: () => ({ status: 200, body: CHOICES }) },
    { method: 'GET', path: /\/api\/audit\?page=2&/, reply: () => ({ status: 200, body: { items, total, page: 2, pageSize: 50 } }) },
    { method: 'GET', path: /\/api\/audit\?/, reply: () => ({ status: 200, body: { items, total, page: 1, pageSize: 50 } }) },
  ]);
}

const auditCalls = (calls: { url: string }[]) => calls.map((c) => c.url).filter((u) => u.startsWith('/api/audit?'));

test('each entry reads who by name, what in words, the window by name as a link, changes, comment and both times', async () => {
  serve();
  renderWithQueries(<AuditScreen />);
  const rows = await screen.findAllByTestId('audit-row');
  expect(rows).toHaveLength(2);
  const first = within(rows[0]);
  expect(first.getByTestId('audit-row-who')).toHaveTextContent('Ines Engineer');
  expect(first.getByTestId('audit-row-what')).toHaveTextContent('Booked a window');
  expect(first.getByTestId('audit-row-subject-link').props.href).toBe('/windows/w-17');
  expect(first.getByTestId('audit-row-subject')).toHaveTextContent('Window Fibre splice, Gullhaven ring');
  expect(first.getByTestId('audit-row-changes')).toHaveTextContent('• Status: Draft');
  // 21:00 UTC in January is 22:00 in Oslo (CET).
  expect(first.getByTestId('audit-row-when-local')).toHaveTextContent('Thu 10 Jan, 22:00 CET');
  expect(first.getByTestId('audit-row-when-utc')).toHaveTextContent('Thu 10 Jan, 21:00 UTC');
  expect(within(rows[1]).getByTestId('audit-row-comment')).toHaveTextContent('“After the regatta, please.”');
  expect(screen.getByTestId('audit-count')).toHaveTextContent('2 entries, newest first');
});

test('no id shows anywhere on the screen, not even in the filter lists', async () => {
  serve();
  renderWithQueries(<AuditScreen />);
  await screen.findAllByTestId('audit-row');
  fireEvent.press(screen.getByTestId('audit-filter-person'));
  fireEvent.press(screen.getByTestId('audit-filter-window'));
  const text = JSON.stringify(screen.toJSON());
  const shownText = [...text.matchAll(/"children":\["([^"]*)"\]/g)].map(([, t]) => t).join(' ');
  for (const id of ['u-ines', 'u-ada', 'w-17', 'window.create', 'signoff.decision']) expect([id, shownText.includes(id)]).toEqual([id, false]);
  expect(screen.getByTestId('audit-filter-person-option-u-ada')).toHaveTextContent('Ada Approver');
});

test('picking a window, a person and an action asks the API for exactly those, from page 1', async () => {
  const { calls } = serve();
  renderWithQueries(<AuditScreen />);
  await screen.findAllByTestId('audit-row');
  fireEvent.press(screen.getByTestId('audit-filter-window'));
  fireEvent.press(await screen.findByTestId('audit-filter-window-option-w-17'));
  fireEvent.press(screen.getByTestId('audit-filter-person'));
  fireEvent.press(screen.getByTestId('audit-filter-person-option-u-ada'));
  fireEvent.press(screen.getByTestId('audit-filter-action'));
  fireEvent.press(screen.getByTestId('audit-filter-action-option-signoff.decision'));
  await waitFor(() => expect(auditCalls(calls).at(-1)).toBe('/api/audit?window=w-17&person=u-ada&action=signoff.decision&page=1&pageSize=50'));
  expect(screen.getByTestId('audit-filter-person')).toHaveTextContent(/^Ada Approver/);
  fireEvent.press(screen.getByTestId('audit-filters-clear'));
  await waitFor(() => expect(auditCalls(calls).at(-1)).toBe('/api/audit?page=1&pageSize=50'));
});

test('an address naming a window opens with that window picked', async () => {
  mockParams.window = 'w-17';
  const { calls } = serve();
  renderWithQueries(<AuditScreen />);
  await screen.findAllByTestId('audit-row');
  expect(auditCalls(calls)[0]).toBe('/api/audit?window=w-17&page=1&pageSize=50');
  await waitFor(() => expect(screen.getByTestId('audit-filter-window')).toHaveTextContent(/^Fibre splice, Gullhaven ring/));
});

test('a range of days becomes the viewer’s day boundaries; a range the wrong way round is refused in words', () => {
  // Oslo is UTC+1 in January: its 10 January runs from 9 Jan 23:00 UTC to 10 Jan 23:00 UTC.
  expect(auditParams({ ...NO_FILTERS, fromDay: '2030-01-10', toDay: '2030-01-10' }, 'Europe/Oslo'))
    .toEqual({ from: '2030-01-09T23:00:00.000Z', to: '2030-01-10T23:00:00.000Z' });
  expect(auditParams(NO_FILTERS, 'UTC')).toEqual({});
  expect(rangeProblem({ ...NO_FILTERS, fromDay: '2030-01-11', toDay: '2030-01-10' })).toMatch(/last day comes before the first day/);
  expect(rangeProblem({ ...NO_FILTERS, fromDay: '2030-01-10', toDay: '2030-01-10' })).toBeNull();
});

test('the CSV link carries the filters shown', async () => {
  mockParams.window = 'w-17';
  serve();
  const open = jest.spyOn(Linking, 'openURL').mockResolvedValue(true);
  renderWithQueries(<AuditScreen />);
  await screen.findAllByTestId('audit-row');
  fireEvent.press(screen.getByTestId('audit-download-csv'));
  expect(open).toHaveBeenCalledWith('/api/audit?window=w-17&format=csv');
  open.mockRestore();
});

test('paging asks for the next page and says where the reader is', async () => {
  const { calls } = serve(admin, Array.from({ length: 50 }, (_, i) => entry(120 - i)), 120);
  renderWithQueries(<AuditScreen />);
  await screen.findAllByTestId('audit-row');
  expect(screen.getByTestId('audit-pager')).toHaveTextContent(/1–50 of 120/);
  fireEvent.press(screen.getByTestId('audit-pager-next'));
  await waitFor(() => expect(auditCalls(calls).at(-1)).toBe('/api/audit?page=2&pageSize=50'));
  await waitFor(() => expect(screen.getByTestId('audit-pager')).toHaveTextContent(/51–100 of 120/));
});

test('empty: nothing recorded, or nothing matching the filters, each said plainly', async () => {
  serve(admin, []);
  renderWithQueries(<AuditScreen />);
  expect(await screen.findByText('Nothing recorded yet')).toBeTruthy();
  expect(screen.getByTestId('audit-download-csv').props.accessibilityState.disabled).toBe(true);
  fireEvent.press(screen.getByTestId('audit-filter-action'));
  fireEvent.press(await screen.findByTestId('audit-filter-action-option-window.create'));
  expect(await screen.findByText('Nothing matches these filters')).toBeTruthy();
});

test('an engineer is told the trail is for admins and approvers, and the API is not asked', async () => {
  const { calls } = serve(engineer);
  renderWithQueries(<AuditScreen />);
  await waitFor(() => expect(calls.map((c) => c.url)).toContain('/api/me'));
  expect(await screen.findByText('The audit trail is for admins and approvers')).toBeTruthy();
  await act(async () => { await Promise.resolve(); });
  expect(auditCalls(calls)).toEqual([]);
});
