// The booking form's help with times and errors: the error summary beside the submit button, errors that go as
// soon as their field is fixed, the date and time pickers, lenient typing, and the warning before changing the
// times of a window whose tenants were told them.
import { act, fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import { BookWindow } from '@/components/windows/book-window';
import { EditWindow } from '@/components/windows/edit-window';
import { clearQueries, engineer, renderWithQueries, routedFetch, siteList, windowFixture } from './window-test-kit';

jest.mock('expo-document-picker', () => ({ getDocumentAsync: jest.fn(async () => ({ canceled: true, assets: null })) }));

const OSLO = 'Europe/Oslo';
const policies = { policies: { maxWindowHours: 12, bookingSkewMinutes: 5, noticeLeadDays: 7 } };

afterEach(clearQueries);

function fill(testID: string, text: string) {
  fireEvent.changeText(screen.getByTestId(testID), text);
}

async function renderBooking(onSaved = jest.fn()) {
  const { calls } = routedFetch([
    { method: 'GET', path: /^\/api\/policies$/, reply: () => ({ status: 200, body: policies }) },
    { method: 'GET', path: /^\/api\/sites\?/, reply: () => ({ status: 200, body: siteList }) },
    { method: 'POST', path: /^\/api\/windows$/, reply: () => ({ status: 201, body: { window: windowFixture({ id: 'w-9', status: 'draft', version: 1 }), conflictCount: 0 } }) },
  ]);
  renderWithQueries(<BookWindow me={engineer} timeZone={OSLO} onSaved={onSaved} onCancel={jest.fn()} />);
  await screen.findByTestId('window-element-option-cell-pellow-sands');
  return { calls, onSaved };
}

test('a failed submit lists every error beside the button, and each one goes as soon as its field is fixed', async () => {
  await renderBooking();
  fireEvent.press(screen.getByTestId('window-submit'));
  const summary = screen.getByTestId('form-error-summary');
  expect(within(summary).getByTestId('form-error-summary-title')).toHaveTextContent(/Title: Give the window a title/);
  expect(within(summary).getByTestId('form-error-summary-start')).toBeTruthy();
  expect(within(summary).getByTestId('form-error-summary-elements')).toBeTruthy();

  fill('window-title', 'Rectifier swap');
  expect(screen.queryByTestId('window-title-error')).toBeNull();
  expect(screen.queryByTestId('form-error-summary-title')).toBeNull();
  // Pressing a summary entry is safe where there is no page to scroll (native tests), and the entry stays.
  fireEvent.press(screen.getByTestId('form-error-summary-start'));
  expect(screen.getByTestId('form-error-summary-start')).toBeTruthy();
});

test('the pickers fill the fields, and the booking is sent in the viewer zone as ISO with the offset', async () => {
  const { calls } = await renderBooking();
  fill('window-title', 'Rectifier swap');
  fill('window-start-date', '2030-01-10');
  fireEvent.press(screen.getByTestId('window-start-time-pick'));
  fireEvent.press(within(screen.getByTestId('time-picker-start')).getByTestId('time-picker-start-2215'));
  expect(screen.queryByTestId('time-picker-start')).toBeNull();
  expect(screen.getByTestId('window-start-time').props.value).toBe('22:15');

  fireEvent.press(screen.getByTestId('window-end-date-pick'));
  expect(screen.getByTestId('date-picker-end')).toBeTruthy();
  fireEvent.press(screen.getByText('11'));
  expect(screen.getByTestId('window-end-date').props.value).toBe('2030-01-11');
  fill('window-end-time', '0100');
  fireEvent(screen.getByTestId('window-end-time'), 'blur');
  expect(screen.getByTestId('window-end-time').props.value).toBe('01:00');

  fireEvent.press(screen.getByTestId('window-element-option-cell-pellow-sands'));
  await act(async () => fireEvent.press(screen.getByTestId('window-submit')));
  await waitFor(() => expect(calls.some((c) => c.method === 'POST')).toBe(true));
  const body = calls.find((c) => c.method === 'POST')?.body as { startsAt: string; endsAt: string };
  expect(body.startsAt).toBe('2030-01-10T22:15:00+01:00');
  expect(body.endsAt).toBe('2030-01-11T01:00:00+01:00');
});

test.each([
  ['20300110 2200', '2030-01-10', '22:00'],
  ['2030-01-10 22:00', '2030-01-10', '22:00'],
  ['10 Jan 2030 22:00', '2030-01-10', '22:00'],
])('typing "%s" into the date field is read as a date and a time', async (typed, date, time) => {
  await renderBooking();
  fill('window-start-date', typed);
  fireEvent(screen.getByTestId('window-start-date'), 'blur');
  expect(screen.getByTestId('window-start-date').props.value).toBe(date);
  expect(screen.getByTestId('window-start-time').props.value).toBe(time);
  // Neither field asks for a numeric keypad, which has no "-" or ":" on phones.
  expect(screen.getByTestId('window-start-date').props.inputMode).toBeUndefined();
  expect(screen.getByTestId('window-start-date').props.keyboardType).toBe('numbers-and-punctuation');
});

function renderEdit(status: 'notified' | 'assessed') {
  routedFetch([
    { method: 'GET', path: /^\/api\/policies$/, reply: () => ({ status: 200, body: policies }) },
    { method: 'GET', path: /^\/api\/sites\?/, reply: () => ({ status: 200, body: siteList }) },
  ]);
  renderWithQueries(
    <EditWindow window={windowFixture({ status })} me={engineer} timeZone={OSLO} onReload={jest.fn(async () => undefined)} reloading={false} onSaved={jest.fn()} onCancel={jest.fn()} />,
  );
}

test('changing the times of a notified window warns that tenants get a changed notice; other edits do not', async () => {
  renderEdit('notified');
  await screen.findByTestId('window-element-option-cell-pellow-sands');
  fill('window-title', 'New title');
  expect(screen.queryByTestId('window-time-change-warning')).toBeNull();
  fill('window-start-time', '23:00');
  expect(screen.getByTestId('window-time-change-warning')).toHaveTextContent(/changed notice/);
  // Back to the stored time, typed differently: nothing changed, no warning.
  fill('window-start-time', '22:00');
  expect(screen.queryByTestId('window-time-change-warning')).toBeNull();
});

test('a window whose tenants were not told yet shows no warning when its times change', async () => {
  renderEdit('assessed');
  await screen.findByTestId('window-element-option-cell-pellow-sands');
  fill('window-start-time', '23:00');
  expect(screen.queryByTestId('window-time-change-warning')).toBeNull();
});
