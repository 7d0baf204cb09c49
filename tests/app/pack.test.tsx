// The change-board pack: every section a board member or field team reads, by name with units, the critical
// caution, the CSV download, and the empty state of a window without a plan.
import { fireEvent, screen } from '@testing-library/react-native';
import { ChangePackView } from '@/components/pack/change-pack-view';
import { changePackSchema, type ChangePack } from '@/shared/change-pack';
import { clearQueries, renderWithQueries } from './window-test-kit';


afterEach(clearQueries);

const objective = { unresolvedWeight: 0, unresolved: 0, moved: 2, rerouted: 1, moveCost: 2.25, usage: 3, peakUtilisation: 0.5 };

function packFixture(): ChangePack {
  return changePackSchema.parse({
    window: {
      id: 'w-17', title: 'Fibre splice, Gullhaven ring', workType: 'fibre splice', status: 'in-review',
      // 21:00 UTC in January is 22:00 in Oslo (CET); four hours long.
      startsAt: '2027-01-12T21:00:00.000Z', endsAt: '2027-01-13T01:00:00.000Z', ownerName: 'Ines Engineer',
      elements: [{ kind: 'span', name: 'Gullhaven – Orrindale', effect: 'reduced', fraction: 0.4 }, { kind: 'site', name: 'Gullhaven', effect: 'down', fraction: null }],
    },
    mop: { fileName: 'splice-mop.pdf' },
    touch: { touched: 3, mustMove: 2, protectionLost: 1, unresolved: 1, knockOn: 1 },
    plan: {
      acceptedAt: '2027-01-02T09:00:00.000Z', acceptedByName: 'Pia Planner', afterWindow: 'return',
      slices: [
        { name: 'Ambulance dispatch', tenantName: 'Harbour Health', outcome: 'move', critical: true, unresolvedReason: null, outageAccepted: false, madeRoomFor: [] },
        { name: 'Pump telemetry', tenantName: 'Marsh Water', outcome: 'unresolved', critical: false, unresolvedReason: 'no site within 5 km has 4 vCPU free', outageAccepted: true, madeRoomFor: [] },
        { name: 'Quay video', tenantName: 'Port Media', outcome: 'reroute', critical: false, unresolvedReason: null, outageAccepted: false, madeRoomFor: ['Ambulance dispatch'] },
      ],
      steps: [
        { order: 1, sliceName: 'Quay video', tenantName: 'Port Media', kind: 'reroute-tie', what: 'the link Camera hub – Encoder', fromSite: null, toSite: null,
          fromPath: 'Gullhaven → Orrindale', toPath: 'Gullhaven → Brackwell → Orrindale', madeRoomFor: ['Ambulance dispatch'], needsSpare: false },
        { order: 2, sliceName: 'Ambulance dispatch', tenantName: 'Harbour Health', kind: 'move-function', what: 'User plane', fromSite: 'Gullhaven', toSite: 'Brackwell',
          fromPath: null, toPath: null, madeRoomFor: [], needsSpare: true },
      ],
      needsSpare: 1,
      references: {
        objective, computeMs: 850, search: null,
        greedy: { solver: 'greedy', objective: { ...objective, moveCost: 3 }, elapsedMs: 12, optimal: null, gap: null, bound: null, note: null },
        exact: { solver: 'exact', objective, elapsedMs: 2400, optimal: true, gap: 0, bound: 2.25, note: null },
      },
      risk: [
        { sliceName: 'Quay video', severity: 'low', failureProbability: 0.0004, unprotected: false },
        { sliceName: 'Ambulance dispatch', severity: 'critical', failureProbability: 0.0012, unprotected: true },
      ],
      criticalSlices: ['Ambulance dispatch'],
    },
    decisions: [{ round: 1, approverName: 'Ada Approver', decision: 'approve', comment: 'Agreed with dispatch operations.', codeConfirmed: true, decidedAt: '2027-01-03T10:00:00.000Z' }],
    comments: [{ id: 'e-9', kind: 'moved', at: '2027-01-04T08:00:00.000Z', by: 'Ines Engineer', status: 'underway', comment: 'Crew on site early.', reverted: false, round: null }],
    generatedAt: '2027-01-05T12:30:00.000Z',
  });
}

const render = (pack: ChangePack = packFixture()) => {
  const onDownloadMoves = jest.fn();
  renderWithQueries(<ChangePackView pack={pack} timeZone="Europe/Oslo" onDownloadMoves={onDownloadMoves} />);
  return { onDownloadMoves };
};

test('every section of the pack is there under the window title', () => {
  render();
  expect(screen.getByTestId('pack-title')).toHaveTextContent('Fibre splice, Gullhaven ring');
  const order = ['pack-window', 'pack-critical-caution', 'pack-impact', 'pack-moves', 'pack-steps', 'pack-references', 'pack-risk', 'pack-decisions', 'pack-comments', 'pack-generated'];
  for (const id of order) expect(screen.getByTestId(id)).toBeTruthy();
  expect(screen.queryByTestId('pack-no-plan')).toBeNull();
});

test('the window reads in the viewer zone with its owner, elements, effects and MOP by name', () => {
  render();
  expect(screen.getByTestId('pack-window-when')).toHaveTextContent(/22:00 – .*02:00 .*CET.* · lasts 4 h/);
  expect(screen.getByTestId('pack-window-owner')).toHaveTextContent(/^Owner\s*Ines Engineer$/);
  expect(screen.getByTestId('pack-window-elements')).toHaveTextContent(/Gullhaven – Orrindale \(span, reduced to 40 %\); Gullhaven \(site, down\)$/);
  expect(screen.getByTestId('pack-mop')).toHaveTextContent(/splice-mop\.pdf$/);
  expect(screen.queryByText(/w-17/)).toBeNull();
});

test('impact counts, moves and steps come with their units and names, knock-on and spare capacity marked', () => {
  render();
  expect(screen.getByTestId('touch-count-touched')).toHaveTextContent('3');
  expect(screen.getByTestId('touch-count-unresolved')).toHaveTextContent('1');
  expect(screen.getByTestId('pack-move-1')).toHaveTextContent(/Pump telemetry.*Marsh Water.*Unresolved.*no site within 5 km has 4 vCPU free.*Outage accepted/);
  expect(screen.getByTestId('pack-move-2')).toHaveTextContent(/Rerouted to make room for Ambulance dispatch/);
  expect(screen.getByTestId('pack-step-1')).toHaveTextContent(/1\..*Quay video \(Port Media\).*Reroute the link Camera hub – Encoder.*from Gullhaven → Orrindale to Gullhaven → Brackwell → Orrindale.*Knock-on move/);
  expect(screen.getByTestId('pack-step-2')).toHaveTextContent(/Move User plane.*Gullhaven → Brackwell.*Needs temporary spare capacity/);
  expect(screen.getByTestId('pack-plan-accepted')).toHaveTextContent(/Pia Planner.*return to where they were/);
});

test('references show move cost in points and times in units; risk carries its scale and a percentage', () => {
  render();
  expect(screen.getByTestId('plan-ref-greedy')).toHaveTextContent(/move cost 3 points.*took 12 ms/);
  expect(screen.getByTestId('plan-ref-exact')).toHaveTextContent(/proven optimal.*took 2\.4 s/);
  expect(screen.getByTestId('pack-risk-scale')).toHaveTextContent(/Severity rates the slice/);
  // Worst first: the critical slice before the low one.
  expect(screen.getByTestId('pack-risk-0')).toHaveTextContent(/Ambulance dispatch.*Critical.*0\.12 % risk of failure.*No backup path/);
  expect(screen.getByTestId('pack-risk-1')).toHaveTextContent(/Quay video.*Low/);
});

test('the critical caution names the slices; decisions and comments read with who, when and what was said', () => {
  render();
  expect(screen.getByTestId('pack-critical-caution')).toHaveTextContent(/Ambulance dispatch carries public-safety/);
  expect(screen.getByTestId('pack-decision-0')).toHaveTextContent(/Ada Approver.*Approved \(round 1\), confirmed with a code.*11:00 CET.*Agreed with dispatch operations/);
  expect(screen.getByTestId('pack-comment-0')).toHaveTextContent(/Marked the window underway · by Ines Engineer.*Crew on site early/);
  expect(screen.getByTestId('pack-generated')).toHaveTextContent(/Generated .*13:30 CET/);
});

test('the moves CSV is offered with a plan; printing is only offered where the platform prints (the web)', () => {
  const { onDownloadMoves } = render();
  fireEvent.press(screen.getByTestId('pack-moves-csv'));
  expect(onDownloadMoves).toHaveBeenCalledTimes(1);
  // These tests run the native build, where print-style.ts cannot print.
  expect(screen.queryByTestId('pack-print')).toBeNull();
});

test('a window without a plan still shows the window and its impact, says "No plan yet", and offers no CSV', () => {
  render({ ...packFixture(), plan: null, decisions: [], comments: [], touch: { touched: 3, mustMove: 2, protectionLost: 1, unresolved: null, knockOn: null } });
  expect(screen.getByTestId('pack-window')).toBeTruthy();
  expect(screen.getByTestId('touch-count-touched')).toHaveTextContent('3');
  expect(screen.getByTestId('pack-no-plan')).toHaveTextContent(/No plan yet/);
  for (const id of ['pack-moves', 'pack-steps', 'pack-risk', 'pack-critical-caution', 'pack-moves-csv']) expect(screen.queryByTestId(id)).toBeNull();
  expect(screen.getByTestId('pack-decisions-none')).toHaveTextContent('No decisions yet.');
});
