// A person with too many jobs waiting (429 TOO_MANY_WAITING): the slot finder, the new-campaign form and the
// plan-run form each show the server's sentence as it is, and the person stays on the form to try again later.
import type { ReactElement } from 'react';
import { act, fireEvent, screen, waitFor } from '@testing-library/react-native';
import type { Me } from '@/shared/api';
import NewCampaignScreen from '@/app/(main)/campaigns/new';
import SlotFinderScreen from '@/app/(main)/slots/index';
import { PlanRunForm } from '@/components/plans/plan-run-form';
import { clearQueries, engineer, renderWithQueries, routedFetch, siteList } from './window-test-kit';

const mockRouter = { push: jest.fn(), replace: jest.fn(), back: jest.fn(), canGoBack: () => false, setParams: jest.fn() };
jest.mock('expo-router', () => ({
  Link: ({ children }: { children: ReactElement }) => children,
  useRouter: () => mockRouter,
  useLocalSearchParams: () => ({}),
  usePathname: () => '/slots',
}));

const planner: Me = { id: 'u-pl', email: 'planner@demo.test', name: 'Pat Planner', roles: ['planner'], tenantId: null };

afterEach(() => {
  clearQueries();
  jest.clearAllMocks();
});

const refusal = (message: string) => () => ({ status: 429, body: { error: { code: 'TOO_MANY_WAITING', message } } });

function routes(me: Me, post: { path: RegExp; message: string }) {
  return routedFetch([
    { method: 'GET', path: /^\/api\/me$/, reply: () => ({ status: 200, body: me }) },
    { method: 'GET', path: /^\/api\/sites\?/, reply: () => ({ status: 200, body: siteList }) },
    { method: 'POST', path: post.path, reply: refusal(post.message) },
  ]);
}

test('the slot finder shows the refusal in words and keeps the form', async () => {
  const message = 'You already have 3 slot searches waiting or running. Wait for one to finish, then search again.';
  const { calls } = routes(engineer, { path: /^\/api\/slot-searches$/, message });
  renderWithQueries(<SlotFinderScreen />);
  fireEvent.press(await screen.findByTestId('window-element-option-cell-pellow-sands'));
  await act(async () => fireEvent.press(screen.getByTestId('slot-submit')));
  await waitFor(() => expect(screen.getByTestId('slot-submit-error')).toHaveTextContent(message));
  expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1);
  expect(screen.getByTestId('slot-form')).toBeTruthy();
  expect(mockRouter.setParams).not.toHaveBeenCalled();
});

test('the new-campaign form shows the refusal in words and opens no campaign', async () => {
  const message = 'You already have 2 campaign plans waiting or running. Wait for one to finish, then plan this campaign again.';
  const { calls } = routes(planner, { path: /^\/api\/campaigns$/, message });
  renderWithQueries(<NewCampaignScreen />);
  fireEvent.changeText(await screen.findByTestId('campaign-title'), 'Rectifier swaps, west');
  fireEvent.changeText(screen.getByTestId('campaign-group-0-label'), 'Pellow Sands');
  fireEvent.press(await screen.findByTestId('window-element-option-cell-pellow-sands'));
  await act(async () => fireEvent.press(screen.getByTestId('campaign-submit')));
  await waitFor(() => expect(screen.getByTestId('campaign-submit-error')).toHaveTextContent(message));
  expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1);
  expect(mockRouter.replace).not.toHaveBeenCalled();
});

test('the plan-run form shows the refusal in words, not beside a field', async () => {
  const message = 'You already have 2 move-plan runs waiting or running. Wait for one to finish or cancel one, then run again.';
  routes(planner, { path: /^\/api\/windows\/w-1\/plans$/, message });
  const onQueued = jest.fn();
  renderWithQueries(<PlanRunForm windowId="w-1" functionOptions={[]} siteOptions={[]} onQueued={onQueued} />);
  await act(async () => fireEvent.press(screen.getByTestId('plan-form-submit')));
  await waitFor(() => expect(screen.getByTestId('plan-form-error')).toHaveTextContent(message));
  expect(onQueued).not.toHaveBeenCalled();
});
