// The slot finder's pure parts: the cost's direction for each figure, the re-map cache's keys and eviction, and
// the words people read (names, units, no ids).
import fc from 'fast-check';
import type { Inventory } from '../../../planner/model/types';
import {
  DEFAULT_REMAP_LIMIT_MS, NOTICE_SPARE_CAP_DAYS, REMAP_LIMIT_CAP_MS, REMAP_MS_PER_SLICE, SLOT_COST_WEIGHTS, scaledRemapLimitMs, slotCost,
} from '../../../server/services/slots/evaluate-slot';
import { RemapCache, remapKey, type RemapAnswer } from '../../../server/services/slots/remap-cache';
import {
  conflictReasonWords, explain, formatDays, leadTimeReason, listWords, namesOf,
} from '../../../server/services/slots/slot-words';

const figures = fc.record({
  unresolved: fc.option(fc.integer({ min: 0, max: 50 }), { nil: null }),
  criticalTouched: fc.integer({ min: 0, max: 20 }),
  touched: fc.integer({ min: 20, max: 200 }),
  riskPercent: fc.double({ min: 0, max: 100, noNaN: true }),
  overlapping: fc.integer({ min: 0, max: 5 }),
  noticeSpareDays: fc.option(fc.double({ min: -10, max: 60, noNaN: true }), { nil: null }),
});

test('every figure that hurts raises the cost; notice to spare lowers it, up to a week', () => {
  fc.assert(fc.property(figures, (f) => {
    const base = slotCost(f);
    expect(slotCost({ ...f, unresolved: (f.unresolved ?? 0) + 1 })).toBeGreaterThan(base);
    expect(slotCost({ ...f, touched: f.touched + 1 })).toBeGreaterThan(base);
    expect(slotCost({ ...f, criticalTouched: f.criticalTouched + 1 })).toBeGreaterThan(base);
    expect(slotCost({ ...f, overlapping: f.overlapping + 1 })).toBeGreaterThan(base);
    expect(slotCost({ ...f, riskPercent: f.riskPercent + 1 })).toBeGreaterThan(base);
    expect(slotCost({ ...f, noticeSpareDays: NOTICE_SPARE_CAP_DAYS + 30 })).toBe(slotCost({ ...f, noticeSpareDays: NOTICE_SPARE_CAP_DAYS }));
  }));
  // One slice the re-map cannot keep outweighs any bonus for notice and a handful of other windows.
  const w = SLOT_COST_WEIGHTS;
  expect(w.unresolved).toBeGreaterThan(w.noticeSpareDay * NOTICE_SPARE_CAP_DAYS + 5 * w.overlapping + w.touched);
});

test('the re-map key ignores element and window order, and changes with a version, a plan or the limit', () => {
  const parts = {
    revision: 3, sites: ['b', 'a'], spans: ['s1'], limitMs: 300,
    windows: [{ id: 'w2', version: 1, acceptedPlanId: null }, { id: 'w1', version: 4, acceptedPlanId: 'p9' }],
  };
  const key = remapKey(parts);
  expect(remapKey({ ...parts, sites: ['a', 'b'], windows: [...parts.windows].reverse() })).toBe(key);
  expect(remapKey({ ...parts, windows: [parts.windows[0], { ...parts.windows[1], version: 5 }] })).not.toBe(key);
  expect(remapKey({ ...parts, windows: [parts.windows[0], { ...parts.windows[1], acceptedPlanId: 'p10' }] })).not.toBe(key);
  expect(remapKey({ ...parts, limitMs: 500 })).not.toBe(key);
  expect(remapKey({ ...parts, revision: 4 })).not.toBe(key);
  // A site and a span with the same id are different elements.
  expect(remapKey({ ...parts, sites: ['a', 'b', 's1'], spans: [] })).not.toBe(key);
});

test('the cache keeps the most recently used entries and answers only for the inventory it was computed on', () => {
  const inv = {} as Inventory;
  const other = {} as Inventory;
  const answer = (n: number): RemapAnswer => ({ slices: [], affected: [`s${n}`] });
  const cache = new RemapCache(2);
  cache.set('k1', inv, answer(1));
  cache.set('k2', inv, answer(2));
  expect(cache.get('k1', inv)?.affected).toEqual(['s1']); // k1 is now the most recent
  cache.set('k3', inv, answer(3));
  expect(cache.get('k2', inv)).toBeNull();
  expect(cache.get('k1', inv)?.affected).toEqual(['s1']);
  expect(cache.get('k3', other)).toBeNull();
  expect(cache.size).toBe(2);
});

const names = namesOf({
  sites: [{ id: 'r2', name: 'Ring 2' }, { id: 'r3', name: 'Ring 3' }] as never,
  spans: [{ id: 's23', a: 'r2', b: 'r3' }] as never,
  slices: [{ id: 'sl-1', name: 'Dispatch voice' }] as never,
  tenants: [{ id: 't-1', name: 'Blue Light Services' }] as never,
});

test('clash reasons name sites, spans and slices instead of ids', () => {
  expect(conflictReasonWords({ reason: 'shared-element', message: '', ids: ['site:r2', 'span:s23'] }, names))
    .toBe('both take out site Ring 2 and span Ring 2 – Ring 3');
  expect(conflictReasonWords({ reason: 'strands-slice', message: '', ids: ['sl-1'] }, names))
    .toBe('together they cut off the slice "Dispatch voice"');
  expect(conflictReasonWords({ reason: 'joint-split', message: 'Together the windows split the network into 3 parts; apart they would not.', ids: [] }, names))
    .toBe('together they split the network into 3 parts');
});

test('explanations and reasons carry units and read as one line', () => {
  expect(explain({
    touched: 12, criticalTouched: 1, unresolved: 2, riskPercent: 0.4234, riskLevel: 'Medium',
    overlapping: ['Fibre splice'], noticeSpareDays: 3.46, reused: false,
  })).toBe('Touches 12 slices (1 critical); the quick re-map cannot keep 2; risk of failure 0.42 % (slices up to Medium severity); '
    + 'the window "Fibre splice" also out; 3.4 days of notice to spare.');
  expect(explain({ touched: 0, criticalTouched: 0, unresolved: 0, riskPercent: 0, riskLevel: 'Low', overlapping: [], noticeSpareDays: null, reused: true }))
    .toBe('Touches no slice.');
  expect(leadTimeReason('Blue Light Services', 1, -0.5)).toBe('Blue Light Services must be told 1 day ahead; the start is already past.');
  expect(formatDays(1)).toBe('1 day');
  expect(formatDays(12.7)).toBe('12 days');
  expect(listWords(['a', 'b', 'c', 'd', 'e', 'f'])).toBe('a, b, c, d and 2 more');
});

describe('the quick re-map limit of a one-group search', () => {
  // The figures behind the scale are measured (REMAP_MS_PER_SLICE's comment); the test holds its shape.
  test('grows with the slices the work must move, between the flat default and the cap', () => {
    expect(scaledRemapLimitMs(0)).toBe(DEFAULT_REMAP_LIMIT_MS);
    expect(scaledRemapLimitMs(29)).toBe(DEFAULT_REMAP_LIMIT_MS);
    expect(scaledRemapLimitMs(100)).toBe(100 * REMAP_MS_PER_SLICE);
    expect(scaledRemapLimitMs(299)).toBe(REMAP_LIMIT_CAP_MS);
    fc.assert(fc.property(fc.nat(5000), fc.nat(5000), (a, b) => {
      const [small, big] = a <= b ? [a, b] : [b, a];
      return scaledRemapLimitMs(small) <= scaledRemapLimitMs(big) && scaledRemapLimitMs(big) <= REMAP_LIMIT_CAP_MS;
    }));
  });
});
