// Review of a finished plan: totals, per-slice outcomes with before → after, flagged steps, references, risk, and
// "Accept plan" held back until every unresolved slice's outage is ticked; a refusal shows the server's reason.
import { act, fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import { PlanDetailView } from '@/components/plans/plan-detail-view';
import { PlanReviewView } from '@/components/plans/plan-review';
import { clearQueries, renderWithQueries, routedFetch, type Reply } from '../window-test-kit';
import { approver, networkMap, plan, planner } from './plan-fixtures';

const links = { onOpenRuns: jest.fn(), onAdjust: jest.fn(), onReschedule: jest.fn(), onAddCapacity: jest.fn() };

beforeEach(() => {
  // gifted-charts animates with timers; fake ones keep them inside the test.
  jest.useFakeTimers();
});
afterEach(() => {
  clearQueries();
  jest.useRealTimers();
});

function show(acceptReply: Reply = { status: 200, body: { plan: plan({ accepted: true }) } }, me = planner, p = plan()) {
  const fetched = routedFetch([
    { method: 'GET', path: /\/api\/network\/map$/, reply: () => ({ status: 200, body: networkMap }) },
    { method: 'POST', path: /\/api\/plans\/p-1\/accept$/, reply: () => acceptReply },
  ]);
  renderWithQueries(<PlanDetailView plan={p} windowTitle="Rectifier swap" me={me} timeZone="UTC" {...links} />);
  return fetched;
}

test('totals, outcomes with before → after by name, the flagged step, references and risk are shown', async () => {
  show();
  expect(screen.getByTestId('plan-total-moved')).toHaveTextContent('1');
  expect(screen.getByTestId('plan-total-unresolved')).toHaveTextContent('1');
  expect(screen.getByTestId('plan-total-move-cost')).toHaveTextContent('3.25');
  expect(screen.getByTestId('plan-slice-outcome-sl-port')).toHaveTextContent('Move');
  expect(screen.getByTestId('plan-slice-outcome-sl-fair')).toHaveTextContent('Reroute');
  expect(screen.getByTestId('plan-slice-outcome-sl-quiet')).toHaveTextContent('Stays');
  expect(screen.getByTestId('plan-slice-outcome-sl-plc')).toHaveTextContent('Unresolved');
  // Names arrive with the network map.
  // Site names arrive with the network map; no internal id reaches the reader.
  await waitFor(() => expect(screen.getByTestId('plan-move-sl-port-gw')).toHaveTextContent('a function: from Aldmouth to Brackwell'));
  expect(screen.getByTestId('plan-move-sl-port-gw')).not.toHaveTextContent(/sl-port|edge-a|agg-b/);
  expect(screen.getByTestId('plan-reroute-sl-port-t1')).toHaveTextContent(/A link: from Aldmouth → Corran.*to Aldmouth → Brackwell → Corran/s);
  expect(screen.getByTestId('plan-total-move-cost-definition')).toHaveTextContent(/each link rerouted adds 0\.25/);
  expect(screen.getByTestId('plan-risk-scale')).toHaveTextContent(/Medium = priority 2–3/);
  expect(screen.getByTestId('plan-slice-sl-plc')).toHaveTextContent(/the PLC is fixed to site Edge A, which is down/);

  expect(screen.getByTestId('plan-steps-spare-count')).toHaveTextContent(/1 step needs temporary spare capacity/);
  expect(screen.getByTestId('plan-step-spare-1')).toHaveTextContent('Needs spare capacity');
  expect(screen.queryByTestId('plan-step-spare-0')).toBeNull();
  expect(screen.queryByTestId('plan-step-spare-2')).toBeNull();

  expect(screen.getByTestId('plan-ref-greedy')).toHaveTextContent(/2 slices cannot be kept \(8 priority points\) · move cost 6\.5 points/);
  // Without the window's impact the plan's own slices give the shared counts; the run time says it is wall time.
  expect(screen.getByTestId('touch-count-touched')).toHaveTextContent(String(plan().review!.slices.filter((x) => x.madeRoomFor.length === 0).length));
  expect(screen.getByTestId('touch-count-unresolved')).toHaveTextContent('1');
  expect(screen.getByTestId('plan-run-time')).toHaveTextContent(/^search .* wall time/);
  expect(screen.getByTestId('plan-ref-exact')).toHaveTextContent(/gap to the bound 4\.2 %/);
  expect(screen.getByTestId('plan-risk-sl-quiet')).toHaveTextContent(/12\.0 %|12 %/);
  expect(screen.getByTestId('plan-risk-unprotected-sl-quiet')).toBeTruthy();
  expect(screen.getByTestId('plan-map')).toBeTruthy();
  expect(screen.getByTestId('plan-convergence')).toBeTruthy();
  expect(screen.queryByTestId('plan-critical-caution')).toBeNull();
});

test('Accept stays disabled until the unresolved slice is ticked, then sends it as an accepted outage', async () => {
  const { calls } = show();
  const accept = screen.getByTestId('plan-accept');
  expect(accept).toBeDisabled();
  expect(screen.getByTestId('plan-accept-hint')).toHaveTextContent(/Tick the outage/);
  fireEvent.press(accept);
  expect(calls.some((c) => c.method === 'POST')).toBe(false);

  fireEvent.press(screen.getByTestId('plan-outage-sl-plc'));
  expect(screen.getByTestId('plan-accept')).not.toBeDisabled();
  fireEvent.press(screen.getByTestId('plan-accept'));
  await act(async () => fireEvent.press(screen.getByTestId('plan-accept-yes')));
  await waitFor(() => expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ outageAccepted: ['sl-plc'] }));
});

test('a refusal shows the reason; the three choices for unresolved slices lead on', async () => {
  show({ status: 409, body: { error: { code: 'PLAN_NO_LONGER_FITS', message: 'Span sp-3 is now full because another plan was accepted.' } } });
  fireEvent.press(screen.getByTestId('plan-outage-sl-plc'));
  fireEvent.press(screen.getByTestId('plan-accept'));
  await act(async () => fireEvent.press(screen.getByTestId('plan-accept-yes')));
  await waitFor(() => expect(screen.getByTestId('plan-accept-error')).toHaveTextContent(/sp-3 is now full/));
  fireEvent.press(screen.getByTestId('plan-choice-reschedule'));
  fireEvent.press(screen.getByTestId('plan-choice-capacity'));
  fireEvent.press(screen.getByTestId('plan-adjust'));
  expect(links.onReschedule).toHaveBeenCalled();
  expect(links.onAddCapacity).toHaveBeenCalledWith('imports');
  expect(links.onAdjust).toHaveBeenCalled();
});

test('a critical slice brings the caution; people who are not planners get no accept, no ticks', () => {
  const critical = plan();
  critical.review!.slices = critical.review!.slices.map((s) => (s.slice === 'sl-fair' ? { ...s, critical: true } : s));
  show(undefined, approver, critical);
  expect(within(screen.getByTestId('plan-critical-caution')).getByText(/Fairground video/)).toBeTruthy();
  expect(screen.queryByTestId('plan-accept')).toBeNull();
  expect(screen.queryByTestId('plan-outage-sl-plc')).toBeNull();
  expect(screen.getByTestId('plan-unresolved-sl-plc')).toBeTruthy();
});

test('failed runs show their error and stale runs say the window changed', () => {
  show(undefined, planner, plan({ status: 'failed', review: null, error: 'The worker stopped three times.', stale: true }));
  expect(screen.getByTestId('plan-failed')).toHaveTextContent(/The worker stopped three times\./);
  expect(screen.getByTestId('plan-stale')).toHaveTextContent(/window was changed/);
});

test('on a wide screen the decision sits on the left and the evidence on the right; a phone has one column', async () => {
  routedFetch([{ method: 'GET', path: /\/api\/network\/map$/, reply: () => ({ status: 200, body: networkMap }) }]);
  const p = plan();
  const view = (wide: boolean) => <PlanReviewView plan={p} review={p.review!} canAct wide={wide} {...links} />;
  const { rerender } = renderWithQueries(view(true));
  const decision = within(screen.getByTestId('plan-review-decision'));
  const evidence = within(screen.getByTestId('plan-review-evidence'));
  await waitFor(() => expect(evidence.getByTestId('plan-map')).toBeTruthy());
  for (const id of ['plan-totals', 'plan-unresolved', 'plan-outage-sl-plc', 'plan-accept', 'plan-adjust', 'plan-slices']) {
    expect(decision.getByTestId(id)).toBeTruthy();
    expect(evidence.queryByTestId(id)).toBeNull();
  }
  for (const id of ['plan-map', 'plan-convergence', 'plan-references', 'plan-steps', 'plan-risk']) {
    expect(evidence.getByTestId(id)).toBeTruthy();
    expect(decision.queryByTestId(id)).toBeNull();
  }
  rerender(view(false));
  expect(screen.queryByTestId('plan-review-decision')).toBeNull();
  expect(screen.getByTestId('plan-accept')).toBeTruthy();
  expect(screen.getByTestId('plan-map')).toBeTruthy();
});
