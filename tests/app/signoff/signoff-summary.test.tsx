// Sign-off summary on a phone: the facts an approver weighs, the caution for critical services, and a decision that
// needs a comment and (by policy) a one-time code; server refusals land beside the right field.
import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { SignoffSummaryView } from '@/components/signoff/signoff-summary-view';
import { useSignoffDecisionMutation } from '@/hooks/queries/signoff';
import type { SignoffSummary } from '@/shared/signoff';
import { clearQueries, renderWithQueries, routedFetch } from '../window-test-kit';
import { summaryFixture } from './signoff-fixtures';

afterEach(clearQueries);

function Harness({ summary, onOpenPlan }: { summary: SignoffSummary; onOpenPlan: (href: string) => void }) {
  const decision = useSignoffDecisionMutation(summary.window.id);
  return (
    <SignoffSummaryView
      summary={summary} timeZone="Europe/Oslo" codeEnrolled deciding={decision.isPending} decisionError={decision.error}
      onDecide={(body) => decision.mutate(body)} onOpenPlan={onOpenPlan} onEnrol={jest.fn()}
    />
  );
}

const render = (summary = summaryFixture(), onOpenPlan = jest.fn()) => {
  renderWithQueries(<Harness summary={summary} onOpenPlan={onOpenPlan} />);
  return { onOpenPlan };
};

test('shows what, when (viewer zone), who moves, unresolved slices, risk with the quorum, the caution and earlier decisions', () => {
  const { onOpenPlan } = render();
  expect(screen.getByTestId('signoff-title')).toHaveTextContent('Fibre splice, Gullhaven ring');
  // 21:00 UTC is 22:00 in Oslo in January (CET).
  expect(screen.getByTestId('signoff-when')).toHaveTextContent(/22:00/);
  // The parts add up: 3 move and 1 cannot be kept, in all and for the tenant whose slice stays down.
  expect(screen.getByTestId('signoff-moves-lead')).toHaveTextContent('4 touched slices of 2 tenants: 3 move · 1 cannot be kept');
  expect(screen.getByTestId('signoff-tenant-t-2')).toHaveTextContent('Marsh Water2 touched slices: 1 move · 1 cannot be kept');
  expect(screen.getByTestId('signoff-tenant-t-1')).toHaveTextContent('Harbour Health2 touched slices: 2 move');
  expect(screen.getByTestId('touch-count-touched')).toHaveTextContent('4');
  expect(screen.getByTestId('touch-count-unresolved')).toHaveTextContent('1');
  expect(screen.getByTestId('signoff-unresolved')).toHaveTextContent(/Pump telemetry · Marsh Water/);
  expect(screen.getByTestId('signoff-risk')).toHaveTextContent('High risk');
  expect(screen.getByTestId('signoff-quorum')).toHaveTextContent(/^1 of 2 approvals/);
  expect(screen.getByTestId('signoff-critical-caution')).toBeTruthy();
  expect(screen.getByTestId('signoff-decision-1-u-ap2')).toHaveTextContent(/Approved by Jonas Weller.*confirmed with a code.*Checked the ring capacity/);
  fireEvent.press(screen.getByTestId('signoff-open-plan'));
  expect(onOpenPlan).toHaveBeenCalledWith('/windows/w-1/plans/pl-1');
});

test('no caution when no critical slice is touched', () => {
  render(summaryFixture({ criticalSlices: 0, riskClass: 'low' }));
  expect(screen.queryByTestId('signoff-critical-caution')).toBeNull();
  expect(screen.getByTestId('signoff-risk')).toHaveTextContent('Low risk');
});

test('a decision needs a comment and the code before anything is sent; then it posts both', async () => {
  const { calls } = routedFetch([
    { method: 'POST', path: /^\/api\/signoff\/w-1\/decision$/, reply: () => ({ status: 200, body: { status: 'cleared', approvals: 2, quorum: 2, notices: { queued: 2, blocked: 0 } } }) },
  ]);
  render();
  fireEvent.press(screen.getByTestId('signoff-approve'));
  expect(screen.getByTestId('signoff-comment-error')).toHaveTextContent(/comment/);
  expect(screen.getByTestId('signoff-code-error')).toHaveTextContent(/6 digits/);
  expect(calls).toHaveLength(0);
  fireEvent.changeText(screen.getByTestId('signoff-comment'), '  Ring has the headroom.  ');
  fireEvent.changeText(screen.getByTestId('signoff-code'), '287082');
  fireEvent.press(screen.getByTestId('signoff-approve'));
  await waitFor(() => expect(calls).toHaveLength(1));
  expect(calls[0].body).toEqual({ decision: 'approve', comment: 'Ring has the headroom.', code: '287082' });
});

test('a replayed code is refused beside the code field; a send-back goes with its comment', async () => {
  const { calls } = routedFetch([
    { method: 'POST', path: /^\/api\/signoff\/w-1\/decision$/, reply: () => ({ status: 403, body: { error: { code: 'CODE_REPLAYED', message: 'That code was already used.' } } }) },
  ]);
  render();
  fireEvent.changeText(screen.getByTestId('signoff-comment'), 'Move it to the weekend.');
  fireEvent.changeText(screen.getByTestId('signoff-code'), '123456');
  fireEvent.press(screen.getByTestId('signoff-send-back'));
  expect(await screen.findByTestId('signoff-code-error')).toHaveTextContent('That code was already used.');
  expect(calls[0].body).toEqual({ decision: 'send-back', comment: 'Move it to the weekend.', code: '123456' });
});

test('an approver whose own work it is sees why, and no decision form', () => {
  render(summaryFixture({ me: { decided: false, blocked: 'self' } }));
  expect(screen.getByTestId('signoff-blocked')).toHaveTextContent(/another approver decides/);
  expect(screen.queryByTestId('signoff-approve')).toBeNull();
});

test('knock-on moves: counted apart from the affected slices and listed with whom they make room for, by name', () => {
  render(summaryFixture({
    tenants: [
      { id: 't-1', name: 'Harbour Health', affected: 2, moving: 2, knockOn: 0, protectionLost: 0 },
      { id: 't-3', name: 'Quay Logistics', affected: 0, moving: 0, knockOn: 1, protectionLost: 0 },
    ],
    totals: { affected: 2, moving: 2, stays: 0, unresolved: 0, knockOn: 1 },
    knockOn: [{ slice: 's-9', name: 'Forklift tracking', tenantName: 'Quay Logistics', outcome: 'reroute', madeRoomFor: ['Ambulance dispatch', 'Ward monitors'] }],
  }));
  expect(screen.getByTestId('signoff-moves-lead')).toHaveTextContent('2 touched slices of 2 tenants: 2 move · 1 more slice moved to make room');
  expect(screen.getByTestId('signoff-tenant-t-3')).toHaveTextContent('Quay Logistics1 moved to make room');
  expect(screen.getByTestId('signoff-knock-on-s-9')).toHaveTextContent(
    'Forklift tracking · Quay LogisticsRerouted to make room for Ambulance dispatch and Ward monitors.');
});

test('no knock-on section when the plan moves only affected slices', () => {
  render();
  expect(screen.queryByTestId('signoff-knock-on')).toBeNull();
});

test('a tenant whose slices only lose protection is listed with them, and the touch counts say so', () => {
  render(summaryFixture({
    tenants: [
      { id: 't-1', name: 'Harbour Health', affected: 9, moving: 9, knockOn: 0, protectionLost: 0 },
      { id: 't-2', name: 'Marsh Water', affected: 3, moving: 0, knockOn: 0, protectionLost: 3 },
    ],
    totals: { affected: 12, moving: 9, stays: 3, unresolved: 0, knockOn: 0 },
    touch: { touched: 12, mustMove: 9, protectionLost: 3, unresolved: 0, knockOn: 0 },
    unresolved: [],
  }));
  expect(screen.getByTestId('signoff-moves-lead')).toHaveTextContent('12 touched slices of 2 tenants: 9 move · 3 stay put');
  expect(screen.getByTestId('signoff-tenant-t-2')).toHaveTextContent('Marsh Water3 touched slices: 0 move · 3 lose protection but stay up');
  expect(screen.getByTestId('touch-count-protectionLost')).toHaveTextContent('3');
  expect(screen.getByTestId('touch-count-mustMove')).toHaveTextContent('9');
});

test('a long risk list says how many of how many it shows, and shows all on request', () => {
  const risks = Array.from({ length: 9 }, (_, i) => ({
    slice: `s-${i}`, name: `Slice ${i}`, severity: 'medium' as const, failureProbability: 0.0004, unprotected: false,
  }));
  render(summaryFixture({ highestRisks: risks }));
  expect(screen.getByTestId('signoff-risk-shown')).toHaveTextContent('5 of 9 slices shown, worst first');
  expect(screen.queryByText('Slice 6')).toBeNull();
  expect(screen.getByTestId('signoff-risk-scale')).toHaveTextContent(/Medium = priority 2–3/);
  fireEvent.press(screen.getByTestId('signoff-risk-show-all'));
  expect(screen.getByTestId('signoff-risk-shown')).toHaveTextContent('All 9 slices shown, worst first');
  expect(screen.getByText('Slice 6')).toBeTruthy();
});
