// The signed-in frame for keyboard and screen-reader users: landmarks, the skip link, the announcement of the page
// moved to, and focus on the new page's h1 after a move.
import type { ReactElement } from 'react';
import { fireEvent, renderHook, screen, within } from '@testing-library/react-native';
import { Text } from 'react-native';
import type { Me } from '@/shared/api';
import { AppShell } from '@/components/shell/app-shell';
import { WIDE_LAYOUT_MIN_WIDTH_PX } from '@/constants/theme';
import { usePageTitle } from '@/components/page-title';
import { findPageHeading, useFocusHeadingOnNavigation, type HeadingNode } from '@/components/shell/navigation-focus';
import { clearQueries, renderWithQueries } from './window-test-kit';

jest.mock('expo-router', () => ({
  Link: ({ children }: { children: ReactElement }) => children,
}));
jest.mock('react-native-safe-area-context', () => require('react-native-safe-area-context/jest/mock').default);

let mockWidthPx = 390;
jest.mock('react-native/Libraries/Utilities/useWindowDimensions', () => ({
  __esModule: true,
  default: () => ({ width: mockWidthPx, height: 844, scale: 2, fontScale: 1 }),
}));

const planner: Me = { id: 'u-pl', email: 'planner@demo.test', name: 'Pat Planner', roles: ['planner'], tenantId: null };

function Page({ title }: { title: string }) {
  usePageTitle(title);
  return <Text>{title} content</Text>;
}

const shell = (pathname: string, title: string) => (
  <AppShell user={planner} pathname={pathname} onSignOut={() => undefined} signingOut={false}>
    <Page title={title} />
  </AppShell>
);

afterEach(clearQueries);
beforeEach(() => { mockWidthPx = 390; });

test.each([390, 1280])('at %i px: skip link first, then a named navigation landmark and the main landmark', (width) => {
  mockWidthPx = width;
  const { toJSON } = renderWithQueries(shell('/', 'Overview'));
  const main = screen.getByTestId('main-content');
  expect(main).toHaveProp('role', 'main');
  expect(main).toHaveProp('tabIndex', -1);
  expect(within(main).getByText('Overview content')).toBeTruthy();
  const nav = screen.getByTestId(width >= WIDE_LAYOUT_MIN_WIDTH_PX ? 'side-rail' : 'bottom-tabs');
  expect(nav).toHaveProp('role', 'navigation');
  expect(nav).toHaveProp('aria-label', 'Main');
  // The skip link is the first thing in the frame, so the first Tab stop.
  const tree = toJSON() as { children: { props: { testID?: string } }[] };
  expect(tree.children[0].props.testID).toBe('skip-link');
  expect(screen.getByTestId('skip-link')).toHaveTextContent('Skip to content');
  expect(screen.getByTestId('skip-link')).toHaveProp('role', 'link');
});

test('the phone bar holds links, the current area marked as the page, and no tabs', () => {
  renderWithQueries(shell('/calendar', 'Calendar'));
  const bar = within(screen.getByTestId('bottom-tabs'));
  expect(bar.queryAllByRole('tab')).toHaveLength(0);
  expect(bar.getByTestId('nav-calendar')).toHaveProp('aria-current', 'page');
  expect(bar.getByTestId('nav-overview').props['aria-current']).toBeUndefined();
  expect(bar.getAllByRole('link').length).toBeGreaterThanOrEqual(4);
});

test('the skip link moves focus to the main content', () => {
  renderWithQueries(shell('/', 'Overview'));
  // The test renderer's host View carries native methods as mocks; find the one behind the main landmark.
  let node = screen.getByTestId('main-content').parent;
  while (node && typeof (node.instance as { focus?: unknown } | null)?.focus !== 'function') node = node.parent;
  const focus = (node?.instance as { focus: jest.Mock }).focus;
  focus.mockClear();
  // On the web it is an <a href="#main-content"> (Enter activates it); the fragment is not followed.
  expect(screen.getByTestId('skip-link')).toHaveProp('href', '#main-content');
  const preventDefault = jest.fn();
  fireEvent.press(screen.getByTestId('skip-link'), { preventDefault });
  expect(focus).toHaveBeenCalledTimes(1);
  expect(preventDefault).toHaveBeenCalledTimes(1);
});

test('the live region stays quiet on the first page and says the title of each page moved to', () => {
  const { rerender } = renderWithQueries(shell('/', 'Overview'));
  const region = () => screen.getByTestId('nav-live-region');
  expect(region()).toHaveProp('aria-live', 'polite');
  expect(region()).toHaveTextContent('');
  rerender(shell('/calendar', 'Calendar'));
  expect(region()).toHaveTextContent('Calendar');
  rerender(shell('/slices/s-1', 'Slice: Factory floor'));
  expect(region()).toHaveTextContent('Slice: Factory floor');
});

// A stand-in for the DOM under the main landmark: h1 elements, shown or hidden, that record focus.
function fakeHeading(shown = true) {
  const attributes = new Map<string, string>();
  const heading = {
    focus: jest.fn(),
    hasAttribute: (name: string) => attributes.has(name),
    setAttribute: (name: string, value: string) => void attributes.set(name, value),
    getClientRects: () => ({ length: shown ? 1 : 0 }),
    attributes,
  };
  return heading;
}
function fakeRoot(headings: HeadingNode[]) {
  return { headings, querySelectorAll: (selector: string) => (selector === 'h1' ? headings : []) };
}

test('after a move, focus goes to the shown h1 (made focusable by script only); the first page keeps focus', () => {
  const hidden = fakeHeading(false);
  const shown = fakeHeading();
  const root = fakeRoot([hidden, shown]);
  const getRoot = () => root;
  const { rerender, result } = renderHook(({ path }: { path: string }) => useFocusHeadingOnNavigation(path, getRoot), { initialProps: { path: '/' } });
  expect(shown.focus).not.toHaveBeenCalled();
  expect(result.current).toBe(false);
  rerender({ path: '/slices/s-1' });
  expect(shown.focus).toHaveBeenCalledTimes(1);
  expect(hidden.focus).not.toHaveBeenCalled();
  expect(shown.attributes.get('tabindex')).toBe('-1');
  expect(result.current).toBe(true);
  // Re-rendering on the same page does not steal focus again.
  rerender({ path: '/slices/s-1' });
  expect(shown.focus).toHaveBeenCalledTimes(1);
});

test('a page still loading gets focus on its h1 once the h1 appears', () => {
  const observers: { callback: () => void; disconnected: boolean }[] = [];
  const original = (global as { MutationObserver?: unknown }).MutationObserver;
  (global as { MutationObserver?: unknown }).MutationObserver = class {
    entry: { callback: () => void; disconnected: boolean };
    constructor(callback: () => void) { this.entry = { callback, disconnected: false }; observers.push(this.entry); }
    observe() { /* the test calls the callback itself */ }
    disconnect() { this.entry.disconnected = true; }
  };
  try {
    const root = fakeRoot([]);
    const getRoot = () => root;
    const { rerender } = renderHook(({ path }: { path: string }) => useFocusHeadingOnNavigation(path, getRoot), { initialProps: { path: '/' } });
    rerender({ path: '/windows/w-1' });
    expect(observers).toHaveLength(1);
    const heading = fakeHeading();
    root.headings.push(heading);
    observers[0].callback();
    expect(heading.focus).toHaveBeenCalledTimes(1);
    expect(observers[0].disconnected).toBe(true);
  } finally {
    (global as { MutationObserver?: unknown }).MutationObserver = original;
  }
});

test('findPageHeading skips an h1 in a hidden pane and finds none when there is none', () => {
  expect(findPageHeading(fakeRoot([fakeHeading(false)]))).toBeNull();
  const shown = fakeHeading();
  expect(findPageHeading(fakeRoot([fakeHeading(false), shown]))).toBe(shown);
});
