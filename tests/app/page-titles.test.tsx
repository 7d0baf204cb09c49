// Every screen names itself: the browser tab reads "<page> — Slackwater", and the shell hears the same page title
// for its announcement. Screens are shown loading (the API never answers) unless a case gives them data.
import type { ComponentType, ReactElement } from 'react';
import { render, waitFor } from '@testing-library/react-native';
import { Text } from 'react-native';
import { documentTitle, PageTitleContext, titleWithName, usePageTitle } from '@/components/page-title';
import { clearQueries, engineer, renderWithQueries, routedFetch, windowFixture } from './window-test-kit';
import SignInScreen from '@/app/(auth)/sign-in';
import NotFoundScreen from '@/app/+not-found';
import OverviewScreen from '@/app/(main)/index';
import CalendarScreen from '@/app/(main)/calendar/index';
import FreezesScreen from '@/app/(main)/freezes/index';
import ImportsScreen from '@/app/(main)/imports/index';
import MapScreen from '@/app/(main)/map';
import NetworkIndexScreen from '@/app/(main)/network/index';
import SiteScreen from '@/app/(main)/network/sites/[id]';
import SpanScreen from '@/app/(main)/network/spans/[id]';
import NoticesIndexScreen from '@/app/(main)/notices/index';
import NoticeScreen from '@/app/(main)/notices/[id]';
import OutboxIndexScreen from '@/app/(main)/outbox/index';
import OutboxMessageScreen from '@/app/(main)/outbox/[id]';
import SecurityScreen from '@/app/(main)/security/index';
import SignoffQueueScreen from '@/app/(main)/sign-off/index';
import SignoffWindowScreen from '@/app/(main)/sign-off/[windowId]';
import SignoffPolicyScreen from '@/app/(main)/sign-off/policy';
import SlicesIndexScreen from '@/app/(main)/slices/index';
import SliceScreen from '@/app/(main)/slices/[id]';
import NewWindowScreen from '@/app/(main)/windows/new';
import WindowScreen from '@/app/(main)/windows/[id]/index';
import EditWindowScreen from '@/app/(main)/windows/[id]/edit';
import WindowImpactScreen from '@/app/(main)/windows/[id]/impact';
import WindowPlansScreen from '@/app/(main)/windows/[id]/plans/index';
import PlanScreen from '@/app/(main)/windows/[id]/plans/[planId]';

const mockParams: Record<string, string> = { id: 'w-1', windowId: 'w-1', planId: 'p-1' };
jest.mock('expo-router', () => ({
  Link: ({ children }: { children: ReactElement }) => children,
  Redirect: () => null,
  Slot: () => null,
  useRouter: () => ({ push: jest.fn(), replace: jest.fn(), back: jest.fn(), canGoBack: () => false }),
  useLocalSearchParams: () => mockParams,
  usePathname: () => '/',
}));
jest.mock('react-native-safe-area-context', () => require('react-native-safe-area-context/jest/mock').default);

let heard: string[] = [];
const hear = (title: string) => void heard.push(title);

function renderScreen(Screen: ComponentType) {
  return renderWithQueries(<PageTitleContext.Provider value={hear}><Screen /></PageTitleContext.Provider>);
}

/** The API: who is signed in, one window, and nothing else answering (screens stay on their loading state). */
function api() {
  return routedFetch([
    { method: 'GET', path: /^\/api\/me$/, reply: () => ({ status: 200, body: engineer }) },
    { method: 'GET', path: /^\/api\/windows\/w-1$/, reply: () => ({ status: 200, body: windowFixture() }) },
    { method: 'GET', path: /./, reply: () => new Promise(() => undefined) },
  ]);
}

beforeEach(() => { heard = []; api(); });
afterEach(clearQueries);

test.each<[string, ComponentType, string]>([
  ['sign-in', SignInScreen, 'Sign in'],
  ['unknown address', NotFoundScreen, 'Page not found'],
  ['overview', OverviewScreen, 'Overview'],
  ['calendar', CalendarScreen, 'Calendar'],
  ['freezes', FreezesScreen, 'Freezes'],
  ['imports', ImportsScreen, 'Imports'],
  ['map', MapScreen, 'Map'],
  ['network', NetworkIndexScreen, 'Network'],
  ['a site, loading', SiteScreen, 'Site'],
  ['a span, loading', SpanScreen, 'Span'],
  ['planned work', NoticesIndexScreen, 'Planned work'],
  ['a notice, loading', NoticeScreen, 'Notice'],
  ['outbox', OutboxIndexScreen, 'Outbox'],
  ['an outbox message, loading', OutboxMessageScreen, 'Message'],
  ['security', SecurityScreen, 'Security'],
  ['sign-off queue', SignoffQueueScreen, 'Sign-off'],
  ['a sign-off, loading', SignoffWindowScreen, 'Sign-off'],
  ['sign-off policy', SignoffPolicyScreen, 'Sign-off policy'],
  ['slices', SlicesIndexScreen, 'Slices'],
  ['a slice, loading', SliceScreen, 'Slice'],
  ['booking a window', NewWindowScreen, 'Book a window'],
])('%s: the page title is "%s"', (_name, Screen, expected) => {
  renderScreen(Screen);
  expect(heard[heard.length - 1]).toBe(expected);
});

test.each<[string, ComponentType, string]>([
  ['window', WindowScreen, 'Window'],
  ['editing a window', EditWindowScreen, 'Edit'],
  ['impact', WindowImpactScreen, 'Impact'],
  ['move plans', WindowPlansScreen, 'Move plans'],
  ['one move plan', PlanScreen, 'Move plan'],
])('%s: once the window has loaded, the title names it', async (_name, Screen, kind) => {
  renderScreen(Screen);
  await waitFor(() => expect(heard[heard.length - 1]).toBe(`${kind}: Rectifier swap, Pellow Sands`));
  expect(heard[0]).toBe(kind);
});

test('titleWithName names the thing once known', () => {
  expect(titleWithName('Slice', 'Factory floor')).toBe('Slice: Factory floor');
  expect(titleWithName('Slice', undefined)).toBe('Slice');
  expect(titleWithName('Slice', '')).toBe('Slice');
});

test('on the web the document title reads "<page> — Slackwater" and follows the page', () => {
  const doc = { title: 'Slackwater' };
  (global as { document?: unknown }).document = doc;
  try {
    function Page({ title }: { title: string }) {
      usePageTitle(title);
      return <Text>{title}</Text>;
    }
    const { rerender } = render(<Page title="Calendar" />);
    expect(doc.title).toBe('Calendar — Slackwater');
    rerender(<Page title="Slice: Factory floor" />);
    expect(doc.title).toBe(documentTitle('Slice: Factory floor'));
    expect(doc.title).toBe('Slice: Factory floor — Slackwater');
  } finally {
    delete (global as { document?: unknown }).document;
  }
});
