// Booking form: checks before sending (no POST on bad input), the body it sends in the viewer's zone,
// and a freeze refusal that keeps every input and asks an admin for a written reason.
import { act, fireEvent, screen, waitFor } from '@testing-library/react-native';
import { BookWindow } from '@/components/windows/book-window';
import { admin, clearQueries, engineer, renderWithQueries, routedFetch, siteList, windowFixture } from './window-test-kit';

jest.mock('expo-document-picker', () => ({ getDocumentAsync: jest.fn(async () => ({ canceled: true, assets: null })) }));

const OSLO = 'Europe/Oslo';
const policies = { policies: { maxWindowHours: 12, bookingSkewMinutes: 5, noticeLeadDays: 7 } };

afterEach(clearQueries);

function fill(testID: string, text: string) {
  fireEvent.changeText(screen.getByTestId(testID), text);
}

function fillTimes(start: [string, string], end: [string, string]) {
  fill('window-start-date', start[0]);
  fill('window-start-time', start[1]);
  fill('window-end-date', end[0]);
  fill('window-end-time', end[1]);
}

async function pickPellowSands() {
  fireEvent.press(await screen.findByTestId('window-element-option-cell-pellow-sands'));
  expect(screen.getByTestId('window-picked-cell-pellow-sands')).toBeTruthy();
}

test('bad input shows an error beside each field and never posts the window', async () => {
  const { calls } = routedFetch([
    { method: 'GET', path: /^\/api\/policies$/, reply: () => ({ status: 200, body: policies }) },
    { method: 'GET', path: /^\/api\/sites\?/, reply: () => ({ status: 200, body: siteList }) },
  ]);
  renderWithQueries(<BookWindow me={engineer} timeZone={OSLO} onSaved={jest.fn()} onCancel={jest.fn()} />);
  // Let the policies and the first element search arrive before typing.
  await screen.findByTestId('window-element-option-cell-pellow-sands');
  fillTimes(['2001-02-03', '10:00'], ['2001-02-03', '09:00']);
  fireEvent.press(screen.getByTestId('window-submit'));

  expect(screen.getByTestId('window-title-error')).toHaveTextContent('Give the window a title.');
  expect(screen.getByTestId('window-start-error')).toHaveTextContent(/past/);
  expect(screen.getByTestId('window-end-error')).toHaveTextContent('The window must end after it starts.');
  expect(screen.getByTestId('window-elements-error')).toHaveTextContent(/at least one site or span/);

  // A window longer than the policy allows, and a time that does not exist, are caught as well.
  fill('window-title', 'Rectifier swap');
  fillTimes(['2030-03-31', '02:30'], ['2030-04-01', '09:00']);
  fireEvent.press(screen.getByTestId('window-submit'));
  expect(screen.getByTestId('window-start-error')).toHaveTextContent(/skip that time/);
  fillTimes(['2030-04-01', '01:00'], ['2030-04-01', '14:00']);
  fireEvent.press(screen.getByTestId('window-submit'));
  await waitFor(() => expect(screen.getByTestId('window-end-error')).toHaveTextContent(/at most 12/));

  expect(calls.filter((c) => c.method !== 'GET')).toEqual([]);
});

test('a valid booking posts local times as ISO with the zone offset and hands the new id on', async () => {
  const onSaved = jest.fn();
  const { calls } = routedFetch([
    { method: 'GET', path: /^\/api\/sites\?/, reply: () => ({ status: 200, body: siteList }) },
    { method: 'POST', path: /^\/api\/windows$/, reply: () => ({ status: 201, body: { window: windowFixture({ id: 'w-new', status: 'draft' }), reverted: false, conflictCount: 1 } }) },
  ]);
  renderWithQueries(<BookWindow me={engineer} timeZone={OSLO} onSaved={onSaved} onCancel={jest.fn()} />);
  fill('window-title', '  Rectifier swap  ');
  // 22:00 in Oslo in January is 21:00 UTC; the end falls on the next day.
  fillTimes(['2030-01-10', '22:00'], ['2030-01-11', '02:00']);
  fireEvent.press(screen.getByTestId('window-work-type-power-work'));
  await pickPellowSands();
  fireEvent.press(screen.getByTestId('window-effect-cell-pellow-sands-reduced'));
  fill('window-fraction-cell-pellow-sands', '40');
  await act(async () => fireEvent.press(screen.getByTestId('window-submit')));

  await waitFor(() => expect(onSaved).toHaveBeenCalledWith({ id: 'w-new', reverted: false, conflictCount: 1, mopError: null }));
  const post = calls.find((c) => c.method === 'POST');
  expect(post?.body).toEqual({
    title: 'Rectifier swap',
    startsAt: '2030-01-10T22:00:00+01:00',
    endsAt: '2030-01-11T02:00:00+01:00',
    workType: 'power work',
    notes: null,
    elements: [{ kind: 'site', id: 'cell-pellow-sands', effect: 'reduced', fraction: 0.4 }],
    freezeOverrideReason: null,
  });
});

test('a freeze refusal keeps the input; an admin must give a reason, which is then sent', async () => {
  const freeze = { status: 409, body: { error: { code: 'FREEZE_CONFLICT', message: 'The window falls inside the freeze "Harbour festival".' } } };
  const booked = { status: 201, body: { window: windowFixture({ id: 'w-2' }), reverted: false, conflictCount: 0 } };
  const { calls, fetchMock } = routedFetch([
    { method: 'GET', path: /^\/api\/sites\?/, reply: () => ({ status: 200, body: siteList }) },
    { method: 'POST', path: /^\/api\/windows$/, reply: (init) => (JSON.parse(String(init?.body)).freezeOverrideReason ? booked : freeze) },
  ]);
  const onSaved = jest.fn();
  renderWithQueries(<BookWindow me={admin} timeZone={OSLO} onSaved={onSaved} onCancel={jest.fn()} />);
  fill('window-title', 'Urgent battery swap');
  fillTimes(['2030-07-01', '01:00'], ['2030-07-01', '03:00']);
  await pickPellowSands();
  await act(async () => fireEvent.press(screen.getByTestId('window-submit')));

  expect(await screen.findByTestId('window-freeze-refusal')).toHaveTextContent(/Harbour festival/);
  expect(screen.getByTestId('window-title').props.value).toBe('Urgent battery swap');
  expect(screen.getByTestId('window-picked-cell-pellow-sands')).toBeTruthy();

  fireEvent.press(screen.getByTestId('window-submit'));
  expect(screen.getByTestId('window-override-reason-error')).toHaveTextContent(/why this work must happen/);
  expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1);

  fill('window-override-reason', 'Batteries failed their test; the site would drop at the next outage.');
  await act(async () => fireEvent.press(screen.getByTestId('window-submit')));
  await waitFor(() => expect(onSaved).toHaveBeenCalled());
  expect(calls.filter((c) => c.method === 'POST')[1].body).toMatchObject({
    freezeOverrideReason: 'Batteries failed their test; the site would drop at the next outage.',
  });
  // Both submits of this one form carry the same key: the refused one booked nothing, so the key is still free.
  const keys = fetchMock.mock.calls.filter(([, init]) => init?.method === 'POST')
    .map(([, init]) => (init?.headers as Record<string, string>)['Idempotency-Key']);
  expect(keys).toHaveLength(2);
  expect(keys[0]).toMatch(/^[0-9a-zA-Z-]{16,}$/);
  expect(keys[1]).toBe(keys[0]);
});

test('a server validation error is shown beside its field', async () => {
  routedFetch([
    { method: 'GET', path: /^\/api\/sites\?/, reply: () => ({ status: 200, body: siteList }) },
    {
      method: 'POST', path: /^\/api\/windows$/,
      reply: () => ({ status: 400, body: { error: { code: 'UNKNOWN_ELEMENTS', message: 'These sites or spans do not exist: cell-pellow-sands.' } } }),
    },
  ]);
  renderWithQueries(<BookWindow me={engineer} timeZone={OSLO} onSaved={jest.fn()} onCancel={jest.fn()} />);
  fill('window-title', 'Rectifier swap');
  fillTimes(['2030-01-10', '22:00'], ['2030-01-11', '02:00']);
  await pickPellowSands();
  await act(async () => fireEvent.press(screen.getByTestId('window-submit')));
  expect(await screen.findByTestId('window-elements-error')).toHaveTextContent(/do not exist: cell-pellow-sands/);
  expect(screen.getByTestId('window-submit')).toBeEnabled();
});
