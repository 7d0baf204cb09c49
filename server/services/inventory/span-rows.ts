// Spans: list rows with bandwidth load (Σ bandwidth of the ties routed over them), and the detail with their slices.
import type { SpanDetail, SpanList, SpanListQuery, SpanRow } from '../../../shared/inventory';
import { spanLatencyMs, type ScenarioSpan } from '../../../shared/scenario';
import { InventoryNotFoundError } from './errors';
import { memoised, ratioOf, type InventoryView } from './inventory-view';
import { indexRows, pageIndexed } from './paging';

export function spanRow(view: InventoryView, span: ScenarioSpan): SpanRow {
  const usedGbps = view.gbpsUsed.get(span.id) ?? 0;
  // Both ends of a span in view are in view too (a tenant's footprint includes the ends of its spans).
  const name = (siteId: string) => view.siteById.get(siteId)?.name ?? siteId;
  return {
    id: span.id, a: span.a, b: span.b, aName: name(span.a), bName: name(span.b),
    capacityGbps: span.capacityGbps, lengthKm: span.lengthKm,
    latencyMs: spanLatencyMs(span), latencyDerived: span.latencyMs === undefined,
    mtbfHours: span.mtbfHours ?? null, mttrHours: span.mttrHours ?? null, srlg: span.srlg ?? [],
    usedGbps, utilisation: ratioOf(usedGbps, span.capacityGbps),
    sliceCount: view.uses.count('spans', span.id),
  };
}

export function listSpans(view: InventoryView, query: SpanListQuery): SpanList {
  const table = memoised(view, 'span-rows', () => indexRows(
    view.spans.map((s) => spanRow(view, s)), (row) => `${row.id} ${row.aName} ${row.bName} ${row.srlg.join(' ')}`,
  ));
  const { site, srlg } = query;
  const keep = (row: SpanRow) => (!site || row.a === site || row.b === site) && (!srlg || row.srlg.includes(srlg));
  return pageIndexed(table, query, (row, key) => row[key], keep);
}

export function getSpanDetail(view: InventoryView, id: string): SpanDetail {
  const span = view.spanById.get(id);
  if (!span) throw new InventoryNotFoundError('span', id);
  return { span: spanRow(view, span), slices: view.uses.list('spans', id) };
}
