// Overview panel for approvers: "N decisions wait for you" with the way to the queue; nothing for others or at 0.
import type { ReactElement } from 'react';
import { act, fireEvent, screen, waitFor } from '@testing-library/react-native';
import { WaitingDecisions } from '@/components/overview/waiting-decisions';
import { clearQueries, renderWithQueries, routedFetch } from './window-test-kit';

const mockPush = jest.fn();
jest.mock('expo-router', () => ({
  Link: ({ href, children }: { href: string; children: ReactElement<{ onPress?: () => void }> }) =>
    require('react').cloneElement(children, { onPress: () => mockPush(href) }),
}));

function renderPanel(roles: string[], waiting: number) {
  return routedFetch([
    { method: 'GET', path: /^\/api\/me$/, reply: () => ({ status: 200, body: { id: 'u-ap', email: 'approver@demo.test', name: 'Jonas Weller', roles, tenantId: null } }) },
    { method: 'GET', path: /^\/api\/signoff\/waiting-count$/, reply: () => ({ status: 200, body: { waiting } }) },
  ]);
}

/** Lets answered queries render before asserting that something is absent. */
const settle = () => act(() => new Promise<void>((resolve) => setTimeout(resolve, 0)));

afterEach(clearQueries);
beforeEach(() => mockPush.mockReset());

test('an approver with two windows waiting reads so, and the panel opens the queue', async () => {
  renderPanel(['approver'], 2);
  renderWithQueries(<WaitingDecisions />);
  expect(await screen.findByTestId('overview-waiting-decisions')).toHaveTextContent(/2 decisions wait for you/);
  fireEvent.press(screen.getByTestId('overview-waiting-decisions-open'));
  expect(mockPush).toHaveBeenCalledWith('/sign-off');
});

test('one window: the singular', async () => {
  renderPanel(['approver', 'planner'], 1);
  renderWithQueries(<WaitingDecisions />);
  expect(await screen.findByTestId('overview-waiting-decisions')).toHaveTextContent(/^1 decision waits for you/);
});

test('nothing waiting: no panel', async () => {
  const { calls } = renderPanel(['approver'], 0);
  renderWithQueries(<WaitingDecisions />);
  await waitFor(() => expect(calls.map((c) => c.url)).toContain('/api/signoff/waiting-count'));
  await settle();
  expect(screen.queryByTestId('overview-waiting-decisions')).toBeNull();
});

test('a planner who is no approver: the count is never asked for', async () => {
  const { calls } = renderPanel(['planner'], 5);
  renderWithQueries(<WaitingDecisions />);
  await waitFor(() => expect(calls.map((c) => c.url)).toContain('/api/me'));
  await settle();
  expect(calls.map((c) => c.url)).toEqual(['/api/me']);
  expect(screen.queryByTestId('overview-waiting-decisions')).toBeNull();
});
