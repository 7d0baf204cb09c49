import {
  availability, downtimeMinutesPerYear, failureProbability, parallelAvailability, seriesAvailability,
} from '../../../planner/model/availability';

// All check values: REFERENCES.md "Availability" (common practice; ITU-T E.800 defines availability).
describe('availability arithmetic', () => {
  it('A = MTBF / (MTBF + MTTR): 10 000 h and 4 h give 0.99960016', () => {
    expect(availability(10_000, 4)).toBeCloseTo(0.99960016, 8);
  });

  it('series of two 0.999 elements is 0.998001, parallel is 0.999999', () => {
    expect(seriesAvailability([0.999, 0.999])).toBeCloseTo(0.998001, 12);
    expect(parallelAvailability([0.999, 0.999])).toBeCloseTo(0.999999, 12);
  });

  it('empty series is 1 and empty parallel is 0', () => {
    expect(seriesAvailability([])).toBe(1);
    expect(parallelAvailability([])).toBe(0);
  });

  it('downtime per 8760-h year: 99.9 % → 525.6 min, 99.99 % → 52.56, 99.999 % → 5.256', () => {
    expect(downtimeMinutesPerYear(0.999)).toBeCloseTo(525.6, 6);
    expect(downtimeMinutesPerYear(0.9999)).toBeCloseTo(52.56, 6);
    expect(downtimeMinutesPerYear(0.99999)).toBeCloseTo(5.256, 6);
  });

  it('P(failure in 6 h) at λ = 1e-4/h is 5.9982e-4', () => {
    // Formula 1 − exp(−λT): memory (REFERENCES.md); the value itself is computed there.
    expect(failureProbability(6, 10_000)).toBeCloseTo(5.9982e-4, 8);
  });

  it('an element without a finite MTBF never fails', () => {
    expect(failureProbability(6, Infinity)).toBe(0);
  });
});
