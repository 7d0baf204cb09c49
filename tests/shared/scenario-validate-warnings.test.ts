// Scenario validation warnings: capacity shared by both directions of a span, anchors, latency budgets.
import { validateScenario } from '../../shared/scenario-validate';
import type { ScenarioIssue } from '../../shared/scenario-validate';
import { smallScenario } from './scenario-fixture';

/* eslint-disable @typescript-eslint/no-explicit-any -- tests change the typed fixture on purpose */
function warningsOf(mutate: (s: any) => void): ScenarioIssue[] {
  const s: any = smallScenario();
  mutate(s);
  const result = validateScenario(s);
  if (!result.ok) throw new Error(`unexpected errors: ${JSON.stringify(result.errors)}`);
  return result.warnings;
}

describe('validateScenario warnings', () => {
  it('site vCPU over capacity', () => {
    const warnings = warningsOf((s) => (s.slices[0].functions[1].cpu = 16)); // 16 + nothing else on C (20) fits
    expect(warnings).toEqual([]);
    const over = warningsOf((s) => (s.slices[0].functions[1].cpu = 21));
    expect(over).toEqual([{ path: '$.sites[2].cpu', message: expect.stringContaining('21 vCPU') }]);
  });

  it('span capacity is shared by both directions', () => {
    // S2 now runs C → B over span CB while S1 runs B → C over it: 4 + 7 = 11 > 10 Gbit/s.
    const warnings = warningsOf((s) => {
      s.placements[1] = { slice: 'S2', sites: { g1: 'C', g2: 'B' }, paths: { u1: ['CB'] } };
      s.slices[1].ties[0].bandwidthGbps = 7;
    });
    expect(warnings).toEqual([{ path: '$.spans[1].capacityGbps', message: expect.stringContaining('11 Gbit/s') }]);
  });

  it('exactly at capacity is no warning', () => {
    const warnings = warningsOf((s) => {
      s.placements[1] = { slice: 'S2', sites: { g1: 'C', g2: 'B' }, paths: { u1: ['CB'] } };
      s.slices[1].ties[0].bandwidthGbps = 6;
    });
    expect(warnings).toEqual([]);
  });

  it('site anchor violated', () => {
    const warnings = warningsOf((s) => {
      s.placements[0].sites.f1 = 'B';
      s.placements[0].paths.t1 = ['CB'];
    });
    expect(warnings).toEqual([{ path: '$.placements[0].sites.f1', message: expect.stringContaining('anchored to site "A"') }]);
  });

  it('point-and-radius anchor violated', () => {
    // B is 0.1° of latitude (≈ 11.1 km) from the anchor point; the radius is 5 km.
    const warnings = warningsOf((s) => {
      s.placements[0].sites.f2 = 'B';
      s.placements[0].paths.t1 = ['AB'];
    });
    expect(warnings).toHaveLength(1);
    expect(warnings[0].path).toBe('$.placements[0].sites.f2');
    expect(warnings[0].message).toMatch(/11\.1\d* km/);
  });

  it('path latency over the tie budget, using length × 0.005 ms/km when latency is missing', () => {
    // 2 × 100 km × 0.005 ms/km = 1 ms (ITU-T G.114 Table A.1 planning value, secondary).
    const over = warningsOf((s) => (s.slices[0].ties[0].maxLatencyMs = 0.9));
    expect(over).toEqual([{ path: '$.placements[0].paths.t1', message: expect.stringContaining('1 ms') }]);
    const given = warningsOf((s) => {
      s.slices[0].ties[0].maxLatencyMs = 0.9;
      s.spans[0].latencyMs = 0.3; // 0.3 + 0.5 = 0.8 ms
    });
    expect(given).toEqual([]);
  });

  it('warnings come with errors too', () => {
    const s: any = smallScenario();
    s.slices[0].functions[1].cpu = 30;
    s.slices[1].tenant = 'nobody';
    const result = validateScenario(s);
    expect(result.ok).toBe(false);
    expect(result.warnings.map((w) => w.path)).toEqual(['$.sites[2].cpu']);
  });
});
