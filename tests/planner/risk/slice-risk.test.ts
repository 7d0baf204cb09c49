import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { failureProbability } from '../../../planner/model/availability';
import { sliceRisk } from '../../../planner/risk/slice-risk';
import { fromSlicePlans } from '../../../planner/plan/evaluate-plan';
import { InvalidOptionError } from '../../../planner/errors';
import { TINY_WINDOWS, tinyScenario } from '../fixtures/tiny-scenario';

const inv = buildInventory(tinyScenario());
const siteB = compileWindow(TINY_WINDOWS.find((w) => w.id === 'w-site-b')!);
const next = fromSlicePlans(inv, [
  { slice: 's-hosted', outcome: 'unresolved', sites: {}, paths: {} },
  { slice: 's-transit', outcome: 'reroute', sites: { ran: 'E', upf: 'A' }, paths: { 'ran-upf': ['de', 'cd', 'ac'] } },
]);

/** 1 − Π(1 − Pᵢ) from single-element probabilities: the same model reached another way. */
const combined = (hours: number, mtbfs: number[]) => 1 - mtbfs.reduce((q, m) => q * (1 - failureProbability(hours, m)), 1);

describe('sliceRisk', () => {
  const risk = sliceRisk(inv, siteB, next);
  const bySlice = Object.fromEntries(risk.map((r) => [r.slice, r]));

  it('leaves unresolved slices out and covers everyone else', () => {
    expect(risk.map((r) => r.slice)).toEqual(['s-transit', 's-quiet']);
  });

  it('P = 1 − Π exp(−T/MTBF) over the sites and spans still in use', () => {
    // fixture: sites MTBF 50 000 h, spans 20 000 h; window 4 h (REFERENCES.md, formula from memory)
    expect(siteB.durationHours).toBe(4);
    expect(bySlice['s-quiet'].failureProbability).toBeCloseTo(combined(4, [50_000, 50_000, 20_000]), 14);
    expect(bySlice['s-transit'].failureProbability).toBeCloseTo(combined(4, [50_000, 50_000, 50_000, 50_000, 20_000, 20_000, 20_000]), 14);
  });

  it('flags slices whose path lost its alternative route, with severity from the slice', () => {
    expect(bySlice['s-quiet']).toMatchObject({ unprotected: true, severity: 'low' });
    expect(bySlice['s-transit']).toMatchObject({ unprotected: true, severity: 'critical' });
    const calm = sliceRisk(inv, compileWindow(TINY_WINDOWS[0]), new Map());
    expect(calm.every((r) => !r.unprotected)).toBe(true);
    // not unprotected: one level below the slice's base severity (critical → high)
    expect(calm.find((r) => r.slice === 's-transit')!.severity).toBe('high');
  });

  it('needs a window duration', () => {
    expect(() => sliceRisk(inv, { ...siteB, durationHours: undefined }, next)).toThrow(InvalidOptionError);
  });
});
