// Editing a window: only changed fields are sent with the loaded version; a stale edit shows the reload notice
// and keeps the input; an edit that sent the window back to draft says so on its page.
import { act, fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import { EditWindow } from '@/components/windows/edit-window';
import { REVERTED_MESSAGE, WindowNotices } from '@/components/windows/window-notices';
import { SAVE_MESSAGES } from '@/components/windows/window-save-errors';
import { clearQueries, engineer, renderWithQueries, routedFetch, siteList, windowFixture } from './window-test-kit';

jest.mock('expo-document-picker', () => ({ getDocumentAsync: jest.fn(async () => ({ canceled: true, assets: null })) }));

const OSLO = 'Europe/Oslo';

afterEach(clearQueries);

function renderEdit(onReload = jest.fn(async () => undefined), onSaved = jest.fn()) {
  renderWithQueries(
    <EditWindow window={windowFixture()} me={engineer} timeZone={OSLO} onReload={onReload} reloading={false} onSaved={onSaved} onCancel={jest.fn()} />,
  );
  return { onReload, onSaved };
}

test('the form opens with the window in the viewer zone and sends only what changed, with the version', async () => {
  const { calls } = routedFetch([
    { method: 'GET', path: /^\/api\/sites\?/, reply: () => ({ status: 200, body: siteList }) },
    { method: 'PATCH', path: /^\/api\/windows\/w-1$/, reply: () => ({ status: 200, body: { window: windowFixture({ version: 4 }), reverted: false, conflictCount: 0 } }) },
  ]);
  const { onSaved } = renderEdit();
  await screen.findByTestId('window-element-option-cell-pellow-sands');
  // 21:00 UTC on 10 Jan is 22:00 in Oslo.
  expect(screen.getByTestId('window-start-date').props.value).toBe('2030-01-10');
  expect(screen.getByTestId('window-start-time').props.value).toBe('22:00');
  fireEvent.changeText(screen.getByTestId('window-title'), 'Rectifier swap, second attempt');
  await act(async () => fireEvent.press(screen.getByTestId('window-submit')));
  await waitFor(() => expect(onSaved).toHaveBeenCalledWith({ id: 'w-1', reverted: false, conflictCount: 0, mopError: null }));
  expect(calls.find((c) => c.method === 'PATCH')?.body).toEqual({ version: 3, title: 'Rectifier swap, second attempt' });
});

test('a 409 STALE_VERSION shows the reload notice, keeps the input, and Reload asks for the newer window', async () => {
  routedFetch([
    { method: 'GET', path: /^\/api\/sites\?/, reply: () => ({ status: 200, body: siteList }) },
    {
      method: 'PATCH', path: /^\/api\/windows\/w-1$/,
      reply: () => ({ status: 409, body: { error: { code: 'STALE_VERSION', message: 'This window was changed by someone else; reload and try again.' } } }),
    },
  ]);
  const { onReload, onSaved } = renderEdit();
  await screen.findByTestId('window-element-option-cell-pellow-sands');
  fireEvent.changeText(screen.getByTestId('window-notes'), 'Bring the spare rectifier module.');
  await act(async () => fireEvent.press(screen.getByTestId('window-submit')));

  const notice = await screen.findByTestId('window-stale');
  expect(notice).toHaveTextContent(SAVE_MESSAGES.stale, { exact: false });
  expect(SAVE_MESSAGES.stale).toBe('Someone else changed this window — reload to see their changes.');
  expect(screen.getByTestId('window-notes').props.value).toBe('Bring the spare rectifier module.');
  expect(onSaved).not.toHaveBeenCalled();

  await act(async () => fireEvent.press(screen.getByTestId('window-reload')));
  expect(onReload).toHaveBeenCalledTimes(1);
  await waitFor(() => expect(screen.queryByTestId('window-stale')).toBeNull());
  expect(screen.getByTestId('window-reloaded')).toBeTruthy();
  expect(screen.getByTestId('window-notes').props.value).toBe('Bring the spare rectifier module.');
});

test('an edit that moved the window reports reverted, and the window page says it is back to draft', async () => {
  routedFetch([
    { method: 'GET', path: /^\/api\/sites\?/, reply: () => ({ status: 200, body: siteList }) },
    {
      method: 'PATCH', path: /^\/api\/windows\/w-1$/,
      reply: () => ({ status: 200, body: { window: windowFixture({ version: 4, status: 'draft' }), reverted: true, conflictCount: 0 } }),
    },
  ]);
  const { onSaved } = renderEdit();
  await screen.findByTestId('window-element-option-cell-pellow-sands');
  fireEvent.changeText(screen.getByTestId('window-end-time'), '03:00');
  await act(async () => fireEvent.press(screen.getByTestId('window-submit')));
  await waitFor(() => expect(onSaved).toHaveBeenCalledWith(expect.objectContaining({ reverted: true })));

  render(<WindowNotices flash={{ saved: 'edited', reverted: true }} window={windowFixture({ status: 'draft' })} />);
  expect(screen.getByTestId('window-flash-reverted')).toHaveTextContent(REVERTED_MESSAGE);
  expect(screen.queryByTestId('window-flash-saved')).toBeNull();
});
