// Sites and spans as GraphML (keys documented in docs/graphml.md; the import reads the same keys back).
// graphology-graphml 0.5.2 ships a parser only, so the document is written here and parsed back by tests.
import type { Queryable } from '../../../db/client';
import type { Scenario } from '../../../shared/scenario';
import { selectGraphmlTables } from '../../queries/inventory/graphml-tables';
import { toScenarioSites, toScenarioSpans } from './load-network-scenario';

type KeySpec = { id: string; for: 'graph' | 'node' | 'edge'; name: string; type: 'string' | 'double' };

export const GRAPHML_KEYS: readonly KeySpec[] = [
  { id: 'g_name', for: 'graph', name: 'name', type: 'string' },
  { id: 'n_name', for: 'node', name: 'name', type: 'string' },
  { id: 'n_kind', for: 'node', name: 'kind', type: 'string' },
  { id: 'n_lat', for: 'node', name: 'lat', type: 'double' },
  { id: 'n_lon', for: 'node', name: 'lon', type: 'double' },
  { id: 'n_cpu', for: 'node', name: 'cpu', type: 'double' },
  { id: 'n_mtbfHours', for: 'node', name: 'mtbfHours', type: 'double' },
  { id: 'n_mttrHours', for: 'node', name: 'mttrHours', type: 'double' },
  { id: 'e_capacityGbps', for: 'edge', name: 'capacityGbps', type: 'double' },
  { id: 'e_lengthKm', for: 'edge', name: 'lengthKm', type: 'double' },
  { id: 'e_latencyMs', for: 'edge', name: 'latencyMs', type: 'double' },
  { id: 'e_mtbfHours', for: 'edge', name: 'mtbfHours', type: 'double' },
  { id: 'e_mttrHours', for: 'edge', name: 'mttrHours', type: 'double' },
  { id: 'e_srlg', for: 'edge', name: 'srlg', type: 'string' },
];

const XML_ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' };

export function escapeXml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => XML_ESCAPES[c]);
}

type Value = string | number | undefined;

/** One <data> per present value; an absent value has no element (not an empty one), so "missing" stays missing. */
function dataLines(prefix: 'n' | 'e', values: Record<string, Value>, indent: string): string[] {
  return Object.entries(values)
    .filter((entry): entry is [string, string | number] => entry[1] !== undefined)
    .map(([name, value]) => `${indent}<data key="${prefix}_${name}">${escapeXml(String(value))}</data>`);
}

/**
 * GraphML 1.0 document of the scenario's sites (nodes) and spans (undirected edges, id = span id), a few lines at a
 * time: the header, then one piece per site or span, so a caller can stream it without building the whole text.
 */
export function* graphmlPieces(scenario: Pick<Scenario, 'name' | 'sites' | 'spans'>): Generator<string> {
  const header = [
    '<?xml version="1.0" encoding="UTF-8"?>',
    '<graphml xmlns="http://graphml.graphdrawing.org/xmlns" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance"',
    '  xsi:schemaLocation="http://graphml.graphdrawing.org/xmlns http://graphml.graphdrawing.org/xmlns/1.0/graphml.xsd">',
    ...GRAPHML_KEYS.map((k) => `  <key id="${k.id}" for="${k.for}" attr.name="${k.name}" attr.type="${k.type}"/>`),
    '  <graph id="network" edgedefault="undirected">',
  ];
  if (scenario.name) header.push(`    <data key="g_name">${escapeXml(scenario.name)}</data>`);
  yield `${header.join('\n')}\n`;
  for (const s of scenario.sites) {
    yield `${[
      `    <node id="${escapeXml(s.id)}">`,
      ...dataLines('n', {
        name: s.name, kind: s.kind, lat: s.lat, lon: s.lon, cpu: s.cpu, mtbfHours: s.mtbfHours, mttrHours: s.mttrHours,
      }, '      '),
      '    </node>',
    ].join('\n')}\n`;
  }
  for (const s of scenario.spans) {
    yield `${[
      `    <edge id="${escapeXml(s.id)}" source="${escapeXml(s.a)}" target="${escapeXml(s.b)}">`,
      ...dataLines('e', {
        capacityGbps: s.capacityGbps, lengthKm: s.lengthKm, latencyMs: s.latencyMs,
        mtbfHours: s.mtbfHours, mttrHours: s.mttrHours, srlg: s.srlg?.length ? s.srlg.join(',') : undefined,
      }, '      '),
      '    </edge>',
    ].join('\n')}\n`;
  }
  yield '  </graph>\n</graphml>\n';
}

/** The whole GraphML document as one string (small networks and tests; the route streams graphmlPieces). */
export function scenarioToGraphml(scenario: Pick<Scenario, 'name' | 'sites' | 'spans'>): string {
  return [...graphmlPieces(scenario)].join('');
}

/** Sites, spans and the network's name straight from their tables: the GraphML export never reads slices. */
export async function loadGraphmlNetwork(db: Queryable): Promise<Pick<Scenario, 'name' | 'sites' | 'spans'>> {
  const t = await selectGraphmlTables(db);
  return {
    ...(t.name ? { name: t.name } : {}),
    sites: toScenarioSites(t.siteRows),
    spans: toScenarioSpans(t.spanRows),
  };
}
