// The runs screen and polling: a run's result appears by itself once the worker finishes; the form sends settings,
// shows the server's validation by field, and opens pre-filled for "adjust and re-run"; runs list newest first.
import { act, fireEvent, screen, waitFor } from '@testing-library/react-native';
import { Text } from 'react-native';
import { usePlanQuery, PLAN_POLL_INTERVAL_MS } from '@/hooks/queries/plans';
import { PlanRunForm } from '@/components/plans/plan-run-form';
import { PlanRunList } from '@/components/plans/plan-run-list';
import { errorsFromApi, settingsFromForm, formFromSettings } from '@/components/plans/plan-form-state';
import { ApiError } from '@/hooks/api-fetch';
import type { PlanListItem } from '@/shared/plans';
import { clearQueries, renderWithQueries, routedFetch } from '../window-test-kit';
import { plan } from './plan-fixtures';

afterEach(() => {
  clearQueries();
  jest.useRealTimers();
});

function StatusProbe({ planId }: { planId: string }) {
  const query = usePlanQuery(planId);
  return <Text testID="probe">{query.data ? `${query.data.plan.status} ${query.data.plan.progress?.generation ?? '-'}` : 'loading'}</Text>;
}

test('a running plan is asked for again every second until it is done, then no more', async () => {
  jest.useFakeTimers();
  const replies = [
    plan({ status: 'running', review: null, progress: { phase: 'searching', generation: 3, evaluations: 120, best: null, elapsedMs: 1000, timeLimitMs: 5000 } }),
    plan({ status: 'running', review: null, progress: { phase: 'searching', generation: 9, evaluations: 360, best: null, elapsedMs: 2000, timeLimitMs: 5000 } }),
    plan(),
  ];
  let served = 0;
  routedFetch([{ method: 'GET', path: /\/api\/plans\/p-1$/, reply: () => ({ status: 200, body: { plan: replies[Math.min(served++, replies.length - 1)] } }) }]);
  renderWithQueries(<StatusProbe planId="p-1" />);
  await waitFor(() => expect(screen.getByTestId('probe')).toHaveTextContent('running 3'));
  await act(async () => { jest.advanceTimersByTime(PLAN_POLL_INTERVAL_MS); });
  await waitFor(() => expect(screen.getByTestId('probe')).toHaveTextContent('running 9'));
  await act(async () => { jest.advanceTimersByTime(PLAN_POLL_INTERVAL_MS); });
  await waitFor(() => expect(screen.getByTestId('probe')).toHaveTextContent('done -'));
  await act(async () => { jest.advanceTimersByTime(PLAN_POLL_INTERVAL_MS * 5); });
  expect(served).toBe(3);
});

test('the form sends the settings typed and places the server’s complaints next to their fields', async () => {
  const { calls } = routedFetch([{
    method: 'POST', path: /\/api\/windows\/w-1\/plans$/,
    reply: () => ({ status: 400, body: { error: { code: 'VALIDATION_FAILED', message: '$.pinned[0]: unknown function', details: [{ path: '$.pinned[0]', message: 'Function "f-9" is not in this window.' }] } } }),
  }]);
  const onQueued = jest.fn();
  renderWithQueries(
    <PlanRunForm windowId="w-1" functionOptions={[{ id: 'f-9', label: 'f-9 · Aldmouth' }]} siteOptions={[{ id: 'core-x', label: 'Corran' }]} onQueued={onQueued} />,
  );
  fireEvent.changeText(screen.getByTestId('plan-form-time-limit'), '3');
  fireEvent.press(screen.getByTestId('plan-form-effort-thorough'));
  fireEvent(screen.getByTestId('plan-form-both-cores'), 'valueChange', true);
  // The exact figures sit folded under "Repeatable run" while the effort names them.
  expect(screen.queryByTestId('plan-form-seed')).toBeNull();
  fireEvent.press(screen.getByTestId('plan-form-pinned-f-9'));
  fireEvent.press(screen.getByTestId('plan-form-excluded-core-x'));
  await act(async () => fireEvent.press(screen.getByTestId('plan-form-submit')));
  await waitFor(() => expect(screen.getByTestId('plan-form-pinned-error')).toHaveTextContent(/not in this window/));
  expect(calls[0].body).toEqual({
    mode: 'islands', seed: 1, population: 100, timeLimitSeconds: 3, pinned: ['f-9'], excludedSites: ['core-x'], afterWindow: 'return',
    knockOn: true, maxKnockOnMoves: 5,
  });
  expect(onQueued).not.toHaveBeenCalled();
});

test('bad numbers are caught before sending; a re-run starts from the earlier run’s settings', () => {
  const { calls } = routedFetch([]);
  const earlier = plan().settings;
  renderWithQueries(<PlanRunForm windowId="w-1" initial={earlier} functionOptions={[]} siteOptions={[]} onQueued={() => {}} />);
  fireEvent.press(screen.getByTestId('plan-form-repeatable-toggle'));
  expect(screen.getByTestId('plan-form-seed').props.value).toBe('7');
  expect(screen.getByTestId('plan-form-excluded')).toHaveTextContent(/Sites to leave out \(1\)/);
  fireEvent.changeText(screen.getByTestId('plan-form-population'), '3');
  fireEvent.press(screen.getByTestId('plan-form-submit'));
  expect(screen.getByTestId('plan-form-population-error')).toHaveTextContent(/8 to 400/);
  expect(calls).toHaveLength(0);
  expect(settingsFromForm({ ...formFromSettings(), timeLimitSeconds: '' })).toEqual({ errors: { timeLimitSeconds: 'Seconds, from 1 to 600.' } });
  expect(errorsFromApi(new ApiError(409, 'WINDOW_NOT_ASSESSED', 'Assess the window first.'))).toEqual({ form: 'Assess the window first.' });
});

test('runs are listed newest first with their totals or their failure', () => {
  const { review: _review, ...base } = plan();
  const item = (id: string, createdAt: string, extra: Partial<PlanListItem> = {}): PlanListItem => ({ ...base, id, createdAt, totals: null, ...extra });
  const runs = [
    item('p-old', '2030-01-01T08:00:00.000Z', { totals: { stays: 1, moved: 2, rerouted: 3, unresolved: 0, moveCost: 4.5, knockOn: 0 }, accepted: true }),
    item('p-new', '2030-01-01T09:00:00.000Z', { status: 'failed', error: 'No worker answered.' }),
  ];
  const onOpen = jest.fn();
  renderWithQueries(<PlanRunList plans={runs} timeZone="UTC" onOpen={onOpen} />);
  const rows = screen.getAllByTestId(/^plan-row-p-/);
  expect(rows.map((r) => r.props.testID)).toEqual(['plan-row-p-new', 'plan-row-p-old']);
  expect(rows[0]).toHaveTextContent(/No worker answered\./);
  expect(rows[1]).toHaveTextContent(/2 moved · 3 rerouted · 0 cannot be kept · move cost 4\.5 points/);
  expect(rows[1]).toHaveTextContent(/Accepted/);
  fireEvent.press(rows[1]);
  expect(onOpen).toHaveBeenCalledWith('p-old');
  // A keyboard opens the run too: Enter on the link (it has no address for the browser to follow).
  fireEvent(rows[0], 'keyDown', { key: 'Enter', preventDefault: () => undefined });
  expect(onOpen).toHaveBeenLastCalledWith('p-new');
});
