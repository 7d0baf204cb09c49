// The window's history: one row per event, newest first, the time in the viewer's zone, a person's name and the
// comment given; tenants are never shown it (and never ask for it).
import { screen, waitFor, within } from '@testing-library/react-native';
import type { WindowEvent } from '@/shared/window-history';
import { eventSentence, WindowTimeline } from '@/components/windows/window-timeline';
import { clearQueries, engineer, renderWithQueries, routedFetch } from './window-test-kit';

// The link to the audit trail is a router Link; a text stand-in keeps its words readable here.
jest.mock('expo-router', () => {
  const { Text } = jest.requireActual('react-native');
  return { Link: ({ children, testID }: { children: string; testID?: string }) => <Text testID={testID}>{children}</Text> };
});

afterEach(clearQueries);

function event(extra: Partial<WindowEvent>): WindowEvent {
  return { id: '1', kind: 'booked', at: '2030-01-10T09:00:00.000Z', by: 'Sam Okafor', status: 'draft', comment: null, reverted: false, round: null, ...extra };
}

const events = [
  event({ id: '1' }),
  event({ id: '2', kind: 'submitted', at: '2030-01-11T09:00:00.000Z', by: 'Pia Planner', status: 'in-review', round: 1 }),
  event({ id: '3', kind: 'sent-back', at: '2030-01-12T15:30:00.000Z', by: 'Ari Approver', status: null, round: 2, comment: 'Move it to the weekend.' }),
];

test('rows come newest first with the Berlin time, the name and the comment', async () => {
  const { calls } = routedFetch([{ method: 'GET', path: /\/api\/windows\/w-1\/history$/, reply: () => ({ status: 200, body: { windowId: 'w-1', events } }) }]);
  renderWithQueries(<WindowTimeline windowId="w-1" me={engineer} timeZone="Europe/Berlin" />);
  await waitFor(() => expect(screen.getAllByTestId('window-timeline-row')).toHaveLength(3));
  const [first, , last] = screen.getAllByTestId('window-timeline-row');
  // 15:30 UTC is 16:30 in Berlin in January (CET).
  expect(first).toHaveTextContent(/16:30 CET/);
  expect(first).toHaveTextContent(/Sent the plan back \(round 2\)/);
  expect(within(first).getByText('by Ari Approver')).toBeTruthy();
  expect(first).toHaveTextContent(/Move it to the weekend\./);
  expect(last).toHaveTextContent(/Booked the window/);
  expect(last).toHaveTextContent(/10:00 CET/);
  expect(calls).toHaveLength(1);
  // Engineers do not read the audit trail, so they get no link to it.
  expect(screen.queryByTestId('window-open-audit')).toBeNull();
});

test('admins and approvers get a link to every recorded action on the window in the audit trail', async () => {
  routedFetch([{ method: 'GET', path: /\/api\/windows\/w-1\/history$/, reply: () => ({ status: 200, body: { windowId: 'w-1', events } }) }]);
  renderWithQueries(<WindowTimeline windowId="w-1" me={{ ...engineer, roles: ['approver'] }} timeZone="UTC" />);
  await waitFor(() => expect(screen.getByTestId('window-open-audit')).toHaveTextContent('Every recorded action on this window, in the audit trail'));
});

test('a tenant sees no history and no request is made', () => {
  const { calls } = routedFetch([]);
  renderWithQueries(<WindowTimeline windowId="w-1" me={{ ...engineer, roles: ['tenant'], tenantId: 't-1' }} timeZone="UTC" />);
  expect(screen.queryByTestId('window-timeline')).toBeNull();
  expect(calls).toHaveLength(0);
});

test('an edit that sent the window back to draft says so; a lifecycle step names the state in words', () => {
  expect(eventSentence(event({ kind: 'edited', reverted: true }))).toMatch(/went back to draft/);
  expect(eventSentence(event({ kind: 'edited', reverted: false }))).toBe('Changed the window');
  expect(eventSentence(event({ kind: 'moved', status: 'rolled-back' }))).toBe('Marked the window rolled back');
});
