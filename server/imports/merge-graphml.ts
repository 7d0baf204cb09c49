// Lays a GraphML topology over the current data: a value comes from the file, else (sites' name, kind, compute and
// failure data; spans' failure data and SRLG) from the current inventory, else from the upload's defaults.
import type { ImportDefaults, ImportIssue, ValueSource } from '../../shared/imports';
import { SITE_KINDS, siteSchema, spanSchema, type Scenario, type ScenarioSite, type ScenarioSpan } from '../../shared/scenario';
import { zodIssuesToScenarioIssues } from '../../shared/scenario-validate';
import { derivedLengthKm, kindsByDegree } from './graphml-fill';
import type { GraphmlNames, GraphmlSite, GraphmlSpan } from './types';

/** Where each value the import sets came from, by id then field; kept current values are not listed. */
export type ValueSources = { sites: Record<string, Record<string, ValueSource>>; spans: Record<string, Record<string, ValueSource>> };
/** The file's sites and spans as filled in (before validation), for a person to read in the preview. */
export type FilledItems = { sites: Partial<ScenarioSite>[]; spans: Partial<ScenarioSpan>[] };

export type GraphmlMerge = {
  target: Scenario | null; errors: ImportIssue[]; warnings: ImportIssue[]; values: ValueSources; filled: FilledItems;
};

type Context = {
  fileName: string; defaults: ImportDefaults | undefined; names: GraphmlNames; errors: ImportIssue[]; warnings: ImportIssue[];
  byDegree: Map<string, ScenarioSite['kind']> | null; fileSites: Map<string, GraphmlSite>;
};

const NODE_KEY_HINT: Record<string, string> = { lat: 'lat or Latitude', lon: 'lon or Longitude', name: 'name or label', kind: 'kind or type', cpu: 'cpu' };
const EDGE_KEY_HINT: Record<string, string> = { capacityGbps: 'capacityGbps, capacity or LinkSpeedRaw', lengthKm: 'lengthKm or length' };

const fromFile = (given: object): Record<string, ValueSource> =>
  Object.fromEntries(Object.keys(given).filter((k) => k !== 'a' && k !== 'b').map((k) => [k, 'file' as const]));
const isSiteKind = (k: string): k is ScenarioSite['kind'] => (SITE_KINDS as readonly string[]).includes(k);

function schemaErrors(issues: Parameters<typeof zodIssuesToScenarioIssues>[0], path: string, ctx: Context): void {
  zodIssuesToScenarioIssues(issues).forEach((i) => ctx.errors.push({ file: ctx.fileName, path, message: `${i.path.slice(2)}: ${i.message}` }));
}

/** Coordinates always come from the file; name, kind and compute from the file, the site already known, or defaults. */
function graphmlSite(g: GraphmlSite, current: ScenarioSite | undefined, ctx: Context, from: Record<string, ValueSource>, filled: FilledItems) {
  const path = `node[${g.id}]`;
  const given: Partial<ScenarioSite> = { ...g.given };
  const { siteKind, cpuByKind } = ctx.defaults ?? {};
  if (given.kind !== undefined && !isSiteKind(given.kind) && siteKind) {
    // Published topologies use `type` for other things ("Green"); with a kind default that is no kind at all.
    const attr = ctx.names.recognised.site.kind ?? 'kind';
    ctx.warnings.push({ file: ctx.fileName, path, message: `${attr} "${given.kind}" is not a site kind (core, aggregation, edge or cell-site); taken as missing` });
    delete given.kind;
  }
  Object.assign(from, fromFile(given));
  const site: Partial<ScenarioSite> = { ...current, ...given, id: g.id };
  if (site.kind === undefined && siteKind) {
    site.kind = siteKind === 'by-degree' ? ctx.byDegree?.get(g.id) : siteKind;
    from.kind = siteKind === 'by-degree' ? 'derived' : 'default';
  }
  const cpu = site.kind === undefined ? undefined : cpuByKind?.[site.kind];
  if (site.cpu === undefined && cpu !== undefined) { site.cpu = cpu; from.cpu = 'default'; }
  filled.sites.push(site);
  const missing = ['lat', 'lon'].filter((k) => g.given[k as 'lat'] === undefined)
    .concat(['name', 'kind', 'cpu'].filter((k) => site[k as 'name'] === undefined));
  for (const k of missing) ctx.errors.push({ file: ctx.fileName, path, message: `missing ${k} (key ${NODE_KEY_HINT[k]})${current ? '' : ' for a new site'}` });
  if (missing.length > 0) return null;
  const parsed = siteSchema.safeParse(site);
  if (!parsed.success) schemaErrors(parsed.error.issues, path, ctx);
  return parsed.success ? parsed.data : null;
}

/** A missing length from the ends' coordinates × route factor; a reason when that cannot be done. */
function lengthFromEnds(span: { a: string; b: string }, routeFactor: number, ctx: Context): { km: number } | { reason: string } {
  const ends = [ctx.fileSites.get(span.a), ctx.fileSites.get(span.b)];
  const unplaced = ends.find((e) => e && (e.given.lat === undefined || e.given.lon === undefined));
  if (unplaced) return { reason: `node "${unplaced.given.name ?? unplaced.id}" has no coordinates` };
  const [a, b] = ends.map((e) => ({ lat: e!.given.lat!, lon: e!.given.lon! }));
  const km = derivedLengthKm(a, b, routeFactor);
  return km > 0 ? { km } : { reason: 'both ends have the same coordinates' };
}

/** Capacity and length come from the file or the upload's defaults; latency, when missing, is derived from length. */
function graphmlSpan(g: GraphmlSpan, current: ScenarioSpan | undefined, ctx: Context, from: Record<string, ValueSource>, filled: FilledItems) {
  const path = `edge[${g.id}]`;
  const { latencyMs: _derived, capacityGbps: _c, lengthKm: _l, ...kept } = current ?? ({} as Partial<ScenarioSpan>);
  const span: Partial<ScenarioSpan> & { a: string; b: string } = { ...kept, ...g.given, id: g.id };
  Object.assign(from, fromFile(g.given));
  const defaults = ctx.defaults;
  if (span.capacityGbps === undefined && defaults?.spanCapacityGbps !== undefined) { span.capacityGbps = defaults.spanCapacityGbps; from.capacityGbps = 'default'; }
  let lengthProblem = '';
  if (span.lengthKm === undefined && defaults && span.a !== span.b) {
    const length = lengthFromEnds(span, defaults.routeFactor, ctx);
    if ('km' in length) { span.lengthKm = length.km; from.lengthKm = 'derived'; } else lengthProblem = `; it cannot be derived: ${length.reason}`;
  }
  if (span.latencyMs === undefined && span.lengthKm !== undefined) from.latencyMs = 'derived';
  filled.spans.push(span);
  const missing = (['capacityGbps', 'lengthKm'] as const).filter((k) => span[k] === undefined);
  for (const k of missing) ctx.errors.push({ file: ctx.fileName, path, message: `missing ${k} (key ${EDGE_KEY_HINT[k]})${k === 'lengthKm' ? lengthProblem : ''}` });
  if (span.a === span.b) ctx.errors.push({ file: ctx.fileName, path, message: `edge joins node "${span.a}" to itself` });
  if (missing.length > 0 || span.a === span.b) return null;
  const parsed = spanSchema.safeParse(span);
  if (!parsed.success) schemaErrors(parsed.error.issues, path, ctx);
  return parsed.success ? parsed.data : null;
}

export function mergeGraphml(
  before: Scenario, content: { sites: GraphmlSite[]; spans: GraphmlSpan[]; names: GraphmlNames }, fileName: string, defaults?: ImportDefaults,
): GraphmlMerge {
  const { sites, spans, names } = content;
  const byDegree = defaults?.siteKind === 'by-degree' ? kindsByDegree(sites.map((s) => s.id), spans.map((s) => s.given)) : null;
  const ctx: Context = { fileName, defaults, names, errors: [], warnings: [], byDegree, fileSites: new Map(sites.map((s) => [s.id, s])) };
  const values: ValueSources = { sites: {}, spans: {} };
  const filled: FilledItems = { sites: [], spans: [] };
  const curSites = new Map(before.sites.map((s) => [s.id, s]));
  const curSpans = new Map(before.spans.map((s) => [s.id, s]));
  const newSites = sites.map((g) => graphmlSite(g, curSites.get(g.id), ctx, (values.sites[g.id] = {}), filled));
  const newSpans = spans.map((g) => graphmlSpan(g, curSpans.get(g.id), ctx, (values.spans[g.id] = {}), filled));
  const target = ctx.errors.length > 0 ? null : { ...before, sites: newSites as ScenarioSite[], spans: newSpans as ScenarioSpan[] };
  return { target, errors: ctx.errors, warnings: ctx.warnings, values, filled };
}
