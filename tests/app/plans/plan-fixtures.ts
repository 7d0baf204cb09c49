// Plans in the shape of shared/plans.ts for the component tests: one slice of each outcome and a short trace.
import type { Me } from '@/shared/api';
import type { Plan, PlanObjective, PlanReview, PlanSlice } from '@/shared/plans';

export const planner: Me = { id: 'u-pln', email: 'planner@demo.test', name: 'Pia Planner', roles: ['planner'], tenantId: null };
export const approver: Me = { id: 'u-apr', email: 'approver@demo.test', name: 'Ari Approver', roles: ['approver'], tenantId: null };

export function objective(extra: Partial<PlanObjective> = {}): PlanObjective {
  return { unresolvedWeight: 0, unresolved: 0, moved: 0, rerouted: 0, moveCost: 0, usage: 0, peakUtilisation: 0, ...extra };
}

function slice(id: string, extra: Partial<PlanSlice>): PlanSlice {
  return {
    slice: id, name: `Slice ${id}`, tenantId: 't-1', critical: false, priority: 3, sst: 1, reasons: ['hosted'],
    outcome: 'stays', moves: [], reroutes: [], before: { sites: {}, paths: {} }, after: { sites: {}, paths: {} },
    unresolvedReason: null, madeRoomFor: [], ...extra,
  };
}

export const slices: PlanSlice[] = [
  slice('sl-port', {
    name: 'Harbour cranes', outcome: 'move',
    moves: [{ function: 'sl-port-gw', from: 'edge-a', to: 'agg-b' }],
    reroutes: [{ tie: 'sl-port-t1', from: ['sp-1'], to: ['sp-2', 'sp-3'] }],
    before: { sites: { 'sl-port-gw': 'edge-a' }, paths: { 'sl-port-t1': ['sp-1'] } },
    after: { sites: { 'sl-port-gw': 'agg-b' }, paths: { 'sl-port-t1': ['sp-2', 'sp-3'] } },
  }),
  slice('sl-fair', {
    name: 'Fairground video', outcome: 'reroute', reasons: ['transit'],
    reroutes: [{ tie: 'sl-fair-t1', from: ['sp-1'], to: ['sp-4'] }],
  }),
  slice('sl-quiet', { name: 'Meter readings', outcome: 'stays', reasons: ['unprotected'] }),
  slice('sl-plc', {
    name: 'Press line control', outcome: 'unresolved', after: null, priority: 1,
    unresolvedReason: 'the PLC is fixed to site Edge A, which is down',
  }),
];

/** A knock-on move: the work does not touch "Crane telemetry"; it is rerouted off sp-4 to make room for the port. */
export const knockOnSlice: PlanSlice = slice('sl-tele', {
  name: 'Crane telemetry', tenantId: 't-2', outcome: 'reroute', reasons: [],
  reroutes: [{ tie: 'sl-tele-t1', from: ['sp-4'], to: ['sp-1'] }],
  before: { sites: {}, paths: { 'sl-tele-t1': ['sp-4'] } }, after: { sites: {}, paths: { 'sl-tele-t1': ['sp-1'] } },
  madeRoomFor: [{ slice: 'sl-port', name: 'Harbour cranes' }],
});

/** review() plus the knock-on move, its step first, and the totals that count it. */
export function knockOnReview(extra: Partial<PlanReview> = {}): PlanReview {
  const base = review();
  return review({
    slices: [...slices, knockOnSlice],
    totals: { ...base.totals, rerouted: base.totals.rerouted + 1, knockOn: 1 },
    steps: [{ slice: 'sl-tele', kind: 'reroute-tie', element: 'sl-tele-t1', from: ['sp-4'], to: ['sp-1'], needsSpare: false, knockOn: true }, ...base.steps],
    ...extra,
  });
}

export function review(extra: Partial<PlanReview> = {}): PlanReview {
  const best = objective({ unresolvedWeight: 5, unresolved: 1, moved: 1, rerouted: 2, moveCost: 3.25 });
  return {
    affected: slices.map((s) => s.slice),
    objective: best,
    totals: { stays: 1, moved: 1, rerouted: 1, unresolved: 1, moveCost: 3.25, knockOn: 0 },
    slices,
    steps: [
      { slice: 'sl-port', kind: 'move-function', element: 'sl-port-gw', from: 'edge-a', to: 'agg-b', needsSpare: false, knockOn: false },
      { slice: 'sl-port', kind: 'reroute-tie', element: 'sl-port-t1', from: ['sp-1'], to: ['sp-2', 'sp-3'], needsSpare: true, knockOn: false },
      { slice: 'sl-fair', kind: 'reroute-tie', element: 'sl-fair-t1', from: ['sp-1'], to: ['sp-4'], needsSpare: false, knockOn: false },
    ],
    needsSpare: 1,
    risk: [
      { slice: 'sl-port', failureProbability: 0.0042, unprotected: false, severity: 'medium' },
      { slice: 'sl-quiet', failureProbability: 0.12, unprotected: true, severity: 'high' },
    ],
    trace: [0, 1, 2, 3, 4].map((g) => ({
      generation: g, evaluations: (g + 1) * 40, feasible: true,
      best: objective({ unresolvedWeight: 10 - g, unresolved: g < 4 ? 2 : 1, moveCost: 9 - g }),
    })),
    greedy: { solver: 'greedy', objective: objective({ unresolvedWeight: 8, unresolved: 2, moveCost: 6.5 }), elapsedMs: 28, optimal: null, gap: null, bound: null, note: null },
    exact: { solver: 'exact', objective: objective({ unresolvedWeight: 5, unresolved: 1, moveCost: 3 }), elapsedMs: 1500, optimal: false, gap: 0.042, bound: 7.5, note: null },
    reservedFor: [],
    computeMs: 4200,
    search: null,
    ...extra,
  };
}

export function plan(extra: Partial<Plan> = {}): Plan {
  return {
    id: 'p-1', windowId: 'w-1', windowVersion: 2, status: 'done',
    settings: { mode: 'serial', seed: 7, population: 40, timeLimitSeconds: 20, pinned: [], excludedSites: ['core-x'], afterWindow: 'return', knockOn: true, maxKnockOnMoves: 5 },
    progress: null, error: null, attempts: 1, createdBy: 'u-pln',
    createdAt: '2030-01-01T10:00:00.000Z', startedAt: '2030-01-01T10:00:01.000Z', finishedAt: '2030-01-01T10:00:25.000Z',
    stale: false, accepted: false, acceptedAt: null, outageAccepted: [], review: review(),
    ...extra,
  };
}

/** A four-site network so names and paths can be read: edge-a – agg-b – core-x – edge-d. */
export const networkMap = {
  name: 'Test coast', outline: null,
  sites: [
    { id: 'edge-a', name: 'Aldmouth', kind: 'edge', lat: 55, lon: -26, cpuUtilisation: 0.2 },
    { id: 'agg-b', name: 'Brackwell', kind: 'aggregation', lat: 55.1, lon: -26.1, cpuUtilisation: 0.4 },
    { id: 'core-x', name: 'Corran', kind: 'core', lat: 55.2, lon: -26.2, cpuUtilisation: 0.5 },
    { id: 'edge-d', name: 'Dunsey', kind: 'edge', lat: 55.3, lon: -26.3, cpuUtilisation: 0.1 },
  ],
  spans: [
    { id: 'sp-1', a: 'edge-a', b: 'core-x', capacityGbps: 10, utilisation: 0.3 },
    { id: 'sp-2', a: 'edge-a', b: 'agg-b', capacityGbps: 10, utilisation: 0.3 },
    { id: 'sp-3', a: 'agg-b', b: 'core-x', capacityGbps: 10, utilisation: 0.3 },
    { id: 'sp-4', a: 'edge-d', b: 'core-x', capacityGbps: 10, utilisation: 0.3 },
  ],
};
