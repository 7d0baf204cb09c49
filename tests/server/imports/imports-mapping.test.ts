// The mapping step: a GraphML file whose attribute names differ from ours (x/y, town, bw_gbps …) is read through
// the upload's mapping; mapped attributes win over our own names; other kinds ignore the mapping with a warning.
import { importCreatedSchema } from '../../../shared/imports';
import { graphmlText, type GraphmlEdge, type GraphmlNode } from './helpers/graphml-text';
import { csv, setupScratchApp, upload, type ImportsContext } from './helpers/scratch-app';

let ctx: ImportsContext;
beforeAll(async () => { ctx = await setupScratchApp({ seedDemo: false }); }, 60_000);
afterAll(() => ctx.dropDatabase());

// `label` holds a short code, `town` the name people use; coordinates as y (latitude) and x (longitude).
const nodes: GraphmlNode[] = [
  { id: 'a', data: { label: 'KLM', town: 'Kilmory Head', y: 55.42, x: -25.31, role: 'core', vcpus: 96 } },
  { id: 'b', data: { label: 'FRS', town: 'Farrowstead', y: 55.55, x: -25.02, role: 'edge', vcpus: 24 } },
  { id: 'c', data: { label: 'GLN', town: 'Glenmuir', y: 55.71, x: -25.18, role: 'aggregation', vcpus: 48 } },
];
const edges: GraphmlEdge[] = [
  { id: 'ab', source: 'a', target: 'b', data: { bw_gbps: 100, km_route: 31.5 } },
  { id: 'bc', source: 'b', target: 'c', data: { bw_gbps: 40, km_route: 27.25, delay_ms: 0.2 } },
];
const MAPPING = {
  site: { name: 'town', lat: 'y', lon: 'x', kind: 'role', cpu: 'vcpus' },
  span: { capacityGbps: 'bw_gbps', lengthKm: 'km_route', latencyMs: 'delay_ms' },
};

async function preview(extra: { mapping?: unknown; defaults?: unknown }, text = graphmlText(nodes, edges), name = 'inland.graphml') {
  const res = await upload(ctx, { text, name, ...extra });
  expect(res.status).toBe(201);
  return importCreatedSchema.parse(res.body).preview;
}

test('without a mapping the differently named attributes are not found', async () => {
  const p = await preview({});
  expect(p.errors.filter((e) => e.path === 'node[a]').map((e) => e.message)).toEqual([
    'missing lat (key lat or Latitude) for a new site', 'missing lon (key lon or Longitude) for a new site',
    'missing kind (key kind or type) for a new site', 'missing cpu (key cpu) for a new site',
  ]);
  expect(p.sources!.recognised.site).toEqual({ name: 'label' });
  expect([...p.sources!.attributes.site].sort()).toEqual(['label', 'role', 'town', 'vcpus', 'x', 'y']);
  expect([...p.sources!.attributes.span].sort()).toEqual(['bw_gbps', 'delay_ms', 'km_route']);
});

test('with the mapping every value is read from the named attribute, and the mapped name wins over "label"', async () => {
  const p = await preview({ mapping: MAPPING });
  expect(p.errors).toEqual([]);
  expect(p.sources!.recognised).toEqual({ site: MAPPING.site, span: MAPPING.span });
  const sites = p.sources!.items!.sites;
  for (const n of nodes) {
    expect(sites.find((s) => s.id === n.id)).toEqual({ id: n.id, name: n.data.town, kind: n.data.role, cpu: n.data.vcpus, lat: n.data.y, lon: n.data.x });
  }
  const spans = p.sources!.items!.spans;
  expect(spans.find((s) => s.id === 'ab')).toMatchObject({ capacityGbps: 100, lengthKm: 31.5, aName: 'Kilmory Head', bName: 'Farrowstead' });
  expect(spans.find((s) => s.id === 'bc')).toMatchObject({ capacityGbps: 40, lengthKm: 27.25, latencyMs: 0.2 });
  expect(p.sources!.values.spans.bc).toEqual({ capacityGbps: 'file', lengthKm: 'file', latencyMs: 'file' });
  expect(p.sources!.values.spans.ab.latencyMs).toBe('derived');
  expect(p.sources!.counts).toEqual({ file: 3 * 5 + 2 + 3, default: 0, derived: 1 });
});

test('mapped attribute names match case-insensitively, as our own names do', async () => {
  const p = await preview({ mapping: { site: { ...MAPPING.site, lat: 'Y', lon: 'X' }, span: MAPPING.span } });
  expect(p.errors).toEqual([]);
  expect(p.sources!.recognised.site.lat).toBe('y');
});

test('a mapped value that is not a number names the file attribute', async () => {
  const text = graphmlText(nodes.map((n) => (n.id === 'c' ? { ...n, data: { ...n.data, vcpus: 'many' } } : n)), edges);
  const p = await preview({ mapping: MAPPING }, text);
  expect(p.errors).toEqual([{ file: 'inland.graphml', path: 'node[c]', message: 'key "vcpus": "many" is not a number' }]);
});

test('a CSV upload ignores a mapping and defaults, and says so', async () => {
  const text = csv([['id', 'name', 'kind', 'lat', 'lon', 'cpu'], ['s1', 'Saltings', 'edge', 55.5, -25.5, 8]]);
  const p = await preview({ mapping: MAPPING, defaults: { spanCapacityGbps: 10 } }, text, 'sites.csv');
  expect(p.errors).toEqual([]);
  expect(p.warnings.map((w) => w.message)).toEqual([
    'defaults fill values of GraphML files only; they were ignored for this file',
    'the attribute mapping applies to GraphML files only; it was ignored for this file',
  ]);
  expect(p.sources).toBeUndefined();
});
