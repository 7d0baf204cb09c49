// Single sign-on on the sign-in screen and the admin's settings form: the button's words from the server, the
// reason a sign-in came back, and a form that never shows the secret and refuses a mapping without roles.
import type { ReactNode } from 'react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import { SsoSignInSection } from '@/components/sso/sso-sign-in-section';
import { SsoSettingsForm } from '@/components/sso/sso-settings-form';
import { SSO_ERROR_MESSAGES } from '@/components/sso/sso-error-messages';
import type { SsoSettings } from '@/shared/sso';

let mockParams: Record<string, string> = {};
jest.mock('expo-router', () => ({ useLocalSearchParams: () => mockParams }));

const fetchMock = jest.fn<Promise<Response>, [RequestInfo | URL, RequestInit?]>();
const reply = (body: unknown) => ({ ok: true, status: 200, text: async () => JSON.stringify(body) }) as Response;
let queryClient: QueryClient;

function renderWithQueries(node: ReactNode) {
  queryClient = new QueryClient({ defaultOptions: { queries: { retry: false, gcTime: Infinity } } });
  render(<QueryClientProvider client={queryClient}>{node}</QueryClientProvider>);
}

beforeEach(() => {
  mockParams = {};
  fetchMock.mockReset();
  global.fetch = fetchMock as unknown as typeof fetch;
});
afterEach(() => queryClient?.clear());

test('the button says the name the admin chose and starts the sign-in when pressed', async () => {
  fetchMock.mockResolvedValue(reply({ enabled: true, displayName: 'Harbourline staff login' }));
  const onStart = jest.fn();
  renderWithQueries(<SsoSignInSection onStart={onStart} />);
  fireEvent.press(await screen.findByText('Sign in with Harbourline staff login'));
  expect(onStart).toHaveBeenCalledTimes(1);
});

test('no button when single sign-on is off, but the reason a sign-in came back is shown', async () => {
  mockParams = { sso_error: 'no-access' };
  fetchMock.mockResolvedValue(reply({ enabled: false, displayName: null }));
  renderWithQueries(<SsoSignInSection onStart={jest.fn()} />);
  expect((await screen.findByTestId('sso-sign-in-error'))).toHaveTextContent(SSO_ERROR_MESSAGES['no-access']);
  await waitFor(() => expect(queryClient.isFetching()).toBe(0));
  expect(fetchMock).toHaveBeenCalledTimes(1);
  expect(screen.queryByTestId('sso-sign-in')).toBeNull();
});

const saved: SsoSettings = {
  configured: true, enabled: true, issuerUrl: 'https://id.example.com', clientId: 'slackwater', clientSecretSet: true,
  displayName: 'Example login', groupsClaim: 'groups', groupRoles: [{ group: 'noc', roles: ['engineer'] }],
  passwordSignInForStaff: true, redirectUri: 'https://slackwater.example.com/api/auth/sso/callback',
};

test('the form says a secret is set without showing it, and saving unchanged keeps it (no secret sent)', () => {
  const onSave = jest.fn();
  render(<SsoSettingsForm settings={saved} saving={false} saved={false} error={null} onSave={onSave} />);
  expect(screen.getByTestId('sso-client-secret-set')).toBeTruthy();
  expect(screen.getByTestId('sso-client-secret').props.value).toBe('');
  expect(screen.getByTestId('sso-redirect-uri')).toHaveTextContent(saved.redirectUri, { exact: false });
  fireEvent.press(screen.getByTestId('sso-save'));
  expect(onSave).toHaveBeenCalledWith(expect.objectContaining({ clientSecret: undefined, groupRoles: saved.groupRoles }));
});

test('a group with no role is refused before saving, with the reason next to it', () => {
  const onSave = jest.fn();
  render(<SsoSettingsForm settings={saved} saving={false} saved={false} error={null} onSave={onSave} />);
  fireEvent.press(screen.getByTestId('sso-group-add'));
  fireEvent.changeText(screen.getByTestId('sso-group-1-name'), 'change-board');
  fireEvent.press(screen.getByTestId('sso-save'));
  expect(onSave).not.toHaveBeenCalled();
  expect(screen.getByText('Choose at least one role for this group')).toBeTruthy();
  fireEvent.press(screen.getByTestId('sso-group-1-role-approver'));
  fireEvent.press(screen.getByTestId('sso-save'));
  expect(onSave).toHaveBeenCalledWith(expect.objectContaining({
    groupRoles: [{ group: 'noc', roles: ['engineer'] }, { group: 'change-board', roles: ['approver'] }],
  }));
});
