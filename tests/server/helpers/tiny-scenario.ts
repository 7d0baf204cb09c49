// A two-site scenario that passes validation; tests break copies of it on purpose.
export function tinyScenario() {
  return {
    format: 'slackwater-scenario/1',
    name: 'Two sites',
    sites: [
      { id: 's1', name: 'North Point', kind: 'core', lat: 10, lon: 10, cpu: 32 },
      { id: 's2', name: 'South Point', kind: 'edge', lat: 10.1, lon: 10, cpu: 16 },
    ],
    spans: [{ id: 'k1', a: 's1', b: 's2', capacityGbps: 10, lengthKm: 12 }],
    tenants: [{ id: 't1', name: 'Harbour Works', noticeDays: 7 }],
    slices: [{
      id: 'sl1', tenant: 't1', name: 'Crane control', sst: 2, priority: 1,
      functions: [{ id: 'f1', cpu: 2 }, { id: 'f2', cpu: 2 }],
      ties: [{ id: 'e1', from: 'f1', to: 'f2', bandwidthGbps: 1, maxLatencyMs: 5 }],
    }],
    placements: [{ slice: 'sl1', sites: { f1: 's1', f2: 's2' }, paths: { e1: ['k1'] } }],
  };
}
