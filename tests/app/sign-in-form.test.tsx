// Component test of the sign-in form: client validation, busy state and the server's error, with fetch mocked.
import type { ReactNode } from 'react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import { SignInForm } from '@/components/sign-in-form';
import { SIGN_IN_MESSAGES } from '@/components/sign-in-errors';

type FetchReply = { status: number; body: unknown };

function jsonResponse({ status, body }: FetchReply): Response {
  const text = JSON.stringify(body);
  return { ok: status >= 200 && status < 300, status, text: async () => text, json: async () => body } as Response;
}

// gcTime Infinity: no garbage-collection timers outlive a test and keep jest from exiting.
let queryClient: QueryClient;

function renderForm(onSignedIn = jest.fn()) {
  queryClient = new QueryClient({
    defaultOptions: { queries: { retry: false, gcTime: Infinity }, mutations: { retry: false, gcTime: Infinity } },
  });
  const wrapper = ({ children }: { children: ReactNode }) => (
    <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
  );
  render(<SignInForm onSignedIn={onSignedIn} />, { wrapper });
  return { onSignedIn };
}

function fillAndSubmit(email: string, password: string) {
  fireEvent.changeText(screen.getByTestId('sign-in-email'), email);
  fireEvent.changeText(screen.getByTestId('sign-in-password'), password);
  fireEvent.press(screen.getByTestId('sign-in-submit'));
}

const fetchMock = jest.fn<Promise<Response>, [RequestInfo | URL, RequestInit?]>();

beforeEach(() => {
  fetchMock.mockReset();
  global.fetch = fetchMock as unknown as typeof fetch;
});

afterEach(() => queryClient?.clear());

test('renders labelled e-mail and password fields and a submit button', () => {
  renderForm();
  expect(screen.getByLabelText('E-mail')).toBeTruthy();
  expect(screen.getByLabelText('Password')).toBeTruthy();
  expect(screen.getByTestId('sign-in-submit')).toBeTruthy();
});

test('a malformed e-mail and an empty password show field errors and never call the API', () => {
  renderForm();
  fillAndSubmit('not-an-address', '');
  expect(screen.getByTestId('sign-in-email-error')).toHaveTextContent('Enter a valid e-mail address');
  expect(screen.getByTestId('sign-in-password-error')).toHaveTextContent('Enter your password');
  expect(fetchMock).not.toHaveBeenCalled();
});

test('the button is disabled while the request is in flight, and the user is handed on when it succeeds', async () => {
  let answer: (reply: Response) => void = () => undefined;
  fetchMock.mockReturnValue(new Promise<Response>((resolve) => (answer = resolve)));
  const { onSignedIn } = renderForm();
  fillAndSubmit('planner@demo.test', 'demo-password-1');

  await waitFor(() => expect(screen.getByTestId('sign-in-submit')).toBeDisabled());
  const [url, init] = fetchMock.mock.calls[0];
  expect(url).toBe('/api/auth/sign-in');
  expect(init?.method).toBe('POST');
  expect(init?.credentials).toBe('include');
  expect(JSON.parse(String(init?.body))).toEqual({ email: 'planner@demo.test', password: 'demo-password-1' });

  // A second press while busy must not send a second request.
  fireEvent.press(screen.getByTestId('sign-in-submit'));
  expect(fetchMock).toHaveBeenCalledTimes(1);

  const user = { id: 'u1', email: 'planner@demo.test', name: 'Pat Planner', roles: ['planner'], tenantId: null };
  await act(async () => answer(jsonResponse({ status: 200, body: { user } })));
  await waitFor(() => expect(onSignedIn).toHaveBeenCalledWith(user));
  await waitFor(() => expect(screen.getByTestId('sign-in-submit')).toBeEnabled());
});

test("shows the wrong-credentials message for the server's BAD_CREDENTIALS answer", async () => {
  fetchMock.mockResolvedValue(
    jsonResponse({ status: 401, body: { error: { code: 'BAD_CREDENTIALS', message: 'Invalid e-mail or password' } } }),
  );
  const { onSignedIn } = renderForm();
  fillAndSubmit('planner@demo.test', 'wrong-password');

  expect(await screen.findByTestId('sign-in-error')).toHaveTextContent(SIGN_IN_MESSAGES.badCredentials);
  expect(SIGN_IN_MESSAGES.badCredentials).toBe('E-mail or password is wrong.');
  expect(onSignedIn).not.toHaveBeenCalled();
  expect(screen.getByTestId('sign-in-submit')).toBeEnabled();
});

test('a 429 shows the rate-limit message and an unreachable server the network message', async () => {
  fetchMock.mockResolvedValueOnce(jsonResponse({ status: 429, body: { error: { code: 'RATE_LIMITED', message: 'Slow down' } } }));
  renderForm();
  fillAndSubmit('planner@demo.test', 'demo-password-1');
  expect(await screen.findByTestId('sign-in-error')).toHaveTextContent(SIGN_IN_MESSAGES.rateLimited);

  fetchMock.mockRejectedValueOnce(new TypeError('Failed to fetch'));
  fireEvent.press(screen.getByTestId('sign-in-submit'));
  await waitFor(() => expect(screen.getByTestId('sign-in-error')).toHaveTextContent(SIGN_IN_MESSAGES.network));
});
