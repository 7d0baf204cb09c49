// A small valid scenario for validation tests: three sites in a line, one tenant, two slices.
import type { Scenario } from '../../shared/scenario';

export function smallScenario(): Scenario {
  return {
    format: 'slackwater-scenario/1',
    name: 'test line',
    sites: [
      { id: 'A', name: 'Alpha', kind: 'core', lat: 50, lon: 0, cpu: 100 },
      { id: 'B', name: 'Bravo', kind: 'aggregation', lat: 50.1, lon: 0, cpu: 50 },
      { id: 'C', name: 'Charlie', kind: 'edge', lat: 50.2, lon: 0, cpu: 20 },
    ],
    spans: [
      { id: 'AB', a: 'A', b: 'B', capacityGbps: 10, lengthKm: 100 },
      { id: 'CB', a: 'C', b: 'B', capacityGbps: 10, lengthKm: 100 },
    ],
    tenants: [{ id: 'T', name: 'Tenant', noticeDays: 7, contacts: [{ name: 'Ops', email: 'ops@tenant.example' }] }],
    slices: [
      {
        id: 'S1', tenant: 'T', name: 'one', sst: 1, sd: '00A1B2', priority: 2,
        functions: [
          { id: 'f1', cpu: 10, anchor: { site: 'A' } },
          { id: 'f2', cpu: 5, anchor: { lat: 50.2, lon: 0, radiusKm: 5 } },
        ],
        ties: [{ id: 't1', from: 'f1', to: 'f2', bandwidthGbps: 4, maxLatencyMs: 2 }],
      },
      {
        id: 'S2', tenant: 'T', name: 'two', sst: 2, priority: 1, critical: true,
        functions: [{ id: 'g1', cpu: 5 }, { id: 'g2', cpu: 5 }],
        ties: [{ id: 'u1', from: 'g1', to: 'g2', bandwidthGbps: 1, maxLatencyMs: 1 }],
      },
    ],
    placements: [
      { slice: 'S1', sites: { f1: 'A', f2: 'C' }, paths: { t1: ['AB', 'CB'] } },
      { slice: 'S2', sites: { g1: 'B', g2: 'B' }, paths: { u1: [] } },
    ],
    windows: [
      {
        id: 'W1', title: 'Splice', start: '2026-12-03T22:00:00-01:00', end: '2026-12-04T03:00:00-01:00',
        down: { sites: [], spans: ['AB'] }, reduced: [{ site: 'B', fraction: 0.5 }], workType: 'fibre splice',
      },
    ],
  };
}
