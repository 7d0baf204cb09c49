// Shared set-up for the window and impact component tests: a fresh query client, a routed fetch mock, fixtures.
import type { ReactElement, ReactNode } from 'react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react-native';
import type { Me } from '@/shared/api';
import type { Window } from '@/shared/windows';

export type Reply = { status: number; body: unknown };
type Route = { method: string; path: RegExp; reply: (init?: RequestInit) => Reply | Promise<Reply> };

function jsonResponse({ status, body }: Reply): Response {
  const text = JSON.stringify(body);
  return { ok: status >= 200 && status < 300, status, text: async () => text, json: async () => body } as Response;
}

/** fetch answered by the first route matching method and path; anything else is a 404 the test can see. */
export function routedFetch(routes: Route[]) {
  const calls: { method: string; url: string; body: unknown }[] = [];
  const fetchMock = jest.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = String(input);
    const method = init?.method ?? 'GET';
    calls.push({ method, url, body: typeof init?.body === 'string' ? JSON.parse(init.body) : init?.body });
    const route = routes.find((r) => r.method === method && r.path.test(url));
    if (!route) return jsonResponse({ status: 404, body: { error: { code: 'ROUTE_NOT_FOUND', message: `${method} ${url}` } } });
    return jsonResponse(await route.reply(init));
  });
  global.fetch = fetchMock as unknown as typeof fetch;
  return { fetchMock, calls };
}

let queryClient: QueryClient | null = null;

export function renderWithQueries(ui: ReactElement) {
  // gcTime Infinity: no garbage-collection timers outlive a test and keep jest from exiting.
  queryClient = new QueryClient({
    defaultOptions: { queries: { retry: false, gcTime: Infinity }, mutations: { retry: false, gcTime: Infinity } },
  });
  const client = queryClient;
  const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={client}>{children}</QueryClientProvider>;
  return render(ui, { wrapper });
}

export function clearQueries() {
  queryClient?.clear();
  queryClient = null;
}

export const engineer: Me = { id: 'u-eng', email: 'engineer@demo.test', name: 'Sam Okafor', roles: ['engineer'], tenantId: null };
export const admin: Me = { id: 'u-adm', email: 'admin@demo.test', name: 'Ada Admin', roles: ['admin'], tenantId: null };

export function windowFixture(extra: Partial<Window> = {}): Window {
  return {
    id: 'w-1', title: 'Rectifier swap, Pellow Sands',
    startsAt: '2030-01-10T21:00:00.000Z', endsAt: '2030-01-11T01:00:00.000Z', durationHours: 4,
    workType: 'power work', notes: null, status: 'assessed', version: 3,
    owner: { id: 'u-eng', name: 'Sam Okafor' },
    elements: [{ kind: 'site', id: 'cell-pellow-sands', effect: 'down', fraction: null }],
    freezeOverrideReason: null, conflictCount: 0, touchesCritical: true, impactStored: true, mop: null,
    createdAt: '2029-12-01T10:00:00.000Z', updatedAt: '2029-12-01T10:00:00.000Z',
    ...extra,
  };
}

export const siteList = {
  items: [{
    id: 'cell-pellow-sands', name: 'Pellow Sands', kind: 'cell-site', lat: 55.1, lon: -26.2, cpu: 32, cpuUsed: 10,
    utilisation: 0.31, mtbfHours: null, mttrHours: null, spanCount: 2, sliceCount: 3,
  }],
  total: 1, page: 1, pageSize: 12,
};
