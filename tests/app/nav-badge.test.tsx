// The sign-off badge: an approver's tab (phone) and rail item (wide) show how many windows wait for their decision,
// with a spoken label; nothing waiting, or not an approver, means no badge.
import type { ReactElement } from 'react';
import { act, screen, waitFor } from '@testing-library/react-native';
import { Text } from 'react-native';
import type { Me } from '@/shared/api';
import { AppShell } from '@/components/shell/app-shell';
import { clearQueries, renderWithQueries, routedFetch } from './window-test-kit';

jest.mock('expo-router', () => ({
  Link: ({ children }: { children: ReactElement }) => children,
}));
jest.mock('react-native-safe-area-context', () => require('react-native-safe-area-context/jest/mock').default);

let mockWidthPx = 390;
jest.mock('react-native/Libraries/Utilities/useWindowDimensions', () => ({
  __esModule: true,
  default: () => ({ width: mockWidthPx, height: 844, scale: 2, fontScale: 1 }),
}));

const approver: Me = { id: 'u-ap', email: 'approver@demo.test', name: 'Jonas Weller', roles: ['approver'], tenantId: null };
const planner: Me = { id: 'u-pl', email: 'planner@demo.test', name: 'Pat Planner', roles: ['planner'], tenantId: null };

function renderShell(user: Me, waiting: number) {
  const fetched = routedFetch([{ method: 'GET', path: /^\/api\/signoff\/waiting-count$/, reply: () => ({ status: 200, body: { waiting } }) }]);
  renderWithQueries(
    <AppShell user={user} pathname="/" onSignOut={() => undefined} signingOut={false}>
      <Text>page</Text>
    </AppShell>,
  );
  return fetched;
}

afterEach(clearQueries);
beforeEach(() => { mockWidthPx = 390; });

test('phone: the sign-off tab carries the count and says it in words', async () => {
  renderShell(approver, 3);
  const badge = await screen.findByTestId('nav-badge-sign-off');
  expect(badge).toHaveTextContent('3');
  // The name starts with what the tab shows ("Sign-off 3"), then says it in words.
  expect(screen.getByTestId('nav-sign-off').props.accessibilityLabel).toBe('Sign-off 3, 3 decisions waiting');
});

test('wide: the rail item carries it too, one decision in the singular', async () => {
  mockWidthPx = 1280;
  renderShell(approver, 1);
  expect(await screen.findByTestId('nav-badge-sign-off')).toHaveTextContent('1');
  expect(screen.getByTestId('nav-sign-off').props.accessibilityLabel).toBe('Sign-off 1, 1 decision waiting');
  expect(screen.getByTestId('side-rail')).toBeTruthy();
});

test('a large count is capped on the badge but not in the label', async () => {
  renderShell(approver, 120);
  const badge = await screen.findByTestId('nav-badge-sign-off');
  expect(badge).toHaveTextContent('99+');
  expect(screen.getByTestId('nav-sign-off').props.accessibilityLabel).toBe('Sign-off 99+, 120 decisions waiting');
});

test('nothing waiting: no badge, and the tab keeps its plain name', async () => {
  const { calls } = renderShell(approver, 0);
  await waitFor(() => expect(calls.map((c) => c.url)).toEqual(['/api/signoff/waiting-count']));
  await act(() => new Promise<void>((resolve) => setTimeout(resolve, 0)));
  expect(screen.queryByTestId('nav-badge-sign-off')).toBeNull();
  expect(screen.getByTestId('nav-sign-off').props.accessibilityLabel).toBe('Sign-off');
});

test('not an approver: the count is never asked for', () => {
  const { calls } = renderShell(planner, 4);
  expect(calls).toHaveLength(0);
  expect(screen.queryByTestId('nav-badge-sign-off')).toBeNull();
});
