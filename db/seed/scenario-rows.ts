// Maps a validated scenario onto table rows (pure; no database access).
import type { Scenario } from '../../shared/scenario';
import {
  tenants, sites, spans, slices, sliceFunctions, sliceTies, placements, windows, windowElements,
} from '../schema';
import { shiftedWindowTimes } from './shift-windows';

export interface ScenarioRows {
  tenants: (typeof tenants.$inferInsert)[];
  sites: (typeof sites.$inferInsert)[];
  spans: (typeof spans.$inferInsert)[];
  slices: (typeof slices.$inferInsert)[];
  functions: (typeof sliceFunctions.$inferInsert)[];
  ties: (typeof sliceTies.$inferInsert)[];
  placements: (typeof placements.$inferInsert)[];
  windows: (typeof windows.$inferInsert)[];
  windowElements: (typeof windowElements.$inferInsert)[];
}

export function scenarioRows(s: Scenario, opts: { windowShiftMs: number; ownerId: string | null }): ScenarioRows {
  return {
    tenants: s.tenants.map((t) => ({ id: t.id, name: t.name, noticeDays: t.noticeDays, contacts: t.contacts ?? [] })),
    sites: s.sites.map((x) => ({
      id: x.id, name: x.name, kind: x.kind, lat: x.lat, lon: x.lon, cpu: x.cpu,
      mtbfHours: x.mtbfHours ?? null, mttrHours: x.mttrHours ?? null,
    })),
    spans: s.spans.map((x) => ({
      id: x.id, siteA: x.a, siteB: x.b, capacityGbps: x.capacityGbps, lengthKm: x.lengthKm,
      latencyMs: x.latencyMs ?? null, mtbfHours: x.mtbfHours ?? null, mttrHours: x.mttrHours ?? null, srlg: x.srlg ?? [],
    })),
    slices: s.slices.map((x) => ({
      id: x.id, tenantId: x.tenant, name: x.name, sst: x.sst, sd: x.sd ?? null, priority: x.priority, critical: x.critical ?? false,
    })),
    functions: s.slices.flatMap((x) => x.functions.map((f) => ({
      id: f.id, sliceId: x.id, name: f.name ?? null, cpu: f.cpu, anchor: f.anchor ?? null,
      moveCost: f.moveCost ?? 1, fixed: f.fixed ?? false,
    }))),
    ties: s.slices.flatMap((x) => x.ties.map((t) => ({
      id: t.id, sliceId: x.id, fromFunction: t.from, toFunction: t.to, bandwidthGbps: t.bandwidthGbps,
      maxLatencyMs: t.maxLatencyMs, minAvailability: t.minAvailability ?? null,
    }))),
    // The file's placements are the starting point: revision 1, in force.
    placements: s.placements.map((p) => ({
      sliceId: p.slice, revision: 1, current: true, sites: p.sites, paths: p.paths, reason: 'import',
    })),
    windows: (s.windows ?? []).map((w) => ({
      id: w.id, title: w.title, workType: w.workType ?? null, ownerId: opts.ownerId,
      ...shiftedWindowTimes(w, opts.windowShiftMs),
    })),
    windowElements: (s.windows ?? []).flatMap((w) => [
      ...w.down.sites.map((id) => ({ windowId: w.id, elementKind: 'site' as const, elementId: id, effect: 'down' as const, fraction: null })),
      ...w.down.spans.map((id) => ({ windowId: w.id, elementKind: 'span' as const, elementId: id, effect: 'down' as const, fraction: null })),
      ...(w.reduced ?? []).map((r) => ({
        windowId: w.id,
        elementKind: 'site' in r ? ('site' as const) : ('span' as const),
        elementId: 'site' in r ? r.site : r.span,
        effect: 'reduced' as const,
        fraction: r.fraction,
      })),
    ]),
  };
}
