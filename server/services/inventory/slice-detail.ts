// One slice: its functions where they run now, each tie's path (spans, sites, latency, availability), and its revisions.
import type { SliceDetail, SliceTieView } from '../../../shared/inventory';
import {
  elementAvailability, spanLatencyMs, type ScenarioPlacement, type ScenarioTie,
} from '../../../shared/scenario';
import { listPlacementRevisions } from '../../queries/inventory/placement-history';
import type { Queryable } from '../../../db/client';
import { InventoryNotFoundError } from './errors';
import { memoised, type InventoryView } from './inventory-view';
import { sliceTable } from './slice-rows';
import { pathSites } from './slice-uses';

function tieView(view: InventoryView, tie: ScenarioTie, placement: ScenarioPlacement | undefined): SliceTieView {
  const base = {
    id: tie.id, from: tie.from, to: tie.to, bandwidthGbps: tie.bandwidthGbps,
    maxLatencyMs: tie.maxLatencyMs, minAvailability: tie.minAvailability ?? null,
  };
  const spanIds = placement?.paths[tie.id];
  const fromSite = placement?.sites[tie.from];
  if (!spanIds || !fromSite) return { ...base, path: null };
  // The whole network, not the asker's view: every span on the slice's own path is in its view anyway.
  const spans = memoised(view, 'all-spans', () => new Map(view.scenario.spans.map((s) => [s.id, s])));
  const onPath = spanIds.map((id) => spans.get(id)).filter((s) => s !== undefined);
  return {
    ...base,
    path: {
      spans: [...spanIds],
      sites: pathSites(fromSite, spanIds, spans),
      latencyMs: onPath.reduce((ms, s) => ms + spanLatencyMs(s), 0),
      availability: onPath.reduce((a, s) => a * elementAvailability(s), 1),
    },
  };
}

export async function getSliceDetail(db: Queryable, view: InventoryView, id: string): Promise<SliceDetail> {
  const index = memoised(view, 'slice-detail', () => ({
    slices: new Map(view.slices.map((s, i) => [s.id, { slice: s, row: sliceTable(view).rows[i] }])),
    placements: new Map(view.scenario.placements.map((p) => [p.slice, p])),
    siteNames: new Map(view.scenario.sites.map((s) => [s.id, s.name])),
  }));
  const found = index.slices.get(id);
  if (!found) throw new InventoryNotFoundError('slice', id);
  const { slice, row } = found;
  const placement = index.placements.get(id);
  const siteNames = index.siteNames;
  const functions = slice.functions.map((f) => {
    const siteId = placement?.sites[f.id] ?? null;
    return {
      id: f.id, name: f.name ?? null, cpu: f.cpu, anchor: f.anchor ?? null,
      moveCost: f.moveCost ?? 1, fixed: f.fixed ?? false,
      siteId, siteName: siteId === null ? null : siteNames.get(siteId) ?? siteId,
    };
  });
  const revisions = await listPlacementRevisions(db, { sliceId: id });
  return {
    slice: row,
    functions,
    ties: slice.ties.map((t) => tieView(view, t, placement)),
    history: revisions.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() })),
  };
}
