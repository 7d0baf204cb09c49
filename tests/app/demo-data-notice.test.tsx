// The admin's "demo still here" notice: shown while the demo is present, and coming back to the screen does not
// re-read the demo counts each time (the answer changes only on removal, which invalidates every query).
import type { ReactNode } from 'react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor } from '@testing-library/react-native';
import { DemoDataNotice } from '@/components/demo-data/demo-data-notice';
import { admin, engineer, routedFetch } from './window-test-kit';
import type { Me } from '@/shared/api';

const counts = {
  sites: 12, spans: 15, tenants: 3, slices: 40, placements: 40, windows: 6, plans: 2, notices: 1, signoffs: 0,
  accounts: 6, networkOutline: 1, demoSignOn: 1,
};
const summary = { present: true, counts, accountNames: ['Sam Okafor'], keptAccount: null };

function setUp(me: Me) {
  const { calls } = routedFetch([
    { method: 'GET', path: /\/api\/me$/, reply: () => ({ status: 200, body: me }) },
    { method: 'GET', path: /\/api\/demo-data$/, reply: () => ({ status: 200, body: summary }) },
  ]);
  // staleTime 0, as the app's default for other queries is short: only the notice's own setting can keep the answer.
  const client = new QueryClient({ defaultOptions: { queries: { retry: false, gcTime: Infinity, staleTime: 0 } } });
  const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={client}>{children}</QueryClientProvider>;
  return { calls, client, wrapper };
}

const demoReads = (calls: { url: string }[]) => calls.filter((c) => c.url.endsWith('/api/demo-data')).length;

it('shows the notice to an admin and reads the demo summary once across two visits', async () => {
  const { calls, client, wrapper } = setUp(admin);
  const first = render(<DemoDataNotice />, { wrapper });
  expect(await screen.findByTestId('demo-data-notice')).toBeTruthy();
  first.unmount();
  render(<DemoDataNotice />, { wrapper });
  expect(await screen.findByTestId('demo-data-notice')).toBeTruthy();
  expect(demoReads(calls)).toBe(1);
  client.clear();
});

it('shows nothing to other roles and never asks for the demo summary', async () => {
  const { calls, client, wrapper } = setUp(engineer);
  render(<DemoDataNotice />, { wrapper });
  await waitFor(() => expect(calls.some((c) => c.url.endsWith('/api/me'))).toBe(true));
  expect(screen.queryByTestId('demo-data-notice')).toBeNull();
  expect(demoReads(calls)).toBe(0);
  client.clear();
});
