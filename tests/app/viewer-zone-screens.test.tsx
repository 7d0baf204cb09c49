// One window, one viewer: the calendar agenda, the overview, the window page and the tenant notice all read the
// same wall time, in the zone the viewer chose (GET /api/me), never the browser's zone or UTC alone.
// Zone rule checked against (well-known civil rule): India Standard Time is UTC+5:30 all year, no daylight saving,
// so 21:00–01:00 UTC on 10/11 Jan is 02:30–06:30 on 11 Jan.
import type { ReactNode } from 'react';
import { screen, waitFor } from '@testing-library/react-native';
import { AgendaList } from '@/components/calendar/agenda-list';
import { NoticeView } from '@/components/notices/notice-view';
import { NextWindows } from '@/components/overview/next-windows';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { WindowDetail } from '@/components/windows/window-detail';
import type { Notice } from '@/shared/notices';
import { NETWORK_TIME_ZONE } from '@/shared/time-zone';
import { clearQueries, engineer, renderWithQueries, routedFetch, windowFixture } from './window-test-kit';

jest.mock('expo-router', () => ({ useRouter: () => ({ push: jest.fn() }), usePathname: () => '/', Link: ({ children }: { children: unknown }) => children }));

afterEach(clearQueries);

const STARTS = '2030-01-10T21:00:00.000Z';
const ENDS = '2030-01-11T01:00:00.000Z';
const window = windowFixture({ startsAt: STARTS, endsAt: ENDS, status: 'draft', conflictCount: 0, impactStored: false });

const notice: Notice = {
  id: 'ntc-1', windowId: 'w-1', tenantId: 't1', status: 'sent', method: 'REQUEST', sequence: 0,
  subject: 'Planned network maintenance', sentAt: '2029-12-20T10:00:00.000Z', acknowledgedAt: null, acknowledgedByName: null,
  updatedAt: '2029-12-20T10:00:00.000Z',
  content: {
    windowId: 'w-1', tenantId: 't1', tenantName: 'Harbour Health', summary: 'Planned network maintenance (power work)',
    startsAt: STARTS, endsAt: ENDS, timeZone: NETWORK_TIME_ZONE,
    // What the notice was composed with in the network's zone; the screen reads the instants instead.
    whenLocal: 'Thu, 10 Jan 2030, 20:00 – Fri, 11 Jan 2030, 00:00 GMT-1', whenUtc: 'Thu, 10 Jan 2030, 21:00 – Fri, 11 Jan 2030, 01:00 UTC',
    slices: [], effect: 'none', effectText: 'No effect on your slices.', afterWork: 'Nothing moves back.',
    contact: { name: 'Network operations centre', email: 'noc@example.test' }, leadDays: 7, leadOverrideReason: null, cancelled: false,
  },
};

function meReplyIn(timeZone: string) {
  return { status: 200, body: { ...engineer, timeZone, timeZoneChosen: true } };
}

/** Hands each screen the zone the way its route does. */
function InViewerZone({ children }: { children: (timeZone: string) => ReactNode }) {
  return <>{children(useViewerTimeZone())}</>;
}

function renderAll() {
  renderWithQueries(
    <InViewerZone>
      {(timeZone) => (
        <>
          <AgendaList day="2030-01-11" timeZone={timeZone} windows={[window]} freezes={[]} onOpenWindow={jest.fn()} emptyHint="" />
          <NextWindows windows={[{ id: 'w-1', title: window.title, startsAt: STARTS, endsAt: ENDS, status: 'draft' }]} inHorizon={1} now={new Date('2030-01-01T00:00:00Z')} />
          <WindowDetail window={window} me={engineer} timeZone={timeZone} flash={{}} onEdit={jest.fn()} onOpenImpact={jest.fn()} onOpenWindow={jest.fn()} onReload={jest.fn()} />
          <NoticeView notice={notice} icsHref="/x.ics" onAcknowledge={jest.fn()} acknowledging={false} error={null} />
        </>
      )}
    </InViewerZone>,
  );
}

test.each([
  ['Asia/Kolkata', 'Fri 11 Jan, 02:30 – 06:30 GMT+5:30'],
  ['America/New_York', 'Thu 10 Jan, 16:00 – 20:00 EST'],
])('a viewer in %s reads %s on the calendar, the overview, the window page and the notice', async (timeZone, text) => {
  const wall = new RegExp(text.replace(/[+]/g, '\\+'));
  routedFetch([{ method: 'GET', path: /^\/api\/me$/, reply: () => meReplyIn(timeZone) }]);
  renderAll();
  await waitFor(() => expect(screen.getByTestId('notice-when-local')).toHaveTextContent(wall));
  expect(screen.getByTestId('agenda-window-w-1')).toHaveTextContent(wall);
  expect(screen.getByTestId('next-window-w-1')).toHaveTextContent(wall);
  expect(screen.getByTestId('window-when-local')).toHaveTextContent(wall);
  // UTC beside it, for comparing with people elsewhere.
  expect(screen.getByTestId('window-when-utc')).toHaveTextContent('Thu 10 Jan, 21:00 – Fri 11 Jan, 01:00 UTC');
  expect(screen.getByTestId('notice-when-utc')).toHaveTextContent('Thu 10 Jan, 21:00 – Fri 11 Jan, 01:00 UTC');
});

test('a viewer who chose no zone reads the network zone, named once, never "UTC (UTC)"', async () => {
  routedFetch([{ method: 'GET', path: /^\/api\/me$/, reply: () => ({ status: 200, body: { ...engineer, timeZone: NETWORK_TIME_ZONE, timeZoneChosen: false } }) }]);
  renderAll();
  // 21:00 UTC is 20:00 at UTC−1.
  expect(await screen.findByTestId('window-when-local')).toHaveTextContent('Thu 10 Jan, 20:00 – Fri 11 Jan, 00:00 GMT-1');
  expect(screen.getByTestId('overview-next-windows-zone')).toHaveTextContent("Times in GMT-1, the network's zone");
  expect(screen.queryByText(/UTC \(UTC\)/)).toBeNull();
});
