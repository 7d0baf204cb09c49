// The phone bottom bar: at most five places, a More button listing the remaining areas, and those areas still navigate.
import type { ReactElement } from 'react';
import { fireEvent, screen, within } from '@testing-library/react-native';
import { Text } from 'react-native';
import type { Me } from '@/shared/api';
import { AppShell } from '@/components/shell/app-shell';
import { NAV_AREAS, areasFor } from '@/components/shell/nav-areas';
import { clearQueries, renderWithQueries } from './window-test-kit';

// Link stands in for expo-router's: pressing its child runs Link's onPress, then "navigates" by recording href.
const mockPush = jest.fn();
jest.mock('expo-router', () => ({
  Link: ({ href, children, onPress }: { href: string; children: ReactElement<{ onPress?: () => void }>; onPress?: () => void }) =>
    require('react').cloneElement(children, { onPress: () => { onPress?.(); mockPush(href); } }),
}));
jest.mock('react-native-safe-area-context', () => require('react-native-safe-area-context/jest/mock').default);

let mockWidthPx = 390;
jest.mock('react-native/Libraries/Utilities/useWindowDimensions', () => ({
  __esModule: true,
  default: () => ({ width: mockWidthPx, height: 844, scale: 2, fontScale: 1 }),
}));

const planner: Me = { id: 'u-pl', email: 'planner@demo.test', name: 'Pat Planner', roles: ['planner'], tenantId: null };
const tenant: Me = { id: 'u-te', email: 'tenant@demo.test', name: 'Tia Tenant', roles: ['tenant'], tenantId: 't1' };

function renderShell(user: Me, pathname = '/') {
  // The shell reads the sign-off badge through the query client (disabled for these non-approvers).
  renderWithQueries(
    <AppShell user={user} pathname={pathname} onSignOut={() => undefined} signingOut={false}>
      <Text>page</Text>
    </AppShell>,
  );
}

function tabKeys(): string[] {
  const bar = within(screen.getByTestId('bottom-tabs'));
  return [...bar.queryAllByRole('link'), ...bar.queryAllByRole('button')].map((place) => String(place.props.testID));
}

afterEach(clearQueries);

beforeEach(() => {
  mockPush.mockReset();
  mockWidthPx = 390;
});

test('a planner on a phone gets four areas plus More; More lists the rest, and one of them navigates', () => {
  renderShell(planner);
  const tabs = tabKeys();
  expect(tabs.length).toBeLessThanOrEqual(5);
  expect(tabs).toEqual(['nav-overview', 'nav-calendar', 'nav-network', 'nav-map', 'nav-more']);
  expect(screen.queryByTestId('nav-more-sheet')).toBeNull();
  expect(screen.queryByTestId('nav-imports')).toBeNull();

  fireEvent.press(screen.getByTestId('nav-more'));
  const sheet = screen.getByTestId('nav-more-sheet');
  // Planner holds every area: the sheet shows exactly those not in the bar.
  for (const key of ['slices', 'freezes', 'imports']) expect(within(sheet).getByTestId(`nav-${key}`)).toBeTruthy();
  expect(within(sheet).queryByTestId('nav-overview')).toBeNull();

  fireEvent.press(within(sheet).getByTestId('nav-imports'));
  expect(mockPush).toHaveBeenCalledWith('/imports');
  expect(screen.queryByTestId('nav-more-sheet')).toBeNull();
});

test('inside an area More holds, that area is the current page in the sheet; the backdrop and Close close it', () => {
  renderShell(planner, '/freezes');
  expect(screen.getByTestId('nav-more')).toBeCollapsed();
  expect(screen.getByTestId('nav-overview').props['aria-current']).toBeUndefined();
  fireEvent.press(screen.getByTestId('nav-more'));
  expect(screen.getByTestId('nav-more')).toBeExpanded();
  const sheet = screen.getByTestId('nav-more-sheet');
  expect(within(sheet).getByTestId('nav-freezes')).toHaveProp('aria-current', 'page');
  expect(within(sheet).getByTestId('nav-imports').props['aria-current']).toBeUndefined();
  // The backdrop is hidden from assistive technology (Close and Escape serve them), so the query looks past that.
  fireEvent.press(screen.getByTestId('nav-more-backdrop', { includeHiddenElements: true }));
  expect(screen.queryByTestId('nav-more-sheet')).toBeNull();
  fireEvent.press(screen.getByTestId('nav-more'));
  fireEvent.press(screen.getByTestId('nav-more-close'));
  expect(screen.queryByTestId('nav-more-sheet')).toBeNull();
  expect(mockPush).not.toHaveBeenCalled();
});

test('a tenant user has six areas: Notices takes a place in the bar, the rest wait behind More', () => {
  renderShell(tenant);
  expect(tabKeys()).toEqual(['nav-overview', 'nav-notices', 'nav-calendar', 'nav-network', 'nav-more']);
  fireEvent.press(screen.getByTestId('nav-more'));
  const sheet = screen.getByTestId('nav-more-sheet');
  for (const key of ['map', 'slices']) expect(within(sheet).getByTestId(`nav-${key}`)).toBeTruthy();
});

test('the side rail on a wide screen keeps every area the user may open and has no More', () => {
  mockWidthPx = 1280;
  renderShell(planner);
  expect(screen.queryByTestId('bottom-tabs')).toBeNull();
  const open = areasFor(planner.roles);
  for (const { key } of open) expect(screen.getByTestId(`nav-${key}`)).toBeTruthy();
  // Areas for other roles (e.g. the admin's Outbox) stay out of the planner's rail.
  for (const { key } of NAV_AREAS.filter((a) => !open.includes(a))) expect(screen.queryByTestId(`nav-${key}`)).toBeNull();
  expect(screen.queryByTestId('nav-more')).toBeNull();
});
