import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { verifyPlan } from '../../../planner/verify/verify-plan';
import type { Inventory, SlicePlan, WindowSpec } from '../../../planner/model/types';
import type { Scenario } from '../../../shared/scenario';
import { tinyScenario, window } from '../fixtures/tiny-scenario';

const siteB = compileWindow(window('w-site-b', { sites: ['B'] }));
const AFFECTED = ['s-hosted', 's-transit'];

/** A valid plan for "site B down": gw moves B → C, the transit tie goes round via D–C–A. */
function validPlan(): SlicePlan[] {
  return [
    { slice: 's-hosted', outcome: 'move', sites: { gw: 'C', app: 'A' }, paths: { 'gw-app': ['ac'] } },
    { slice: 's-transit', outcome: 'reroute', sites: { ran: 'E', upf: 'A' }, paths: { 'ran-upf': ['de', 'cd', 'ac'] } },
  ];
}

function codes(inv: Inventory, slices: SlicePlan[], w: WindowSpec = siteB, affected = AFFECTED, reservations = {}) {
  return verifyPlan(inv, w, { affected, slices }, reservations).violations.map((v) => v.code);
}

function edit(change: (plan: SlicePlan[]) => void): SlicePlan[] {
  const plan = validPlan();
  change(plan);
  return plan;
}

function inventory(change?: (s: Scenario) => void): Inventory {
  const scenario = tinyScenario();
  change?.(scenario);
  return buildInventory(scenario);
}

describe('verifyPlan', () => {
  const inv = inventory();

  it('accepts the empty plan of a window that touches nothing', () => {
    const result = verifyPlan(inv, compileWindow(window('w-nothing', {})), { affected: [], slices: [] });
    expect(result).toEqual({ ok: true, violations: [] });
  });

  it('accepts a valid plan', () => {
    expect(verifyPlan(inv, siteB, { affected: AFFECTED, slices: validPlan() }).violations).toEqual([]);
  });

  it('detects cpu and bandwidth overload, including reservations', () => {
    expect(codes(inv, validPlan(), siteB, AFFECTED, { siteCpu: { C: 45 } })).toEqual(['cpu-capacity']);
    expect(codes(inv, validPlan(), siteB, AFFECTED, { spanGbps: { cd: 15 } })).toEqual(['bandwidth-capacity']);
  });

  it('detects a latency budget and a minimum availability that the path misses', () => {
    const tight = inventory((s) => { s.slices[1].ties[0].maxLatencyMs = 0.15; });
    expect(codes(tight, validPlan())).toEqual(['latency']);
    // three spans of A = 20000/20008 each give about 0.9988
    const strict = inventory((s) => { s.slices[1].ties[0].minAvailability = 0.9995; });
    expect(codes(strict, validPlan())).toEqual(['availability']);
  });

  it('detects a broken anchor and a moved fixed function', () => {
    const anchored = inventory((s) => { s.slices[0].functions[0].anchor = { lat: 50.0, lon: 10.2, radiusKm: 5 }; });
    expect(codes(anchored, validPlan())).toEqual(['anchor']);
    const moved = edit((p) => { p[1].sites.ran = 'D'; p[1].paths['ran-upf'] = ['cd', 'ac']; p[1].outcome = 'move'; });
    expect(codes(inv, moved)).toEqual(['fixed-moved']);
  });

  it('detects use of down elements and broken paths', () => {
    const stays = edit((p) => { p[1] = { ...p[1], outcome: 'stays', paths: { 'ran-upf': ['de', 'bd', 'ab'] } }; });
    expect(codes(inv, stays)).toEqual(['down-element', 'down-element']);
    const onB = edit((p) => { p[0] = { ...p[0], outcome: 'stays', sites: { gw: 'B', app: 'A' }, paths: { 'gw-app': ['ab'] } }; });
    expect(codes(inv, onB)).toEqual(['down-element', 'down-element']);
    const broken = edit((p) => { p[1].paths['ran-upf'] = ['de', 'ac']; });
    expect(codes(inv, broken)).toEqual(['broken-path']);
    const shortOfTarget = edit((p) => { p[1].paths['ran-upf'] = ['de', 'cd']; });
    expect(codes(inv, shortOfTarget)).toEqual(['broken-path']);
  });

  it('detects missing ties, missing entries, extra entries for unaffected slices and a wrong outcome', () => {
    expect(codes(inv, edit((p) => { p[0].paths = {}; }))).toEqual(['missing-tie']);
    expect(codes(inv, edit((p) => { delete p[0].sites.app; }))).toEqual(['missing-function']);
    expect(codes(inv, edit((p) => { p.pop(); }))).toEqual(['missing-slice', 'missing-slice']);
    const extra = edit((p) => { p.push({ slice: 's-quiet', outcome: 'stays', sites: { c1: 'C', d1: 'D' }, paths: { 'c-d': ['cd'] } }); });
    expect(codes(inv, extra)).toEqual(['extra-slice']);
    expect(codes(inv, edit((p) => { p[0].outcome = 'reroute'; }))).toEqual(['outcome-mismatch']);
  });

  it('accepts unresolved slices and frees their resources', () => {
    const unresolved = edit((p) => { p[1] = { slice: 's-transit', outcome: 'unresolved', sites: {}, paths: {} }; });
    expect(codes(inv, unresolved, siteB, AFFECTED, { spanGbps: { cd: 15 } })).toEqual([]);
  });
});
