// Knock-on entries: a plan may move or reroute a slice the window does not touch, to make room for affected ones.
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import type { Reservation, SlicePlan } from '../../../planner/model/types';
import { verifyPlan } from '../../../planner/verify/verify-plan';
import { tinyScenario, window } from '../fixtures/tiny-scenario';

const inv = buildInventory(tinyScenario());
const siteB = compileWindow(window('w-site-b', { sites: ['B'] }));
const AFFECTED = ['s-hosted', 's-transit'];
/** Leaves cd 5 Gbit/s: just what s-transit's detour needs, so s-quiet's own 1 Gbit/s on cd must go. */
const TIGHT_CD: Reservation = { spanGbps: { cd: 15 } };

/** Site B down: gw moves B → C, the transit tie goes round via D–C–A (both as in verify-plan.test.ts). */
function affectedEntries(): SlicePlan[] {
  return [
    { slice: 's-hosted', outcome: 'move', sites: { gw: 'C', app: 'A' }, paths: { 'gw-app': ['ac'] } },
    { slice: 's-transit', outcome: 'reroute', sites: { ran: 'E', upf: 'A' }, paths: { 'ran-upf': ['de', 'cd', 'ac'] } },
  ];
}

/** s-quiet (untouched: c1 on C, d1 on D over cd) moves d1 onto C, which takes its tie off cd. */
function knockOn(change: Partial<SlicePlan> = {}): SlicePlan {
  return {
    slice: 's-quiet', outcome: 'move', sites: { c1: 'C', d1: 'C' }, paths: { 'c-d': [] }, madeRoomFor: ['s-transit'], ...change,
  };
}

function codes(entries: SlicePlan[], reservations?: Reservation): string[] {
  return verifyPlan(inv, siteB, { affected: AFFECTED, slices: entries }, reservations).violations.map((v) => v.code);
}

describe('verifyPlan with knock-on entries', () => {
  it('accepts a knock-on move that names the affected slice it makes room for', () => {
    expect(codes([...affectedEntries(), knockOn()])).toEqual([]);
  });

  it('counts a knock-on slice at its planned placement: moving it off a full span makes the plan fit', () => {
    expect(codes(affectedEntries(), TIGHT_CD)).toEqual(['bandwidth-capacity']);
    expect(codes([...affectedEntries(), knockOn()], TIGHT_CD)).toEqual([]);
  });

  it('reports an entry for an untouched slice without a non-empty madeRoomFor as extra-slice', () => {
    expect(codes([...affectedEntries(), knockOn({ madeRoomFor: undefined })])).toEqual(['extra-slice']);
    expect(codes([...affectedEntries(), knockOn({ madeRoomFor: [] })])).toEqual(['extra-slice']);
  });

  it('reports every madeRoomFor id that is not an affected slice as knock-on-target', () => {
    expect(codes([...affectedEntries(), knockOn({ madeRoomFor: ['s-transit', 's-quiet', 'no-such-slice'] })]))
      .toEqual(['knock-on-target', 'knock-on-target']);
  });

  it('reports an affected slice whose entry carries madeRoomFor as knock-on-target', () => {
    const entries = affectedEntries();
    entries[0].madeRoomFor = ['s-transit'];
    expect(codes(entries)).toEqual(['knock-on-target']);
  });

  it('reports an unresolved knock-on entry and keeps that slice at its current placement for the load', () => {
    const unresolved = knockOn({ outcome: 'unresolved', sites: {}, paths: {} });
    expect(codes([...affectedEntries(), unresolved])).toEqual(['knock-on-unresolved']);
    // Its 1 Gbit/s stays on cd, so the tight reservation overflows as if the entry were absent.
    expect(codes([...affectedEntries(), unresolved], TIGHT_CD)).toEqual(['knock-on-unresolved', 'bandwidth-capacity']);
  });

  it('reports a knock-on entry that stays as knock-on-stays', () => {
    const stays = knockOn({ outcome: 'stays', sites: { c1: 'C', d1: 'D' }, paths: { 'c-d': ['cd'] } });
    expect(codes([...affectedEntries(), stays])).toEqual(['knock-on-stays']);
  });

  it('applies every other check to knock-on entries', () => {
    const onDownSite = knockOn({ sites: { c1: 'C', d1: 'B' }, paths: { 'c-d': ['ac', 'ab'] } });
    expect(codes([...affectedEntries(), onDownSite])).toEqual(['down-element', 'down-element']);
    const broken = knockOn({ outcome: 'reroute', sites: { c1: 'C', d1: 'D' }, paths: { 'c-d': ['ac'] } });
    expect(codes([...affectedEntries(), broken])).toEqual(['broken-path']);
    expect(codes([...affectedEntries(), knockOn({ outcome: 'reroute' })])).toEqual(['outcome-mismatch']);
    expect(codes([...affectedEntries(), knockOn({ sites: { c1: 'C' } })])).toEqual(['missing-function']);
    expect(codes([...affectedEntries(), knockOn(), knockOn()])).toEqual(['duplicate-slice']);
  });

  it('applies capacity to knock-on entries: a move onto a site without room is cpu-capacity', () => {
    // C offers 50 vCPU less 44 reserved; gw (4) + c1 (3) + d1 (3) need 10.
    expect(codes([...affectedEntries(), knockOn()], { siteCpu: { C: 44 } })).toEqual(['cpu-capacity']);
  });
});
