// The Security screen's session list: loading, then the sessions with "this device" and zoned times; ending another
// device; "Sign out everywhere" only after a confirmation; a clear error when the list cannot be loaded.
import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { SessionsPanel } from '@/components/security/sessions-panel';
import type { SessionInfo } from '@/shared/sessions';
import { clearQueries, renderWithQueries, routedFetch } from './window-test-kit';

afterEach(clearQueries);

const desk: SessionInfo = {
  id: 'a'.repeat(32), createdAt: '2030-01-10T08:00:00.000Z', lastActiveAt: '2030-01-12T09:30:00.000Z',
  expiresAt: '2030-01-19T09:30:00.000Z', current: true, userAgent: 'Firefox on Linux', address: '192.0.2.10',
};
const phone: SessionInfo = {
  id: 'b'.repeat(32), createdAt: '2030-01-05T18:00:00.000Z', lastActiveAt: '2030-01-06T07:15:00.000Z',
  expiresAt: '2030-01-13T07:15:00.000Z', current: false, userAgent: 'Safari on iOS', address: null,
};

test('lists my sessions with this device marked and times in the named zone', async () => {
  routedFetch([{ method: 'GET', path: /\/api\/me\/sessions$/, reply: () => ({ status: 200, body: { sessions: [phone, desk] } }) }]);
  renderWithQueries(<SessionsPanel timeZone="Europe/Oslo" onSignedOutEverywhere={jest.fn()} />);
  expect(screen.getByTestId('sessions-loading')).toBeTruthy();
  await screen.findByTestId('sessions-list');
  const deskRow = screen.getByTestId(`session-${desk.id}`);
  expect(deskRow).toHaveTextContent(/Firefox on Linux · 192\.0\.2\.10/);
  expect(deskRow).toHaveTextContent(/This device/);
  // 09:30 UTC is 10:30 in Oslo in January (CET, UTC+1).
  expect(deskRow).toHaveTextContent(/Last used Sat 12 Jan, 10:30 CET/);
  expect(screen.getByTestId(`session-${phone.id}`)).not.toHaveTextContent(/This device/);
  expect(screen.queryByTestId(`session-${desk.id}-end`)).toBeNull();
  expect(screen.getByTestId('sessions-list')).toHaveTextContent(/Times in Europe\/Oslo/);
});

test('signing another device out sends DELETE for that session and reloads the list', async () => {
  let listed = [phone, desk];
  const { calls } = routedFetch([
    { method: 'GET', path: /\/api\/me\/sessions$/, reply: () => ({ status: 200, body: { sessions: listed } }) },
    { method: 'DELETE', path: /\/api\/me\/sessions\/b+$/, reply: () => { listed = [desk]; return { status: 204, body: null }; } },
  ]);
  renderWithQueries(<SessionsPanel timeZone="UTC" onSignedOutEverywhere={jest.fn()} />);
  fireEvent.press(await screen.findByTestId(`session-${phone.id}-end`));
  await waitFor(() => expect(calls.map((c) => c.method)).toEqual(['GET', 'DELETE', 'GET']));
  expect(calls[1].url).toMatch(new RegExp(`/api/me/sessions/${phone.id}$`));
  await waitFor(() => expect(screen.queryByTestId(`session-${phone.id}`)).toBeNull());
  expect(screen.getByTestId(`session-${desk.id}`)).toBeTruthy();
});

test('"Sign out everywhere" asks first; cancel sends nothing, confirming ends every session', async () => {
  const onSignedOutEverywhere = jest.fn();
  const { calls } = routedFetch([
    { method: 'GET', path: /\/api\/me\/sessions$/, reply: () => ({ status: 200, body: { sessions: [desk] } }) },
    { method: 'POST', path: /\/api\/me\/sessions\/revoke-all$/, reply: () => ({ status: 200, body: { ended: 2 } }) },
  ]);
  renderWithQueries(<SessionsPanel timeZone="UTC" onSignedOutEverywhere={onSignedOutEverywhere} />);
  await screen.findByTestId('sessions-list');
  fireEvent.press(screen.getByTestId('sessions-sign-out-everywhere'));
  fireEvent.press(screen.getByTestId('sessions-confirm-cancel'));
  expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  fireEvent.press(screen.getByTestId('sessions-sign-out-everywhere'));
  expect(screen.getByTestId('sessions-confirm')).toHaveTextContent(/this one included/);
  fireEvent.press(screen.getByTestId('sessions-confirm-submit'));
  await waitFor(() => expect(onSignedOutEverywhere).toHaveBeenCalled());
  expect(calls.filter((c) => c.method === 'POST' && c.url.endsWith('/api/me/sessions/revoke-all'))).toHaveLength(1);
});

test('a failed load says what could not be loaded and offers a retry; an empty list says so', async () => {
  let fail = true;
  routedFetch([{
    method: 'GET', path: /\/api\/me\/sessions$/,
    reply: () => (fail ? { status: 500, body: { error: { code: 'INTERNAL', message: 'Something went wrong on the server.' } } }
      : { status: 200, body: { sessions: [] } }),
  }]);
  renderWithQueries(<SessionsPanel timeZone="UTC" onSignedOutEverywhere={jest.fn()} />);
  expect(await screen.findByTestId('sessions-error')).toHaveTextContent(/Your sessions could not be loaded/);
  fail = false;
  fireEvent.press(screen.getByText('Try again'));
  expect(await screen.findByTestId('sessions-empty')).toHaveTextContent('No open sessions.');
});
