// Impact review: the caution appears exactly when a critical slice is affected; slices list reasons, tenant,
// service type, severity and risk; splits and overloaded spans are reported.
import { screen, within } from '@testing-library/react-native';
import type { AffectedSlice, WindowImpact } from '@/shared/window-impact';
import { ImpactBody } from '@/components/impact/impact-review';
import { CRITICAL_CAUTION_POINTS } from '@/components/critical-caution';
import { affectedPathElements, formatRiskPercent, sortAffected } from '@/components/impact/impact-format';
import { sstName } from '@/shared/slice-service-type';
import { clearQueries, renderWithQueries, routedFetch } from './window-test-kit';

// The impact screen's next-step bar navigates with expo-router; these tests only render the body.
jest.mock('expo-router', () => ({ useRouter: () => ({ push: jest.fn() }) }));

afterEach(clearQueries);

function slice(id: string, extra: Partial<AffectedSlice> = {}): AffectedSlice {
  return {
    slice: id, name: `Slice ${id}`, tenant: { id: 't-1', name: 'Crannock Quay Logistics' }, sst: 1, priority: 3,
    critical: false, reasons: ['transit'], severity: 'medium', failureProbability: 0.0042, unprotected: false, ...extra,
  };
}

function impact(affected: AffectedSlice[], extra: Partial<WindowImpact> = {}): WindowImpact {
  return {
    windowId: 'w-1', windowVersion: 2, computedAt: '2030-01-01T10:00:00.000Z', affected,
    touchesCritical: affected.some((s) => s.critical), splits: false, components: 1, overloaded: [],
    elements: [{ kind: 'site', id: 'cell-pellow-sands', effect: 'down', fraction: null }],
    currentPaths: [{ slice: 'sl-a', sites: { f1: 'cell-pellow-sands', f2: 'edge-b' }, paths: { t1: ['sp-1', 'sp-2'] } }],
    ...extra,
  };
}

beforeEach(() => {
  // The map is not under test here; its data never arrives.
  routedFetch([]);
});

test('a critical slice in the impact brings up the caution with all three points', () => {
  const dispatch = slice('sl-dispatch', { name: 'Dispatch voice', critical: true, sst: 2, priority: 1, reasons: ['hosted', 'transit'], severity: 'critical' });
  renderWithQueries(<ImpactBody impact={impact([slice('sl-port'), dispatch])} wide={false} />);
  const caution = screen.getByTestId('impact-critical-caution');
  expect(caution).toHaveTextContent(/Dispatch voice/);
  for (const point of CRITICAL_CAUTION_POINTS) expect(within(caution).getByText(point)).toBeTruthy();
  expect(CRITICAL_CAUTION_POINTS.join(' ')).toMatch(/operations/);
  expect(CRITICAL_CAUTION_POINTS.join(' ')).toMatch(/regulator/);
  expect(CRITICAL_CAUTION_POINTS.join(' ')).toMatch(/not rely on the figures/);

  const row = screen.getByTestId('impact-slice-sl-dispatch');
  expect(within(row).getByText('Hosted')).toBeTruthy();
  expect(within(row).getByText('Transit')).toBeTruthy();
  expect(row).toHaveTextContent(/URLLC · priority 1 · 0\.42 % risk of failure/);
  expect(within(row).getByTestId('impact-critical-sl-dispatch')).toBeTruthy();
});

test('no caution when no affected slice is critical; splits and overloads are reported', () => {
  renderWithQueries(
    <ImpactBody
      impact={impact([slice('sl-port', { reasons: ['squeezed', 'unprotected'] })], {
        splits: true, components: 3, overloaded: [{ span: 'sp-040', loadGbps: 12.5, capacityGbps: 10 }],
      })}
      wide
    />,
  );
  expect(screen.queryByTestId('impact-critical-caution')).toBeNull();
  expect(screen.getByTestId('impact-splits')).toHaveTextContent(/3 separate parts/);
  expect(screen.getByTestId('impact-overloaded')).toHaveTextContent(/sp-040.*12\.5 of 10 Gbit\/s \(125 %\)/);
  expect(screen.getByTestId('impact-slice-sl-port')).toHaveTextContent(/Crannock Quay Logistics/);
});

test('critical slices are listed first, then by severity and risk; risk reads as a percentage', () => {
  const order = sortAffected([
    slice('low', { severity: 'low', failureProbability: 0.5 }),
    slice('high', { severity: 'high', failureProbability: 0.001 }),
    slice('crit', { critical: true, severity: 'medium' }),
    slice('high-riskier', { severity: 'high', failureProbability: 0.01 }),
  ]).map((s) => s.slice);
  expect(order).toEqual(['crit', 'high-riskier', 'high', 'low']);
  expect(formatRiskPercent(0)).toBe('0 %');
  expect(formatRiskPercent(0.00004)).toBe('< 0.01 %');
  expect(formatRiskPercent(0.1234)).toBe('12.3 %');
  // 3GPP TS 23.501 Table 5.15.2.2-1 (secondary): SST 1 eMBB, 2 URLLC, 3 MIoT, 4 V2X.
  expect([1, 2, 3, 4, 200].map(sstName)).toEqual(['eMBB', 'URLLC', 'MIoT', 'V2X', 'SST 200']);
  expect(affectedPathElements(impact([]))).toEqual({ sites: ['cell-pellow-sands', 'edge-b'], spans: ['sp-1', 'sp-2'] });
});

test('the shared counts: slices that only lose protection are touched but need not move; plan figures wait for a plan', () => {
  const slices = [slice('sl-a'), slice('sl-b', { reasons: ['hosted', 'unprotected'] }), slice('sl-c', { reasons: ['unprotected'], unprotected: true })];
  renderWithQueries(<ImpactBody impact={impact(slices)} wide={false} />);
  expect(screen.getByTestId('touch-count-touched')).toHaveTextContent('3');
  expect(screen.getByTestId('touch-count-mustMove')).toHaveTextContent('2');
  expect(screen.getByTestId('touch-count-protectionLost')).toHaveTextContent('1');
  expect(screen.getByTestId('touch-count-unresolved')).toHaveTextContent('–');
  expect(screen.getByTestId('touch-count-definitions')).toHaveTextContent(/Lose protection, stay up: .*backup path/);
  expect(screen.getByTestId('impact-severity-scale')).toHaveTextContent(/Low = priority 4–5/);
});
