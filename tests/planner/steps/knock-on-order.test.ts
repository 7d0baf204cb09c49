// Knock-on moves in the make-before-break order: an untouched slice that vacates room moves first, and its steps
// pass the same transient capacity check as every other step.
import { madeRoomForIndex } from '../../../planner/steps/knock-on-order';
import { orderSteps } from '../../../planner/steps/make-before-break';
import { KNOCK_ON_PLANS, knockOnInventory as inventory, knockOnNext as plan, knockOnWindow as w } from './knock-on-fixture';

const KNOCK_ON = KNOCK_ON_PLANS;

describe('orderSteps with knock-on moves', () => {
  it('K must vacate cd before T can take it: K goes first, marked knock-on, and neither needs spare capacity', () => {
    // cd: 20 Gbit/s, K holds 15, T needs 8 — T only fits once K has left for cd2.
    const inv = inventory(15);
    const order = orderSteps(inv, w, plan(inv), undefined, { madeRoomFor: madeRoomForIndex(inv, KNOCK_ON) });
    expect(order.steps.map((s) => [s.slice, s.from, s.to, s.knockOn, s.needsSpare])).toEqual([
      ['K', ['cd'], ['cd2'], true, false],
      ['T', ['ab'], ['ac', 'cd', 'bd'], false, false],
    ]);
    expect(order.needsSpare).toBe(0);
  });

  it('a knock-on move precedes the slices it makes room for even where both would fit either way', () => {
    const inv = inventory(2);
    expect(orderSteps(inv, w, plan(inv)).steps.map((s) => [s.slice, s.knockOn])).toEqual([['T', false], ['K', false]]);
    const order = orderSteps(inv, w, plan(inv), undefined, { madeRoomFor: madeRoomForIndex(inv, KNOCK_ON) });
    expect(order.steps.map((s) => [s.slice, s.knockOn])).toEqual([['K', true], ['T', false]]);
  });

  it('the capacity check covers knock-on steps: one that does not fit is flagged, the touched slice still waits', () => {
    // cd2 is reserved down to 1 Gbit/s free, so K's move needs spare capacity; T then fits on the freed cd.
    const inv = inventory(15);
    const order = orderSteps(inv, w, plan(inv), { spanGbps: { cd2: 19 } }, { madeRoomFor: madeRoomForIndex(inv, KNOCK_ON) });
    expect(order.steps.map((s) => [s.slice, s.knockOn, s.needsSpare])).toEqual([['K', true, true], ['T', false, false]]);
    expect(order.needsSpare).toBe(1);
  });

  it('madeRoomForIndex maps ids to indices and skips slices it does not know', () => {
    const inv = inventory(15);
    const index = madeRoomForIndex(inv, [...KNOCK_ON, { slice: 'K', outcome: 'move', sites: {}, paths: {}, madeRoomFor: ['gone'] }]);
    expect([...index]).toEqual([[inv.sliceIndex.get('K')!, [inv.sliceIndex.get('T')!]]]);
  });
});
