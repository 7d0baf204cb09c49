// The Map route: error → loading → empty → data, and the selection panel showing what uses a tapped site.
import type { ReactNode } from 'react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, fireEvent, render, screen } from '@testing-library/react-native';
import MapScreen from '@/app/(main)/map';

// The route only needs router.push; expo-router's navigation stack is not under test here.
const mockPush = jest.fn();
jest.mock('expo-router', () => ({ useRouter: () => ({ push: mockPush }) }));
import { demoMapData } from './map-demo-data';

// Drawing 120+ svg elements under the native test renderer is slow on a shared machine.
jest.setTimeout(30_000);

const data = demoMapData();
const fetchMock = jest.fn<Promise<Response>, [RequestInfo | URL, RequestInit?]>();
let queryClient: QueryClient;

function reply(status: number, body: unknown): Response {
  const text = JSON.stringify(body);
  return { ok: status >= 200 && status < 300, status, text: async () => text, json: async () => body } as Response;
}

function renderScreen() {
  queryClient = new QueryClient({ defaultOptions: { queries: { retry: false, gcTime: Infinity } } });
  const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>;
  render(<MapScreen />, { wrapper });
}

function siteDetail(id: string) {
  const site = data.sites.find((s) => s.id === id)!;
  const row = { id, name: site.name, kind: site.kind, lat: site.lat, lon: site.lon, cpu: 64, cpuUsed: 16, utilisation: 0.25, mtbfHours: null, mttrHours: null, spanCount: 0, sliceCount: 1 };
  const use = { sliceId: 'sl-a', sliceName: 'Harbour cameras', tenantId: 't1', tenantName: 'Invented Port Co', critical: true, functions: [{ id: 'f1', name: 'User plane', cpu: 8 }], ties: [] };
  return { site: row, spans: [], hosted: [use], transit: [] };
}

beforeEach(() => {
  mockPush.mockReset();
  fetchMock.mockReset();
  global.fetch = fetchMock as unknown as typeof fetch;
});
afterEach(() => queryClient?.clear());

test('shows the loading state, then the error with a retry that loads the map', async () => {
  let answer: (r: Response) => void = () => undefined;
  fetchMock.mockReturnValueOnce(new Promise<Response>((resolve) => (answer = resolve)));
  renderScreen();
  expect(screen.getByTestId('state-loading')).toBeTruthy();
  await act(async () => answer(reply(500, { error: { code: 'INTERNAL', message: 'The map could not be built.' } })));
  expect(await screen.findByTestId('state-error')).toHaveTextContent(/The map could not be built/);
  expect(fetchMock.mock.calls[0][0]).toBe('/api/network/map');

  fetchMock.mockResolvedValueOnce(reply(200, data));
  fireEvent.press(screen.getByText('Try again'));
  expect(await screen.findByTestId('network-map')).toBeTruthy();
});

test('an empty network shows the empty state', async () => {
  fetchMock.mockResolvedValueOnce(reply(200, { name: null, outline: null, sites: [], spans: [] }));
  renderScreen();
  expect(await screen.findByTestId('state-empty')).toBeTruthy();
});

test('tapping a site opens the panel with the slices hosted there, each leading to its page', async () => {
  const site = data.sites[0];
  fetchMock.mockImplementation(async (url) =>
    String(url) === '/api/network/map' ? reply(200, data) : reply(200, siteDetail(site.id)));
  renderScreen();
  fireEvent.press(await screen.findByTestId(`map-site-${site.id}`));
  expect(await screen.findByText('Harbour cameras')).toBeTruthy();
  expect(screen.getByTestId('map-selection')).toHaveTextContent(new RegExp(site.name));
  expect(screen.getByText('critical')).toBeTruthy();
  expect(fetchMock.mock.calls.map((c) => String(c[0]))).toContain(`/api/sites/${site.id}`);
  fireEvent.press(screen.getByTestId('map-use-sl-a'));
  expect(mockPush).toHaveBeenLastCalledWith({ pathname: '/slices/[id]', params: { id: 'sl-a' } });
  fireEvent.press(screen.getByTestId('map-selection-open'));
  expect(mockPush).toHaveBeenLastCalledWith({ pathname: '/network/sites/[id]', params: { id: site.id } });
  fireEvent.press(screen.getByTestId('map-selection-close'));
  expect(screen.queryByTestId('map-selection')).toBeNull();
});

test('the page is headed "Network map"; a site picked from the list opens the panel with its load in words', async () => {
  const site = data.sites[0];
  fetchMock.mockImplementation(async (url) =>
    String(url) === '/api/network/map' ? reply(200, data) : reply(200, siteDetail(site.id)));
  renderScreen();
  const heading = await screen.findByTestId('map-heading');
  expect(heading).toHaveTextContent('Network map');
  expect(heading.props['aria-level']).toBe(1);
  // The drawing's groups are pointer targets only: their names live in the list, not on role-less groups.
  expect(screen.getByTestId(`map-site-${site.id}`).props.accessibilityLabel).toBeUndefined();
  expect(screen.getByTestId(`map-span-${data.spans[0].id}`).props.accessibilityLabel).toBeUndefined();
  fireEvent.press(screen.getByTestId('map-list-toggle'));
  fireEvent.press(screen.getByTestId(`map-list-site-${site.id}`));
  expect(await screen.findByText('Harbour cameras')).toBeTruthy();
  expect(screen.getByTestId('map-selection-title')).toHaveTextContent(site.name);
  expect(screen.getByTestId('map-selection')).toHaveTextContent(/Compute used\s*25 % of 64 vCPU/);
  expect(screen.getByTestId(`map-list-site-${site.id}`).props['aria-pressed']).toBe(true);
});

test('the panel\'s links open on Enter too (they have no href for the browser to follow)', async () => {
  const site = data.sites[0];
  fetchMock.mockImplementation(async (url) =>
    String(url) === '/api/network/map' ? reply(200, data) : reply(200, siteDetail(site.id)));
  renderScreen();
  fireEvent.press(await screen.findByTestId(`map-site-${site.id}`));
  await screen.findByText('Harbour cameras');
  fireEvent(screen.getByTestId('map-use-sl-a'), 'keyDown', { key: 'Enter', preventDefault: jest.fn() });
  expect(mockPush).toHaveBeenLastCalledWith({ pathname: '/slices/[id]', params: { id: 'sl-a' } });
  fireEvent(screen.getByTestId('map-selection-open'), 'keyDown', { key: 'Enter', preventDefault: jest.fn() });
  expect(mockPush).toHaveBeenLastCalledWith({ pathname: '/network/sites/[id]', params: { id: site.id } });
});
