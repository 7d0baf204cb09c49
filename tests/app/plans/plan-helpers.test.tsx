// Pure helpers of the plan screens: paths read as the sites they pass, what the map draws, the form's options, and
// when a plan may be accepted.
import { elementNames, siteChain, slicePartsFrom } from '@/components/plans/use-element-names';
import { stepText } from '@/components/plans/plan-steps';
import { REROUTE_COST, sliceWeight } from '@/planner/plan/evaluate-plan';
import { planSettingsSchema } from '@/shared/plans';
import { formatGap, outagesAllTicked, planMapElements } from '@/components/plans/plan-review-data';
import { functionOptionsFrom } from '@/components/plans/use-run-options';
import {
  EFFORT, effortOf, MOVE_COST_DEFINITION, runTimeWords, settingsSummary, UNPLACED_PRIORITY_DEFINITION,
} from '@/components/plans/plan-format';
import { knockOnSlice, networkMap, plan, review, slices } from './plan-fixtures';

test('a path reads as the sites it passes in order, whichever way its spans are stored', () => {
  const names = elementNames(networkMap as Parameters<typeof elementNames>[0]);
  expect(names.path(['sp-2', 'sp-3'])).toBe('Aldmouth → Brackwell → Corran');
  expect(names.path(['sp-3', 'sp-2'])).toBe('Corran → Brackwell → Aldmouth');
  expect(names.path(['sp-1', 'sp-4'])).toBe('Aldmouth → Corran → Dunsey');
  expect(names.path([])).toBe('no spans (both ends on one site)');
  // Unknown spans fall back to their ids rather than inventing a route.
  expect(names.path(['sp-1', 'sp-99'])).toBe('Aldmouth – Corran, sp-99');
  expect(siteChain([{ a: 'x', b: 'y' }, { a: 'p', b: 'q' }])).toBeNull();
  expect(names.site('nowhere')).toBe('nowhere');
});

test('the map shows only what changes, or one slice’s whole placement when it is chosen', () => {
  const all = planMapElements(slices, null);
  expect(new Set(all.before.sites)).toEqual(new Set(['edge-a']));
  expect(new Set(all.after.sites)).toEqual(new Set(['agg-b']));
  expect(new Set(all.before.spans)).toEqual(new Set(['sp-1']));
  expect(new Set(all.after.spans)).toEqual(new Set(['sp-2', 'sp-3', 'sp-4']));
  const one = planMapElements(slices, 'sl-port');
  expect(one.after.spans.sort()).toEqual(['sp-2', 'sp-3']);
  expect(planMapElements(slices, 'sl-plc').after).toEqual({ sites: [], spans: [] });
});

test('the map draws knock-on moves too: their old and new paths join the plan’s changes', () => {
  const all = planMapElements([...slices, knockOnSlice], null);
  expect(all.before.spans).toContain('sp-4');
  expect(all.after.spans).toContain('sp-1');
  expect(planMapElements([...slices, knockOnSlice], 'sl-tele')).toEqual({ before: { sites: [], spans: ['sp-4'] }, after: { sites: [], spans: ['sp-1'] } });
});

test('accepting needs every unresolved slice ticked; gaps read as percentages', () => {
  expect(outagesAllTicked(review(), [])).toBe(false);
  expect(outagesAllTicked(review(), ['sl-plc'])).toBe(true);
  expect(outagesAllTicked(review({ slices: slices.filter((s) => s.outcome !== 'unresolved') }), [])).toBe(true);
  expect(formatGap(0.042)).toBe('4.2 %');
  expect(formatGap(0.0012)).toBe('0.12 %');
  expect(formatGap(null)).toBeNull();
});

test('function options name the site each function sits on; the settings summary is one line', () => {
  const options = functionOptionsFrom([{ slice: 's', sites: { 'f-2': 'agg-b', 'f-1': 'edge-a' } }], (id) => id.toUpperCase());
  expect(options).toEqual([{ id: 'f-1', label: 'f-1 · EDGE-A' }, { id: 'f-2', label: 'f-2 · AGG-B' }]);
  expect(settingsSummary(plan().settings)).toBe('Standard search on one processor core · 20 s limit · moves back after the window · up to 5 moves of untouched slices · 1 site left out · run number 7');
  const kept = { ...plan().settings, mode: 'islands' as const, afterWindow: 'keep' as const, pinned: ['f-1', 'f-2'], excludedSites: [], knockOn: false };
  expect(settingsSummary(kept)).toBe('Standard search on both processor cores · 20 s limit · keeps the new placement after the window · no moves of untouched slices · 2 functions kept in place · run number 7');
  expect(settingsSummary({ ...plan().settings, maxKnockOnMoves: 1 })).toMatch(/ · up to 1 move of untouched slices · /);
  expect(settingsSummary({ ...plan().settings, maxKnockOnMoves: 0 })).toMatch(/ · no moves of untouched slices · /);
});

test('steps name the function, the link by its ends, the slice and the sites, never ids', () => {
  const parts = slicePartsFrom([{
    functions: [{ id: 'sl-port-gw', name: 'IoT gateway' }, { id: 'sl-port-upf', name: 'User plane' }],
    ties: [{ id: 'sl-port-t1', from: 'sl-port-gw', to: 'sl-port-upf' }],
  }]);
  const names = elementNames(networkMap as Parameters<typeof elementNames>[0], parts);
  const move = { slice: 'sl-port', kind: 'move-function' as const, element: 'sl-port-gw', from: 'edge-a', to: 'agg-b', needsSpare: false, knockOn: false };
  expect(stepText(move, names, 'Harbour cranes')).toBe('Move IoT gateway of Harbour cranes from Aldmouth to Brackwell');
  const reroute = { ...move, kind: 'reroute-tie' as const, element: 'sl-port-t1', from: ['sp-1'], to: [] };
  expect(stepText(reroute, names, 'Harbour cranes'))
    .toBe('Reroute the link IoT gateway – User plane of Harbour cranes from Aldmouth → Corran to no spans (both ends on one site)');
  expect(stepText(reroute, elementNames(undefined), 'Harbour cranes')).not.toMatch(/sl-port/);
});

test('the move-cost and priority-point words match the planner’s own weights', () => {
  expect(MOVE_COST_DEFINITION).toContain(`each link rerouted adds ${REROUTE_COST}`);
  expect(UNPLACED_PRIORITY_DEFINITION).toContain(`counts ${sliceWeight(1)} at priority 1, down to ${sliceWeight(5)} at priority 5`);
  expect(EFFORT.standard.population).toBe(planSettingsSchema.parse({}).population);
  expect(effortOf(EFFORT.thorough.population)).toBe('thorough');
  expect(effortOf(41)).toBeNull();
  expect(runTimeWords(380, 3500)).toBe('search 380 ms of 3.5 s wall time in all (the rest: preparing the network and the reference solvers)');
  expect(runTimeWords(380, null)).toBe('search 380 ms wall time');
});
