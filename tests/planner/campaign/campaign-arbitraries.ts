// fast-check generators of random campaign problems: groups with slots on nights inside a range, touched sets from a
// small slice pool, random clashes and rules.
import fc from 'fast-check';
import type { CampaignProblem, CampaignSlotOption } from '../../../planner/campaign/schedule-campaign';
import { nightOf } from './campaign-fixtures';

const SLICE_POOL = ['s1', 's2', 's3', 's4', 's5', 's6', 's7', 's8'];
const HALF_HOUR_MS = 1_800_000;

interface Sizes { groups: [number, number]; slots: number; nights: number; slices: number; maxPerNight: number; maxDays: number }

export const FULL_SIZES: Sizes = { groups: [3, 25], slots: 30, nights: 21, slices: 8, maxPerNight: 4, maxDays: 10 };
export const TINY_SIZES: Sizes = { groups: [1, 4], slots: 4, nights: 6, slices: 3, maxPerNight: 2, maxDays: 4 };

function slotArb(nights: number, fractionalCosts: boolean): fc.Arbitrary<CampaignSlotOption> {
  const cost = fractionalCosts
    ? fc.oneof(fc.integer({ min: 0, max: 300 }), fc.double({ min: -20, max: 300, noNaN: true, noDefaultInfinity: true }))
    : fc.integer({ min: 0, max: 300 });
  return fc.record({
    night: fc.integer({ min: 0, max: nights - 1 }),
    halfHours: fc.integer({ min: 0, max: 12 }),
    hours: fc.integer({ min: 1, max: 4 }),
    cost,
  }).map(({ night, halfHours, hours, cost: c }) => {
    const startMs = Date.UTC(2026, 11, 1 + night, 21) + halfHours * HALF_HOUR_MS;
    return { startMs, endMs: startMs + hours * 2 * HALF_HOUR_MS, night: nightOf(night), cost: c };
  });
}

/** A random campaign problem of the given sizes. */
export function problemArb(sizes: Sizes, fractionalCosts = false): fc.Arbitrary<CampaignProblem> {
  const pool = SLICE_POOL.slice(0, sizes.slices);
  return fc.integer({ min: sizes.groups[0], max: sizes.groups[1] }).chain((n) => fc.record({
    groups: fc.array(fc.record({
      slots: fc.array(slotArb(sizes.nights, fractionalCosts), { maxLength: sizes.slots }),
      touched: fc.uniqueArray(fc.constantFrom(...pool), { maxLength: 3 }),
    }), { minLength: n, maxLength: n }),
    rules: fc.record({
      maxPerNight: fc.integer({ min: 1, max: sizes.maxPerNight }),
      minDaysBetweenTouches: fc.integer({ min: 0, max: sizes.maxDays }),
    }),
    clashes: n < 2 ? fc.constant([] as Array<[number, number]>) : fc.uniqueArray(
      fc.tuple(fc.integer({ min: 0, max: n - 1 }), fc.integer({ min: 0, max: n - 1 }))
        .filter(([i, j]) => i !== j)
        .map(([i, j]) => [Math.min(i, j), Math.max(i, j)] as [number, number]),
      { maxLength: n, selector: ([i, j]) => `${i}:${j}` },
    ),
  }));
}
