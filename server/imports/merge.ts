// Builds the target state: the current data with the file laid over it, per import kind.
import type { ImportIssue } from '../../shared/imports';
import { siteSchema, spanSchema, type Scenario, type ScenarioSite, type ScenarioSlice, type ScenarioSpan } from '../../shared/scenario';
import { zodIssuesToScenarioIssues } from '../../shared/scenario-validate';
import type { CsvSlice, GraphmlSite, GraphmlSpan, ParsedContent } from './types';

type Merge = { target: Scenario | null; errors: ImportIssue[] };

/** Replaces items with the same id and appends new ones, keeping the current order. */
function upsertById<T extends { id: string }>(current: T[], incoming: T[]): T[] {
  const byId = new Map(incoming.map((x) => [x.id, x]));
  const kept = current.map((x) => byId.get(x.id) ?? x);
  const known = new Set(current.map((x) => x.id));
  return [...kept, ...incoming.filter((x) => !known.has(x.id))];
}

const NODE_KEY_HINT: Record<string, string> = { lat: 'lat or Latitude', lon: 'lon or Longitude', name: 'name or label', kind: 'kind or type', cpu: 'cpu' };
const EDGE_KEY_HINT: Record<string, string> = { capacityGbps: 'capacityGbps, capacity or LinkSpeedRaw', lengthKm: 'lengthKm or length' };

/** Coordinates always come from the file; name, kind and compute may come from the site already known. */
function graphmlSite(g: GraphmlSite, current: ScenarioSite | undefined, fileName: string, errors: ImportIssue[]): ScenarioSite | null {
  const path = `node[${g.id}]`;
  const site: Partial<ScenarioSite> = { ...current, ...g.given, id: g.id };
  const missing = ['lat', 'lon'].filter((k) => g.given[k as 'lat'] === undefined)
    .concat(['name', 'kind', 'cpu'].filter((k) => site[k as 'name'] === undefined));
  for (const k of missing) errors.push({ file: fileName, path, message: `missing ${k} (key ${NODE_KEY_HINT[k]})${current ? '' : ' for a new site'}` });
  if (missing.length > 0) return null;
  const parsed = siteSchema.safeParse(site);
  if (!parsed.success) zodIssuesToScenarioIssues(parsed.error.issues).forEach((i) => errors.push({ file: fileName, path, message: `${i.path.slice(2)}: ${i.message}` }));
  return parsed.success ? parsed.data : null;
}

/** Capacity and length always come from the file; latency, when missing, is derived from length by the format. */
function graphmlSpan(g: GraphmlSpan, current: ScenarioSpan | undefined, fileName: string, errors: ImportIssue[]): ScenarioSpan | null {
  const path = `edge[${g.id}]`;
  const { latencyMs: _derived, ...kept } = current ?? ({} as Partial<ScenarioSpan>);
  const span = { ...kept, ...g.given, id: g.id };
  const missing = ['capacityGbps', 'lengthKm'].filter((k) => g.given[k as 'lengthKm'] === undefined);
  for (const k of missing) errors.push({ file: fileName, path, message: `missing ${k} (key ${EDGE_KEY_HINT[k]})` });
  if (span.a === span.b) errors.push({ file: fileName, path, message: `edge joins node "${span.a}" to itself` });
  if (missing.length > 0 || span.a === span.b) return null;
  const parsed = spanSchema.safeParse(span);
  if (!parsed.success) zodIssuesToScenarioIssues(parsed.error.issues).forEach((i) => errors.push({ file: fileName, path, message: `${i.path.slice(2)}: ${i.message}` }));
  return parsed.success ? parsed.data : null;
}

function mergeGraphml(before: Scenario, sites: GraphmlSite[], spans: GraphmlSpan[], fileName: string): Merge {
  const errors: ImportIssue[] = [];
  const curSites = new Map(before.sites.map((s) => [s.id, s]));
  const curSpans = new Map(before.spans.map((s) => [s.id, s]));
  const newSites = sites.map((g) => graphmlSite(g, curSites.get(g.id), fileName, errors));
  const newSpans = spans.map((g) => graphmlSpan(g, curSpans.get(g.id), fileName, errors));
  if (errors.length > 0) return { target: null, errors };
  return { target: { ...before, sites: newSites as ScenarioSite[], spans: newSpans as ScenarioSpan[] }, errors };
}

function mergeCsvSlices(before: Scenario, incoming: CsvSlice[], fileName: string): Merge {
  const errors: ImportIssue[] = [];
  const current = new Map(before.slices.map((s) => [s.id, s]));
  const slices: ScenarioSlice[] = [];
  let placements = before.placements;
  for (const cs of incoming) {
    const existing = current.get(cs.sliceId);
    const say = (message: string) => errors.push({ file: fileName, row: cs.row, message: `slice "${cs.sliceId}": ${message}` });
    if (!existing && !cs.attrs) { say('a new slice needs a slice row'); continue; }
    if (!existing && !cs.body) { say('a new slice needs its function rows (with the site each is placed on)'); continue; }
    const attrs = cs.attrs ?? existing!;
    const body = cs.body ?? { functions: existing!.functions, ties: existing!.ties };
    const { functions: _f, ties: _t, ...plain } = attrs as ScenarioSlice;
    slices.push({ ...plain, functions: body.functions, ties: body.ties });
    if (cs.body) placements = upsertById(placements.map((p) => ({ ...p, id: p.slice })), [{ ...cs.body.placement, id: cs.sliceId }]).map(({ id: _id, ...p }) => p);
  }
  return { target: { ...before, slices: upsertById(before.slices, slices), placements }, errors };
}

export function mergeImport(before: Scenario, content: ParsedContent, fileName: string): Merge {
  switch (content.kind) {
    case 'scenario':
      return { target: content.scenario, errors: [] };
    case 'graphml':
      return mergeGraphml(before, content.sites, content.spans, fileName);
    case 'csv-sites':
      return { target: { ...before, sites: upsertById(before.sites, content.sites) }, errors: [] };
    case 'csv-spans':
      return { target: { ...before, spans: upsertById(before.spans, content.spans) }, errors: [] };
    case 'csv-slices':
      return mergeCsvSlices(before, content.slices, fileName);
  }
}
