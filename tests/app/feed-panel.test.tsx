// The calendar subscription panel: loading, the address with copy, the staff and tenant explanations, replacing
// the address only after a confirmation (DELETE, then GET for the new one), the error and no-role states.
import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { CalendarFeedPanel } from '@/components/security/calendar-feed-panel';
import type { Me } from '@/shared/api';
import { clearQueries, engineer, renderWithQueries, routedFetch, type Reply } from './window-test-kit';

// The native test preset has no browser navigator; a test that needs a clipboard gives it one.
const host = globalThis as { navigator?: unknown };
const originalNavigator = host.navigator;
function setClipboard(writeText: ((text: string) => Promise<void>) | null) {
  host.navigator = writeText ? { clipboard: { writeText } } : {};
}
afterEach(() => {
  clearQueries();
  host.navigator = originalNavigator;
});

const OLD = 'http://127.0.0.1:8080/api/calendar-feeds/AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA.ics';
const NEW = 'http://127.0.0.1:8080/api/calendar-feeds/BBBBBBBBBBBBBBBBBBBBBBBBBBBBBBBBBBBBBBBBBBB.ics';
const tenantUser: Me = { id: 'u-ten', email: 'tenant@demo.test', name: 'Tia Tenant', roles: ['tenant'], tenantId: 'ten-1' };
const nobody: Me = { id: 'u-none', email: 'none@demo.test', name: 'No Roles', roles: [], tenantId: null };

function serve(me: Me, feed: () => Reply, onDelete: () => void = () => undefined) {
  return routedFetch([
    { method: 'GET', path: /\/api\/me$/, reply: () => ({ status: 200, body: { ...me, timeZone: 'UTC' } }) },
    { method: 'GET', path: /\/api\/me\/calendar-feed$/, reply: feed },
    { method: 'DELETE', path: /\/api\/me\/calendar-feed$/, reply: () => { onDelete(); return { status: 204, body: null }; } },
  ]);
}
const feedReply = (url: string): Reply => ({ status: 200, body: { url, createdAt: '2030-01-10T08:00:00.000Z' } });

test('shows loading, then the address to select, when it was made, and what a staff feed holds', async () => {
  serve(engineer, () => feedReply(OLD));
  renderWithQueries(<CalendarFeedPanel />);
  expect(screen.getByTestId('calendar-feed-loading')).toBeTruthy();
  expect(await screen.findByTestId('calendar-feed-url')).toHaveTextContent(OLD);
  expect(screen.getByTestId('calendar-feed-made')).toHaveTextContent(/Address made Thu 10 Jan, 08:00 UTC/);
  expect(screen.getByTestId('calendar-feed')).toHaveTextContent(/every maintenance window with its state/);
  expect(screen.getByTestId('calendar-feed')).toHaveTextContent(/keep it like a password/);
});

test('a tenant reads that the feed holds the planned work on its slices in the words of the notices', async () => {
  serve(tenantUser, () => feedReply(OLD));
  renderWithQueries(<CalendarFeedPanel />);
  await screen.findByTestId('calendar-feed-url');
  expect(screen.getByTestId('calendar-feed')).toHaveTextContent(/planned work on your slices, in the words of our notices/);
  expect(screen.getByTestId('calendar-feed')).not.toHaveTextContent(/every maintenance window/);
});

test('copy puts the address on the clipboard and says so; without a clipboard it asks to copy by hand', async () => {
  const writeText = jest.fn(async () => undefined);
  setClipboard(writeText);
  serve(engineer, () => feedReply(OLD));
  renderWithQueries(<CalendarFeedPanel />);
  fireEvent.press(await screen.findByTestId('calendar-feed-copy'));
  expect(await screen.findByTestId('calendar-feed-note')).toHaveTextContent('Address copied.');
  expect(writeText).toHaveBeenCalledWith(OLD);
  setClipboard(null);
  fireEvent.press(screen.getByTestId('calendar-feed-copy'));
  await waitFor(() => expect(screen.getByTestId('calendar-feed-note')).toHaveTextContent(/select the address above and copy it yourself/));
});

test('replacing asks first and says the old address stops; keeping sends nothing, replacing shows the new one', async () => {
  let current = OLD;
  const { calls } = serve(engineer, () => feedReply(current), () => { current = NEW; });
  renderWithQueries(<CalendarFeedPanel />);
  await screen.findByTestId('calendar-feed-url');
  fireEvent.press(screen.getByTestId('calendar-feed-replace'));
  expect(screen.getByTestId('calendar-feed-confirm')).toHaveTextContent(/stops working at once/);
  fireEvent.press(screen.getByTestId('calendar-feed-confirm-cancel'));
  expect(calls.filter((c) => c.method === 'DELETE')).toHaveLength(0);
  expect(screen.queryByTestId('calendar-feed-confirm')).toBeNull();
  fireEvent.press(screen.getByTestId('calendar-feed-replace'));
  fireEvent.press(screen.getByTestId('calendar-feed-confirm-submit'));
  await waitFor(() => expect(screen.getByTestId('calendar-feed-url')).toHaveTextContent(NEW));
  const feedCalls = calls.filter((c) => c.url.endsWith('/api/me/calendar-feed')).map((c) => c.method);
  expect(feedCalls).toEqual(['GET', 'DELETE', 'GET']);
});

test('a failed load says why and tries again on request', async () => {
  let fail = true;
  serve(engineer, () => (fail ? { status: 500, body: { error: { code: 'INTERNAL', message: 'Database unavailable.' } } } : feedReply(OLD)));
  renderWithQueries(<CalendarFeedPanel />);
  expect(await screen.findByTestId('calendar-feed-error')).toHaveTextContent(/could not be loaded: Database unavailable/);
  fail = false;
  fireEvent.press(screen.getByTestId('calendar-feed-retry'));
  expect(await screen.findByTestId('calendar-feed-url')).toHaveTextContent(OLD);
});

test('an account without a role that reads work has no feed and asks for none', async () => {
  const { calls } = serve(nobody, () => feedReply(OLD));
  renderWithQueries(<CalendarFeedPanel />);
  expect(await screen.findByTestId('calendar-feed-empty')).toHaveTextContent(/no calendar feed/);
  expect(calls.some((c) => c.url.endsWith('/api/me/calendar-feed'))).toBe(false);
});
