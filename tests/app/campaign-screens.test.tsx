// The campaign and slot finder routes: each names itself, shows the list or the form to the roles that may use it,
// and refuses in words the roles that may not.
import type { ComponentType, ReactElement } from 'react';
import { screen, waitFor } from '@testing-library/react-native';
import type { Me } from '@/shared/api';
import { PageTitleContext } from '@/components/page-title';
import CampaignsScreen from '@/app/(main)/campaigns/index';
import NewCampaignScreen from '@/app/(main)/campaigns/new';
import CampaignScreen from '@/app/(main)/campaigns/[id]';
import SlotFinderScreen from '@/app/(main)/slots/index';
import { clearQueries, engineer, renderWithQueries, routedFetch } from './window-test-kit';
import { campaign } from './slot-kit';

jest.mock('expo-router', () => ({
  Link: ({ children }: { children: ReactElement }) => children,
  useRouter: () => ({ push: jest.fn(), replace: jest.fn(), back: jest.fn(), canGoBack: () => false, setParams: jest.fn() }),
  useLocalSearchParams: () => ({ id: 'c-1' }),
  usePathname: () => '/campaigns',
}));

const planner: Me = { id: 'u-pl', email: 'planner@demo.test', name: 'Pat Planner', roles: ['planner'], tenantId: null };
const approver: Me = { id: 'u-ap', email: 'approver@demo.test', name: 'Ari Approver', roles: ['approver'], tenantId: null };

afterEach(clearQueries);

let heard: string[] = [];
function renderAs(me: Me, Screen: ComponentType) {
  heard = [];
  const c = campaign();
  routedFetch([
    { method: 'GET', path: /^\/api\/me$/, reply: () => ({ status: 200, body: me }) },
    { method: 'GET', path: /^\/api\/campaigns\?|^\/api\/campaigns$/, reply: () => ({ status: 200, body: { campaigns: [c] } }) },
    { method: 'GET', path: /^\/api\/campaigns\/c-1$/, reply: () => ({ status: 200, body: c }) },
    { method: 'GET', path: /./, reply: () => new Promise(() => undefined) },
  ]);
  return renderWithQueries(<PageTitleContext.Provider value={(t) => void heard.push(t)}><Screen /></PageTitleContext.Provider>);
}

test('a planner gets the campaign list with a New campaign button', async () => {
  renderAs(planner, CampaignsScreen);
  expect(await screen.findByTestId('campaign-row-c-1')).toHaveTextContent(/Software upgrade, north.*Draft.*2 windows scheduled/);
  expect(screen.getByTestId('campaign-new')).toBeTruthy();
  expect(heard).toContain('Campaigns');
});

test('an engineer may read campaigns but not start one', async () => {
  renderAs(engineer, CampaignsScreen);
  expect(await screen.findByTestId('campaign-row-c-1')).toBeTruthy();
  expect(screen.queryByTestId('campaign-new')).toBeNull();
});

test('the new-campaign form is for planners; others are told why', async () => {
  renderAs(planner, NewCampaignScreen);
  expect(await screen.findByTestId('campaign-form')).toBeTruthy();
  expect(heard).toContain('New campaign');
  clearQueries();
  renderAs(engineer, NewCampaignScreen);
  expect(await screen.findByText('Campaigns are scheduled by planners; your roles do not include it.')).toBeTruthy();
});

test('a campaign names itself by its title once loaded, with one h1', async () => {
  renderAs(planner, CampaignScreen);
  expect(await screen.findByTestId('campaign-draft')).toBeTruthy();
  await waitFor(() => expect(heard).toContain('Campaign: Software upgrade, north'));
  expect(screen.getAllByRole('heading').filter((h) => h.props['aria-level'] === 1)).toHaveLength(1);
});

test('the slot finder opens its form for an engineer and refuses an approver in words', async () => {
  renderAs(engineer, SlotFinderScreen);
  expect(await screen.findByTestId('slot-form')).toBeTruthy();
  expect(heard).toContain('Find a slot');
  clearQueries();
  renderAs(approver, SlotFinderScreen);
  expect(await screen.findByText('Finding slots is for engineers, planners and admins; your roles do not include it.')).toBeTruthy();
});
