// Round axis ticks: 1-2-5 steps, covering the data, few enough to read.
import fc from 'fast-check';
import { niceStep, niceTicks } from '@/components/plans/chart-ticks';

const isOneTwoFive = (step: number) => {
  const mantissa = step / 10 ** Math.floor(Math.log10(step));
  return [1, 2, 5].some((m) => Math.abs(mantissa - m) < 1e-9);
};

test('steps are 1, 2 or 5 times a power of ten', () => {
  expect(niceStep(100, 5)).toBe(50);
  expect(niceStep(7, 5)).toBe(2);
  expect(niceStep(0.9, 4)).toBeCloseTo(0.5, 12);
  expect(niceStep(0, 5)).toBe(1);
});

test('worked examples: 0…137 in fives of 50, rounds 0…300 by 100, a flat line still gets two ticks', () => {
  expect(niceTicks(0, 137, 5).ticks).toEqual([0, 50, 100, 150]);
  expect(niceTicks(0, 300, 5, true).ticks).toEqual([0, 100, 200, 300]);
  expect(niceTicks(4, 4, 5).ticks.length).toBeGreaterThanOrEqual(2);
  expect(niceTicks(0, 3, 5, true).step).toBe(1);
  expect(niceTicks(0, 0.3, 4).ticks).toEqual([0, 0.1, 0.2, 0.3]);
});

test('for any data range the ticks cover it, use a 1-2-5 step, are evenly spaced and at most the asked number', () => {
  // Chart values in hundredths, from -10 000 to 10 000: costs, weights and round numbers.
  const value = fc.integer({ min: -1_000_000, max: 1_000_000 }).map((n) => n / 100);
  fc.assert(fc.property(value, value, fc.integer({ min: 2, max: 8 }), fc.boolean(), (a, b, maxTicks, integer) => {
    const { ticks, step, min, max } = niceTicks(a, b, maxTicks, integer);
    expect(ticks.length).toBeGreaterThanOrEqual(2);
    expect(ticks.length).toBeLessThanOrEqual(maxTicks);
    expect(min).toBeLessThanOrEqual(Math.min(a, b) + 1e-9 * Math.abs(step));
    expect(max).toBeGreaterThanOrEqual(Math.max(a, b) - 1e-9 * Math.abs(step));
    expect(isOneTwoFive(step)).toBe(true);
    if (integer) expect(step).toBeGreaterThanOrEqual(1);
    for (let i = 1; i < ticks.length; i += 1) expect(ticks[i] - ticks[i - 1]).toBeCloseTo(step, 6);
  }));
});
