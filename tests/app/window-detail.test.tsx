// Window page: times in the viewer's zone with the zone named, the lifecycle in words, conflicts with reasons
// that open the other window, withdrawing with the loaded version, and one filled button: the next step.
import { act, fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import { WindowDetail } from '@/components/windows/window-detail';
import { STATUS_SENTENCES } from '@/components/windows/lifecycle';
import { CRITICAL_CAUTION_POINTS } from '@/components/critical-caution';
import { clearQueries, engineer, renderWithQueries, routedFetch, siteList, windowFixture } from './window-test-kit';

const mockPush = jest.fn();
jest.mock('expo-router', () => ({ useRouter: () => ({ push: mockPush }) }));

afterEach(clearQueries);

const conflicts = {
  windowId: 'w-1',
  conflicts: [{
    window: { id: 'w-other', title: 'Duct repair in the shared trench', startsAt: '2030-01-10T23:00:00.000Z', endsAt: '2030-01-11T03:00:00.000Z', status: 'draft' },
    reasons: [{ reason: 'shared-element', message: 'Both windows take out site:cell-pellow-sands.', ids: ['site:cell-pellow-sands'] }],
  }],
};

/** A stored impact with the named slices, each critical or not. */
function impactWith(...slices: [string, boolean][]) {
  return {
    windowId: 'w-1', windowVersion: 7, computedAt: '2030-01-01T10:00:00.000Z', touchesCritical: slices.some(([, c]) => c),
    splits: false, components: 1, overloaded: [], elements: [], currentPaths: [],
    affected: slices.map(([name, critical], i) => ({
      slice: `sl-${i}`, name, tenant: { id: 't-1', name: 'Crannock Quay Logistics' }, sst: 1, priority: 2, critical,
      reasons: ['hosted'], severity: critical ? 'critical' : 'low', failureProbability: 0.001, unprotected: false,
    })),
  };
}

function renderDetail(onOpenWindow = jest.fn(), window: Parameters<typeof windowFixture>[0] = { status: 'draft', conflictCount: 1, impactStored: false }) {
  renderWithQueries(
    <WindowDetail
      window={windowFixture(window)}
      me={engineer}
      timeZone="Europe/Berlin"
      flash={{}}
      onEdit={jest.fn()}
      onOpenImpact={jest.fn()}
      onOpenWindow={onOpenWindow}
      onReload={jest.fn()}
    />,
  );
  return { onOpenWindow };
}

test('shows the times in the viewer zone, the lifecycle sentence, and conflicts that open the other window', async () => {
  routedFetch([
    { method: 'GET', path: /^\/api\/windows\/w-1\/conflicts$/, reply: () => ({ status: 200, body: conflicts }) },
    { method: 'GET', path: /^\/api\/sites\/cell-pellow-sands$/, reply: () => ({ status: 200, body: { site: siteList.items[0], spans: [], hosted: [], transit: [] } }) },
  ]);
  const { onOpenWindow } = renderDetail();
  // 21:00–01:00 UTC is 22:00–02:00 in Berlin in January (CET, UTC+1).
  expect(screen.getByTestId('window-when-local')).toHaveTextContent('Thu 10 Jan, 22:00 – Fri 11 Jan, 02:00 CET');
  expect(screen.getByTestId('window-when-utc')).toHaveTextContent('Thu 10 Jan, 21:00 – Fri 11 Jan, 01:00 UTC');
  expect(screen.getByTestId('window-lifecycle-sentence')).toHaveTextContent(STATUS_SENTENCES.draft);
  expect(screen.getByTestId('window-conflict-note')).toHaveTextContent(/Collides with 1 other window/);

  const conflict = await screen.findByTestId('window-conflict-w-other');
  expect(within(conflict).getByText('Shares equipment')).toBeTruthy();
  // The shared element reads by name, never by its id.
  await waitFor(() => expect(conflict).toHaveTextContent(/Both windows take out site Pellow Sands\./));
  expect(conflict).not.toHaveTextContent(/cell-pellow-sands/);
  fireEvent.press(conflict);
  expect(onOpenWindow).toHaveBeenCalledWith('w-other');
});

test('withdrawing asks once more, then sends the transition with the loaded version', async () => {
  const { calls } = routedFetch([
    { method: 'GET', path: /^\/api\/windows\/w-1\/conflicts$/, reply: () => ({ status: 200, body: conflicts }) },
    {
      method: 'POST', path: /^\/api\/windows\/w-1\/transition$/,
      reply: () => ({ status: 200, body: { window: windowFixture({ status: 'withdrawn', version: 4 }), reverted: false, conflictCount: 0 } }),
    },
  ]);
  renderDetail();
  await screen.findByTestId('window-conflict-w-other');
  // A draft's one filled button is the next step; assessing again is not offered before a first assessment.
  expect(screen.getByTestId('next-step-action')).toHaveTextContent('Assess impact');
  expect(screen.queryByTestId('window-assess')).toBeNull();
  fireEvent.press(screen.getByTestId('window-withdraw'));
  expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  await act(async () => fireEvent.press(screen.getByTestId('window-withdraw-yes')));
  await waitFor(() => expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1));
  expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ to: 'withdrawn', version: 3 });
});

test('rolling back underway work asks once more, says what it restores, then sends the transition', async () => {
  const { calls } = routedFetch([
    { method: 'GET', path: /^\/api\/windows\/w-1\/conflicts$/, reply: () => ({ status: 200, body: { windowId: 'w-1', conflicts: [] } }) },
    { method: 'GET', path: /^\/api\/windows\/w-1\/plans$/, reply: () => ({ status: 200, body: { plans: [] } }) },
    { method: 'GET', path: /^\/api\/windows\/w-1\/impact$/, reply: () => ({ status: 200, body: impactWith(['Harbour CCTV', false], ['Dispatch voice', true]) }) },
    {
      method: 'POST', path: /^\/api\/windows\/w-1\/transition$/,
      reply: () => ({ status: 200, body: { window: windowFixture({ status: 'rolled-back', version: 8 }), reverted: false, conflictCount: 0 } }),
    },
  ]);
  renderDetail(jest.fn(), { status: 'underway', version: 7, conflictCount: 0, impactStored: true });
  // Finishing is the next step; rolling back is the quiet alternative, and withdrawing is no longer offered.
  expect(screen.getByTestId('next-step-action')).toHaveTextContent('Mark the work finished');
  expect(screen.queryByTestId('window-withdraw')).toBeNull();
  fireEvent.press(screen.getByTestId('window-roll-back'));
  expect(screen.getByTestId('window-roll-back-confirm')).toHaveTextContent(/Every slice the plan moved goes back to where it was before the window/);
  // The window's impact names a critical slice: the usual caution leads the confirmation, naming only that one.
  const caution = await screen.findByTestId('window-roll-back-critical');
  expect(caution).toHaveTextContent(/Rolling back moves these critical slices back as well: Dispatch voice\./);
  for (const point of CRITICAL_CAUTION_POINTS) expect(within(caution).getByText(point)).toBeTruthy();
  expect(calls.filter((c) => c.method === 'POST')).toHaveLength(0);
  await act(async () => fireEvent.press(screen.getByTestId('window-roll-back-yes')));
  await waitFor(() => expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1));
  expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ to: 'rolled-back', version: 7 });
});

test('an engineer cannot roll back a window that is not underway', async () => {
  routedFetch([{ method: 'GET', path: /^\/api\/windows\/w-1\/conflicts$/, reply: () => ({ status: 200, body: { windowId: 'w-1', conflicts: [] } }) }]);
  renderDetail(jest.fn(), { status: 'notified', conflictCount: 0, impactStored: true });
  expect(screen.getByTestId('next-step-action')).toHaveTextContent('Start the work');
  expect(screen.queryByTestId('window-roll-back')).toBeNull();
});
