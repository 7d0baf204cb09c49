// Accepting a plan asks once more and says what it commits to: how many slices move, which cannot be kept, that it
// replaces an earlier accepted plan, and that sign-off comes next; "Not yet" sends nothing.
import { act, fireEvent, screen, waitFor } from '@testing-library/react-native';
import type { PlanListItem } from '@/shared/plans';
import { PlanReviewView } from '@/components/plans/plan-review';
import { acceptCommitments } from '@/components/plans/plan-accept-bar';
import { clearQueries, renderWithQueries, routedFetch } from '../window-test-kit';
import { knockOnReview, networkMap, plan, review } from './plan-fixtures';

const links = { onAdjust: jest.fn(), onReschedule: jest.fn(), onAddCapacity: jest.fn() };

beforeEach(() => jest.useFakeTimers());
afterEach(() => {
  clearQueries();
  jest.useRealTimers();
});

function listed(id: string, accepted: boolean): PlanListItem {
  const { review: _review, ...rest } = plan({ id, accepted });
  return { ...rest, totals: null };
}

function show(runs: PlanListItem[]) {
  const fetched = routedFetch([
    { method: 'GET', path: /\/api\/network\/map$/, reply: () => ({ status: 200, body: networkMap }) },
    { method: 'GET', path: /\/api\/windows\/w-1\/plans$/, reply: () => ({ status: 200, body: { plans: runs } }) },
    { method: 'POST', path: /\/api\/plans\/p-1\/accept$/, reply: () => ({ status: 200, body: { plan: plan({ accepted: true }) } }) },
  ]);
  const p = plan();
  renderWithQueries(<PlanReviewView plan={p} review={p.review!} canAct wide={false} {...links} />);
  return fetched;
}

test('the confirmation counts the moves and names the outage; "Not yet" goes back without accepting', async () => {
  const { calls } = show([listed('p-1', false)]);
  fireEvent.press(screen.getByTestId('plan-outage-sl-plc'));
  fireEvent.press(screen.getByTestId('plan-accept'));
  const confirm = screen.getByTestId('plan-accept-confirm');
  // The fixture review has one slice that moves (sl-port), one rerouted (sl-fair) and one unresolved (sl-plc).
  expect(confirm).toHaveTextContent(/2 slices change place when the work starts: 1 moves to other sites, 1 is rerouted\./);
  expect(confirm).toHaveTextContent(/1 slice cannot be kept in service and will have an outage during the window: Press line control\./);
  expect(confirm).toHaveTextContent(/no other plan is accepted yet/);
  expect(confirm).toHaveTextContent(/submits it for sign-off/);
  fireEvent.press(screen.getByTestId('plan-accept-no'));
  expect(screen.queryByTestId('plan-accept-confirm')).toBeNull();
  expect(calls.some((c) => c.method === 'POST')).toBe(false);
});

test('with an earlier accepted plan the confirmation says it is replaced, and the request names that plan', async () => {
  const { calls } = show([listed('p-0', true), listed('p-1', false)]);
  fireEvent.press(screen.getByTestId('plan-outage-sl-plc'));
  await waitFor(() => expect(calls.some((c) => c.url.endsWith('/api/windows/w-1/plans'))).toBe(true));
  fireEvent.press(screen.getByTestId('plan-accept'));
  await waitFor(() => expect(screen.getByTestId('plan-accept-confirm')).toHaveTextContent(/replaces the plan accepted earlier/));
  await act(async () => fireEvent.press(screen.getByTestId('plan-accept-yes')));
  await waitFor(() => expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ outageAccepted: ['sl-plc'], replacesPlanId: 'p-0' }));
});

test('knock-on moves are counted as moves made only to make room; a plan that keeps everything says so', () => {
  const withKnockOn = acceptCommitments(knockOnReview(), false);
  expect(withKnockOn[0]).toMatch(/^3 slices change place when the work starts: 1 moves to other sites, 2 are rerouted \(1 of them untouched by the work, moved only to make room\)\.$/);
  const still = review({ slices: review().slices.map((s) => ({ ...s, outcome: 'stays' as const })) });
  expect(acceptCommitments(still, false).slice(0, 2)).toEqual([
    'No slice moves: every affected slice stays where it is.',
    'Every affected slice stays in service.',
  ]);
});
