// Compiles the scenario's sites and spans into a NetworkModel: graphology undirected multigraph plus CSR arrays.
import Graph from 'graphology';
import type { ScenarioSite, ScenarioSpan } from '../../shared/scenario';
import { InvalidScenarioError, UnknownElementError } from '../errors';
import type { NetworkModel, SiteInfo, SpanInfo } from './types';
import { availability } from './availability';

/** Same rule as the format's spanLatencyMs: given latency, else 5 µs/km (ITU-T G.114 Table A.1). */
const FIBRE_MS_PER_KM = 0.005;

function elementAvailability(e: { mtbfHours?: number; mttrHours?: number }): number {
  return e.mtbfHours === undefined || e.mttrHours === undefined ? 1 : availability(e.mtbfHours, e.mttrHours);
}

function indexIds(items: readonly { id: string }[], what: string): Map<string, number> {
  const index = new Map<string, number>();
  items.forEach((item, i) => {
    if (index.has(item.id)) throw new InvalidScenarioError(`duplicate ${what} id "${item.id}"`);
    index.set(item.id, i);
  });
  return index;
}

function toSiteInfo(s: ScenarioSite, index: number): SiteInfo {
  const info: SiteInfo = {
    index, id: s.id, name: s.name, kind: s.kind, lat: s.lat, lon: s.lon, cpu: s.cpu,
    availability: elementAvailability(s),
  };
  if (s.mtbfHours !== undefined) info.mtbfHours = s.mtbfHours;
  return info;
}

function toSpanInfo(s: ScenarioSpan, index: number, siteIndex: Map<string, number>): SpanInfo {
  const a = siteIndex.get(s.a);
  const b = siteIndex.get(s.b);
  if (a === undefined) throw new UnknownElementError(`span "${s.id}" names unknown site "${s.a}"`);
  if (b === undefined) throw new UnknownElementError(`span "${s.id}" names unknown site "${s.b}"`);
  const info: SpanInfo = {
    index, id: s.id, a, b, capacityGbps: s.capacityGbps,
    latencyMs: s.latencyMs ?? s.lengthKm * FIBRE_MS_PER_KM,
    availability: elementAvailability(s), srlg: [...(s.srlg ?? [])],
  };
  if (s.mtbfHours !== undefined) info.mtbfHours = s.mtbfHours;
  return info;
}

/** CSR adjacency; each site's entries sorted by span index so every traversal is deterministic. */
function buildAdjacency(siteCount: number, spans: readonly SpanInfo[]) {
  const degree = new Int32Array(siteCount + 1);
  for (const s of spans) {
    degree[s.a]++;
    if (s.b !== s.a) degree[s.b]++;
  }
  const adjStart = new Int32Array(siteCount + 1);
  for (let i = 0; i < siteCount; i++) adjStart[i + 1] = adjStart[i] + degree[i];
  const fill = adjStart.slice(0, siteCount);
  const adjSite = new Int32Array(adjStart[siteCount]);
  const adjSpan = new Int32Array(adjStart[siteCount]);
  // Spans are visited in index order, so each site's slice of the arrays is already sorted.
  for (const s of spans) {
    adjSite[fill[s.a]] = s.b;
    adjSpan[fill[s.a]++] = s.index;
    if (s.b === s.a) continue;
    adjSite[fill[s.b]] = s.a;
    adjSpan[fill[s.b]++] = s.index;
  }
  return { adjStart, adjSite, adjSpan };
}

export function buildNetwork(scenarioSites: readonly ScenarioSite[], scenarioSpans: readonly ScenarioSpan[]): NetworkModel {
  const siteIndex = indexIds(scenarioSites, 'site');
  const spanIndex = indexIds(scenarioSpans, 'span');
  const sites = scenarioSites.map(toSiteInfo);
  const spans = scenarioSpans.map((s, i) => toSpanInfo(s, i, siteIndex));
  const graph = new Graph({ type: 'undirected', multi: true });
  for (const site of sites) graph.addNode(site.id, { ...site });
  for (const span of spans) graph.addEdgeWithKey(span.id, sites[span.a].id, sites[span.b].id, { ...span, srlg: [...span.srlg] });
  return { graph, sites, spans, siteIndex, spanIndex, ...buildAdjacency(sites.length, spans) };
}
