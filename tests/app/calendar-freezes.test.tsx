// Freezes screen: form validation (title, real dates, end after start), admin create, and read-only for others.
import type { ReactNode } from 'react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import type { Freeze } from '@/shared/freezes';
import { FreezesView } from '@/components/freezes/freezes-view';
import { useFreezeEditor } from '@/components/freezes/use-freeze-editor';
import { EMPTY_FREEZE_DRAFT, validateFreezeDraft } from '@/components/freezes/freeze-form-state';

const BERLIN = 'Europe/Berlin';
const NOW_MS = Date.parse('2026-12-01T12:00:00Z');

const yearEnd: Freeze = {
  id: 'f-1', title: 'Year-end freeze', startsAt: '2026-12-23T23:00:00.000Z', endsAt: '2026-12-26T23:00:00.000Z',
  reason: 'Holiday traffic', createdBy: 'u-admin', createdAt: '2026-11-01T00:00:00.000Z',
};
const autumn: Freeze = { ...yearEnd, id: 'f-0', title: 'Harvest fair', startsAt: '2026-10-01T00:00:00Z', endsAt: '2026-10-03T00:00:00Z', reason: null };

describe('freeze form validation', () => {
  const draft = { ...EMPTY_FREEZE_DRAFT, title: 'Fair', startDate: '2027-03-28', startTime: '00:00', endDate: '2027-03-29', endTime: '00:00' };

  test('a valid draft becomes a request with the zone offset of each end (CET then CEST)', () => {
    const result = validateFreezeDraft(draft, BERLIN);
    expect(result).toEqual({
      ok: true,
      value: { title: 'Fair', startsAt: '2027-03-28T00:00:00+01:00', endsAt: '2027-03-29T00:00:00+02:00', reason: null },
    });
  });

  test('title required, end after start, real dates only, a skipped wall time refused', () => {
    expect(validateFreezeDraft({ ...draft, title: '  ' }, BERLIN)).toEqual({ ok: false, errors: { title: 'Give the freeze a title.' } });
    expect(validateFreezeDraft({ ...draft, endDate: '2027-03-27' }, BERLIN)).toEqual({
      ok: false,
      errors: { end: 'The freeze must end after it starts.' },
    });
    expect(validateFreezeDraft({ ...draft, endDate: draft.startDate }, BERLIN)).toMatchObject({ ok: false });
    expect(validateFreezeDraft({ ...draft, startDate: '2027-02-30' }, BERLIN)).toMatchObject({ ok: false, errors: { start: expect.any(String) } });
    // 02:30 does not exist in Berlin on 28 March 2027 (clocks go from 02:00 to 03:00).
    expect(validateFreezeDraft({ ...draft, startTime: '02:30' }, BERLIN)).toMatchObject({ ok: false, errors: { start: expect.stringMatching(/does not exist/) } });
  });
});

const fetchMock = jest.fn<Promise<Response>, [RequestInfo | URL, RequestInit?]>();
let queryClient: QueryClient;

function jsonResponse(status: number, body: unknown): Response {
  const text = JSON.stringify(body);
  return { ok: status >= 200 && status < 300, status, text: async () => text, json: async () => body } as Response;
}

function Screen({ canEdit }: { canEdit: boolean }) {
  const editor = useFreezeEditor();
  return <FreezesView freezes={[yearEnd, autumn]} timeZone={BERLIN} canEdit={canEdit} editor={editor} nowMs={NOW_MS} />;
}

function renderScreen(canEdit: boolean) {
  queryClient = new QueryClient({ defaultOptions: { queries: { retry: false, gcTime: Infinity }, mutations: { retry: false, gcTime: Infinity } } });
  const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>;
  render(<Screen canEdit={canEdit} />, { wrapper });
}

beforeEach(() => {
  fetchMock.mockReset();
  global.fetch = fetchMock as unknown as typeof fetch;
});
afterEach(() => queryClient?.clear());

test('other staff see freezes in their zone, coming before past, with no way to change them', () => {
  renderScreen(false);
  expect(screen.getByTestId('freeze-f-1')).toHaveTextContent(/Thu 24 Dec, 00:00 – Sun 27 Dec, 00:00 CET · 3 d/);
  expect(screen.getByTestId('freeze-f-0')).toBeTruthy();
  expect(screen.queryByTestId('freeze-new')).toBeNull();
  expect(screen.queryByTestId('freeze-f-1-edit')).toBeNull();
  expect(screen.queryByTestId('freeze-f-1-delete')).toBeNull();
});

test('an admin gets field errors for a bad freeze without any request, then creates a good one', async () => {
  renderScreen(true);
  fireEvent.press(screen.getByTestId('freeze-new'));
  fireEvent.changeText(screen.getByTestId('freeze-start-date'), '2027-01-10');
  fireEvent.changeText(screen.getByTestId('freeze-end-date'), '2027-01-09');
  fireEvent.press(screen.getByTestId('freeze-save'));
  expect(screen.getByTestId('freeze-title-error')).toHaveTextContent('Give the freeze a title.');
  expect(screen.getByTestId('freeze-end-error')).toHaveTextContent('The freeze must end after it starts.');
  expect(fetchMock).not.toHaveBeenCalled();

  fetchMock.mockResolvedValue(jsonResponse(201, { ...yearEnd, id: 'f-2', title: 'Regatta' }));
  fireEvent.changeText(screen.getByTestId('freeze-title'), 'Regatta');
  fireEvent.changeText(screen.getByTestId('freeze-end-date'), '2027-01-12');
  fireEvent.press(screen.getByTestId('freeze-save'));
  await waitFor(() => expect(fetchMock).toHaveBeenCalled());
  const [url, init] = fetchMock.mock.calls[0];
  expect(url).toBe('/api/freezes');
  expect(init?.method).toBe('POST');
  expect(JSON.parse(String(init?.body))).toEqual({
    title: 'Regatta', startsAt: '2027-01-10T00:00:00+01:00', endsAt: '2027-01-12T00:00:00+01:00', reason: null,
  });
  await waitFor(() => expect(screen.queryByTestId('freeze-form')).toBeNull());
});

test('an admin deletes a freeze only after confirming', async () => {
  renderScreen(true);
  fireEvent.press(screen.getByTestId('freeze-f-1-delete'));
  expect(fetchMock).not.toHaveBeenCalled();
  fetchMock.mockResolvedValue(jsonResponse(204, null));
  fireEvent.press(screen.getByTestId('freeze-f-1-confirm-delete'));
  await waitFor(() => expect(fetchMock).toHaveBeenCalledWith('/api/freezes/f-1', expect.objectContaining({ method: 'DELETE' })));
});
