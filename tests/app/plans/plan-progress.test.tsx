// Progress of a running plan: the bar follows elapsed / time limit, and the round, best plan and time are shown.
import { fireEvent, screen } from '@testing-library/react-native';
import { PlanProgressView } from '@/components/plans/plan-progress';
import { elapsedFigure, formatDurationMs, progressFraction } from '@/components/plans/plan-format';
import { clearQueries, renderWithQueries } from '../window-test-kit';
import { objective, plan } from './plan-fixtures';

afterEach(clearQueries);

const running = plan({
  status: 'running', review: null,
  progress: {
    phase: 'searching', generation: 17, evaluations: 720, elapsedMs: 5_000, timeLimitMs: 20_000,
    best: objective({ unresolved: 2, unresolvedWeight: 6, moveCost: 12.5 }),
  },
});

test('a running plan shows its round, best objective so far and elapsed time, and the bar at a quarter', () => {
  const onCancel = jest.fn();
  renderWithQueries(<PlanProgressView plan={running} canCancel cancelling={false} cancelError={null} onCancel={onCancel} />);
  expect(screen.getByTestId('plan-progress-generation')).toHaveTextContent('17');
  expect(screen.getByTestId('plan-progress-elapsed')).toHaveTextContent('5.0 s of 20.0 s');
  expect(screen.getByTestId('plan-progress-evaluations')).toHaveTextContent('720');
  expect(screen.getByTestId('plan-progress-best')).toHaveTextContent(/2 slices cannot be kept \(6 priority points\) · move cost 12\.5 points/);
  expect(screen.getByTestId('plan-progress-bar').props['aria-valuenow']).toBe(25);
  expect(screen.getByTestId('plan-progress-fill')).toHaveStyle({ width: '25%' });
  fireEvent.press(screen.getByTestId('plan-cancel'));
  expect(onCancel).toHaveBeenCalledTimes(1);
});

test('a queued plan waits with an empty bar; without the planner role there is no cancel', () => {
  renderWithQueries(<PlanProgressView plan={plan({ status: 'queued', review: null, progress: null })} canCancel={false} cancelling={false} cancelError={null} onCancel={() => {}} />);
  expect(screen.getByTestId('plan-progress')).toHaveTextContent(/Waiting for a worker/);
  expect(screen.getByTestId('plan-progress-bar').props['aria-valuenow']).toBe(0);
  expect(screen.getByTestId('plan-progress-best')).toHaveTextContent(/none yet/);
  expect(screen.queryByTestId('plan-cancel')).toBeNull();
});

test('the bar never passes full, and stays full while the references run after the limit', () => {
  expect(progressFraction({ phase: 'searching', elapsedMs: 30_000, timeLimitMs: 20_000 })).toBe(1);
  expect(progressFraction({ phase: 'references', elapsedMs: 1_000, timeLimitMs: 20_000 })).toBe(1);
  expect(progressFraction({ phase: 'preparing', elapsedMs: 0, timeLimitMs: 0 })).toBe(0);
  expect([850, 12_400, 185_000].map(formatDurationMs)).toEqual(['850 ms', '12.4 s', '3 min 05 s']);
});

test('the time never claims more than the server knows: past the limit it says so, during the references it stops', () => {
  expect(elapsedFigure({ phase: 'searching', elapsedMs: 21_200 }, 20_000)).toBe('21.2 s (limit 20.0 s)');
  expect(elapsedFigure({ phase: 'references', elapsedMs: 12_300 }, 10_000)).toBe('12.3 s in all (search limit 10.0 s)');
  expect(elapsedFigure({ phase: 'finishing', elapsedMs: 3_100 }, 20_000)).toBe('3.1 s in all (search limit 20.0 s)');
  expect(elapsedFigure(null, 20_000)).toBe('0 ms of 20.0 s');
  const refs = plan({ status: 'running', review: null, progress: { ...running.progress!, phase: 'references', elapsedMs: 12_300, timeLimitMs: 10_000 } });
  renderWithQueries(<PlanProgressView plan={refs} canCancel={false} cancelling={false} cancelError={null} onCancel={() => {}} />);
  expect(screen.getByTestId('plan-progress-elapsed')).toHaveTextContent('12.3 s in all (search limit 10.0 s)');
  expect(screen.getByTestId('plan-progress-elapsed')).not.toHaveTextContent(/ of /);
});
