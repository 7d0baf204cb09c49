// "Your time zone" on the Security screen: the current zone named, an unknown zone refused without a request,
// a valid one sent as PATCH /api/me/time-zone, and the way back to the network's zone.
import { act, fireEvent, screen, waitFor } from '@testing-library/react-native';
import { TimeZoneSection } from '@/components/security/time-zone-section';
import { NETWORK_TIME_ZONE } from '@/shared/time-zone';
import { clearQueries, engineer, renderWithQueries, routedFetch } from './window-test-kit';

afterEach(clearQueries);

function serve(initial: { timeZone: string; timeZoneChosen: boolean }) {
  let current = initial;
  return routedFetch([
    { method: 'GET', path: /^\/api\/me$/, reply: () => ({ status: 200, body: { ...engineer, ...current } }) },
    {
      method: 'PATCH', path: /^\/api\/me\/time-zone$/, reply: (init) => {
        const { timeZone } = JSON.parse(String(init?.body)) as { timeZone: string | null };
        current = { timeZone: timeZone ?? NETWORK_TIME_ZONE, timeZoneChosen: timeZone !== null };
        return { status: 200, body: { ...engineer, ...current } };
      },
    },
  ]);
}

test('an unknown zone is refused in the form; a valid one is saved and named', async () => {
  const { calls } = serve({ timeZone: NETWORK_TIME_ZONE, timeZoneChosen: false });
  renderWithQueries(<TimeZoneSection />);
  await waitFor(() => expect(screen.getByTestId('time-zone-current')).toHaveTextContent(/GMT-1, the network's zone until you choose your own/));
  fireEvent.changeText(screen.getByTestId('time-zone-field'), 'Europe/Atlantis');
  fireEvent.press(screen.getByTestId('time-zone-save'));
  expect(screen.getByTestId('time-zone-field-error')).toHaveTextContent(/Not a known time zone/);
  expect(calls.filter((c) => c.method === 'PATCH')).toEqual([]);

  fireEvent.changeText(screen.getByTestId('time-zone-field'), 'Europe/Oslo');
  expect(screen.queryByTestId('time-zone-field-error')).toBeNull();
  await act(async () => fireEvent.press(screen.getByTestId('time-zone-save')));
  await waitFor(() => expect(screen.getByTestId('time-zone-current')).toHaveTextContent(/Europe\/Oslo \(CES?T\)/));
  expect(calls.find((c) => c.method === 'PATCH')?.body).toEqual({ timeZone: 'Europe/Oslo' });
});

test('typing part of a name offers matching zones to tap; the network zone can be chosen again', async () => {
  const { calls } = serve({ timeZone: 'Asia/Tokyo', timeZoneChosen: true });
  renderWithQueries(<TimeZoneSection />);
  await waitFor(() => expect(screen.getByTestId('time-zone-field').props.value).toBe('Asia/Tokyo'));
  fireEvent.changeText(screen.getByTestId('time-zone-field'), 'new york');
  fireEvent.press(screen.getByTestId('time-zone-suggestion-America/New_York'));
  expect(screen.getByTestId('time-zone-field').props.value).toBe('America/New_York');
  await act(async () => fireEvent.press(screen.getByTestId('time-zone-reset')));
  await waitFor(() => expect(calls.find((c) => c.method === 'PATCH')?.body).toEqual({ timeZone: null }));
});
