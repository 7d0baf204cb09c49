// The shared counts: touched = must move + lose protection; unresolved and knock-on need a plan; tenants with only
// protection lost are listed.
import fc from 'fast-check';
import { tenantTouches, touchCounts, type PlannedSlice, type TouchedSlice } from '../../shared/touch-counts';

const touched = (slice: string, tenantId: string, reasons: string[]): TouchedSlice => ({ slice, tenantId, reasons });
const planned = (slice: string, tenantId: string, outcome: string, madeRoomFor: unknown[] = []): PlannedSlice => ({ slice, tenantId, outcome, madeRoomFor });

const impact = [
  touched('a', 't1', ['hosted']), touched('b', 't1', ['transit', 'unprotected']), touched('c', 't2', ['unprotected']),
];
const plan = [planned('a', 't1', 'move'), planned('b', 't1', 'unresolved'), planned('k', 't3', 'reroute', [{ slice: 'a' }])];

test('impact alone: touched splits into must move and protection lost; plan figures unknown', () => {
  expect(touchCounts(impact, null)).toEqual({ touched: 3, mustMove: 2, protectionLost: 1, unresolved: null, knockOn: null });
});

test('impact and plan: unresolved among those that must move; knock-on moves apart from touched', () => {
  expect(touchCounts(impact, plan)).toEqual({ touched: 3, mustMove: 2, protectionLost: 1, unresolved: 1, knockOn: 1 });
});

test('plan alone: its own slices are the ones that must move', () => {
  expect(touchCounts(null, plan)).toEqual({ touched: 2, mustMove: 2, protectionLost: 0, unresolved: 1, knockOn: 1 });
});

test('every tenant with a touched slice or a knock-on move is listed, with the moving ones first', () => {
  expect(tenantTouches(impact, plan)).toEqual([
    { tenantId: 't1', touched: 2, mustMove: 2, protectionLost: 0, moving: 1, knockOn: 0 },
    { tenantId: 't3', touched: 0, mustMove: 0, protectionLost: 0, moving: 0, knockOn: 1 },
    { tenantId: 't2', touched: 1, mustMove: 0, protectionLost: 1, moving: 0, knockOn: 0 },
  ]);
});

test('property: must move + protection lost = touched, and per-tenant counts add up to the totals', () => {
  const reasons = fc.subarray(['hosted', 'transit', 'squeezed', 'unprotected'], { minLength: 1 });
  fc.assert(fc.property(fc.array(fc.tuple(fc.constantFrom('t1', 't2', 't3'), reasons), { maxLength: 30 }), (rows) => {
    const list = rows.map(([t, r], i) => touched(`s${i}`, t, r));
    const c = touchCounts(list, null);
    const byTenant = tenantTouches(list, null);
    return c.mustMove + c.protectionLost === c.touched
      && byTenant.reduce((n, t) => n + t.touched, 0) === c.touched
      && byTenant.reduce((n, t) => n + t.protectionLost, 0) === c.protectionLost
      && new Set(byTenant.map((t) => t.tenantId)).size === new Set(rows.map(([t]) => t)).size;
  }));
});
