// The map: sites at their coordinates and spans between them, each with its utilisation, over the outline.
import type { NetworkMap } from '../../../shared/inventory';
import { memoised, ratioOf, type InventoryView } from './inventory-view';

export function getNetworkMap(view: InventoryView): NetworkMap {
  return memoised(view, 'network-map', () => networkMapOf(view));
}

function networkMapOf(view: InventoryView): NetworkMap {
  return {
    name: view.scenario.name ?? null,
    outline: view.scenario.outline ?? null,
    sites: view.sites.map((s) => ({
      id: s.id, name: s.name, kind: s.kind, lat: s.lat, lon: s.lon,
      cpuUtilisation: ratioOf(view.cpuUsed.get(s.id) ?? 0, s.cpu),
    })),
    spans: view.spans.map((s) => ({
      id: s.id, a: s.a, b: s.b, capacityGbps: s.capacityGbps,
      utilisation: ratioOf(view.gbpsUsed.get(s.id) ?? 0, s.capacityGbps),
    })),
  };
}
