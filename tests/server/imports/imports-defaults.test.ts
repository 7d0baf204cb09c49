// GraphML with defaults: site kind by degree, vCPU per kind, span capacity, length from coordinates × route factor,
// and the preview's sources (file / default / derived) — on a published-style topology of invented places.
import turfDistance from '@turf/distance';
import request from 'supertest';
import { importCreatedSchema, importDetailSchema, type ImportCreated } from '../../../shared/imports';
import { FIBRE_MS_PER_KM, spanLatencyMs } from '../../../shared/scenario';
import { loadNetworkScenario } from '../../../server/services/inventory/load-network-scenario';
import { graphmlText, type GraphmlEdge, type GraphmlNode } from './helpers/graphml-text';
import { apply, importRowCount, setupScratchApp, upload, type ImportsContext } from './helpers/scratch-app';

let ctx: ImportsContext;
beforeAll(async () => { ctx = await setupScratchApp({ seedDemo: false }); }, 60_000);
afterAll(() => ctx.dropDatabase());

// Twelve invented towns. Degrees: 3 → 5 spans, 7 → 4, 0/5/9 → 3, 1 → 2, the rest 1. Node 11 says `type` core
// (a kind of ours), nodes 2 and 4 say "Green" (not a kind), node 0 gives its compute.
const towns: [string, string, number, number][] = [
  ['0', 'Brackenford', 55.61, -25.12], ['1', 'Hollin Quay', 55.48, -25.3], ['2', 'Marrow Fell', 55.52, -24.95],
  ['3', 'Stennet', 55.7, -25.01], ['4', 'Orrin Point', 55.41, -25.05], ['5', 'Calder Mouth', 55.77, -25.22],
  ['6', 'Wetherloe', 55.9, -25.4], ['7', 'Skarrow', 55.83, -25.1], ['8', 'Dunmere', 55.95, -24.9],
  ['9', 'Pellingham', 55.66, -25.45], ['10', 'Ashcombe Sands', 55.58, -25.7], ['11', 'Tarn Reach', 55.35, -25.5],
];
const ends: [string, string][] = [
  ['3', '0'], ['3', '1'], ['3', '2'], ['3', '4'], ['3', '7'], ['7', '5'], ['7', '6'], ['7', '8'], ['0', '5'], ['0', '9'], ['5', '9'], ['9', '10'], ['1', '11'],
];
const linkSpeedBps: Record<string, number> = { 'e3-0': 100e9, 'e3-7': 400e9 };
const fileLengthKm: Record<string, number> = { 'e9-10': 42 };

function nodes(options: { dropCoordinatesOf?: string } = {}): GraphmlNode[] {
  return towns.map(([id, label, lat, lon]) => {
    const data: GraphmlNode['data'] = { label, Country: 'Nowhere', Internal: 1 };
    if (id !== options.dropCoordinatesOf) Object.assign(data, { Latitude: lat, Longitude: lon });
    if (id === '11') data.type = 'core';
    if (id === '2' || id === '4') data.type = 'Green';
    if (id === '0') data.cpu = 48;
    return { id, data };
  });
}
function edges(): GraphmlEdge[] {
  return ends.map(([a, b]) => {
    const id = `e${a}-${b}`;
    const data: GraphmlEdge['data'] = { LinkLabel: 'fibre' };
    if (linkSpeedBps[id]) data.LinkSpeedRaw = linkSpeedBps[id];
    if (fileLengthKm[id]) data.length = fileLengthKm[id];
    return { id, source: a, target: b, data };
  });
}

const DEFAULTS = { siteKind: 'by-degree', cpuByKind: { core: 64, aggregation: 32, edge: 16 }, spanCapacityGbps: 10 };
const town = new Map(towns.map(([id, , lat, lon]) => [id, { lat, lon }]));
/** Reference length: @turf/distance (haversine, mean Earth radius 6371.0088 km; see REFERENCES.md) × route factor. */
const turfLengthKm = (a: string, b: string, factor: number) =>
  turfDistance([town.get(a)!.lon, town.get(a)!.lat], [town.get(b)!.lon, town.get(b)!.lat], { units: 'kilometers' }) * factor;

async function preview(text: string, extra: { defaults?: unknown; mapping?: unknown } = {}): Promise<ImportCreated> {
  const res = await upload(ctx, { text, name: 'coast.graphml', ...extra });
  expect(res.status).toBe(201);
  return importCreatedSchema.parse(res.body);
}

describe('a new topology with defaults', () => {
  let created: ImportCreated;
  beforeAll(async () => { created = await preview(graphmlText(nodes(), edges()), { defaults: DEFAULTS }); });

  test('has no errors; a "type" that is not a site kind is a warning on its node', () => {
    expect(created.preview.counts.errors).toBe(0);
    const notKinds = created.preview.warnings.filter((w) => /is not a site kind/.test(w.message));
    expect(notKinds.map((w) => w.path).sort()).toEqual(['node[2]', 'node[4]']);
    expect(notKinds[0].message).toBe('type "Green" is not a site kind (core, aggregation, edge or cell-site); taken as missing');
  });

  test('kinds by degree: the most connected tenth core, the next 30 % aggregation, the rest edge; a given kind stays', () => {
    const kinds = Object.fromEntries(created.preview.sources!.items!.sites.map((s) => [s.id, s.kind]));
    // 12 sites: ceil(1.2) = 2 core (3, 7), ceil(3.6) = 4 aggregation (0, 5, 9 with 3 spans, then 1 with 2).
    expect(kinds).toEqual({
      3: 'core', 7: 'core', 0: 'aggregation', 5: 'aggregation', 9: 'aggregation', 1: 'aggregation',
      2: 'edge', 4: 'edge', 6: 'edge', 8: 'edge', 10: 'edge', 11: 'core',
    });
    const values = created.preview.sources!.values.sites;
    expect(values['3'].kind).toBe('derived');
    expect(values['11'].kind).toBe('file');
    expect(values['2'].kind).toBe('derived');
  });

  test('compute by kind fills only what the file lacks', () => {
    const sites = new Map(created.preview.sources!.items!.sites.map((s) => [s.id, s]));
    expect(sites.get('0')!.cpu).toBe(48);
    expect(sites.get('3')!.cpu).toBe(64);
    expect(sites.get('1')!.cpu).toBe(32);
    expect(sites.get('10')!.cpu).toBe(16);
    expect(created.preview.sources!.values.sites['0'].cpu).toBe('file');
    expect(created.preview.sources!.values.sites['1'].cpu).toBe('default');
  });

  test('lengths are great-circle distance × 1.3 unless the file gives one; latency is length × 0.005 ms/km', () => {
    const spans = created.preview.sources!.items!.spans;
    for (const s of spans) {
      const expected = fileLengthKm[s.id] ?? turfLengthKm(s.a, s.b, 1.3);
      expect(s.lengthKm!).toBeCloseTo(expected, 2);
      expect(s.latencyMs!).toBeCloseTo(s.lengthKm! * 0.005, 6);
      expect(created.preview.sources!.values.spans[s.id].lengthKm).toBe(fileLengthKm[s.id] ? 'file' : 'derived');
      expect(created.preview.sources!.values.spans[s.id].latencyMs).toBe('derived');
    }
    expect(spans.find((s) => s.id === 'e3-0')).toMatchObject({ aName: 'Stennet', bName: 'Brackenford', capacityGbps: 100 });
    expect(spans.find((s) => s.id === 'e3-1')!.capacityGbps).toBe(10);
  });

  test('counts file, default and derived values per field and in all', () => {
    const { counts, fields } = created.preview.sources!;
    const field = (entity: string, name: string) => fields.find((f) => f.entity === entity && f.field === name);
    const n = { sites: towns.length, spans: ends.length };
    expect(field('sites', 'name')).toEqual({ entity: 'sites', field: 'name', file: n.sites, default: 0, derived: 0 });
    expect(field('sites', 'kind')).toEqual({ entity: 'sites', field: 'kind', file: 1, default: 0, derived: n.sites - 1 });
    expect(field('sites', 'cpu')).toEqual({ entity: 'sites', field: 'cpu', file: 1, default: n.sites - 1, derived: 0 });
    expect(field('spans', 'capacityGbps')).toEqual({ entity: 'spans', field: 'capacityGbps', file: 2, default: n.spans - 2, derived: 0 });
    expect(field('spans', 'lengthKm')).toEqual({ entity: 'spans', field: 'lengthKm', file: 1, default: 0, derived: n.spans - 1 });
    expect(field('spans', 'latencyMs')).toEqual({ entity: 'spans', field: 'latencyMs', file: 0, default: 0, derived: n.spans });
    expect(field('sites', 'mtbfHours')).toBeUndefined();
    // name, lat, lon from the file for every site, plus one kind and one cpu; capacity ×2 and one length on spans.
    expect(counts).toEqual({ file: 3 * n.sites + 2 + 2 + 1, default: (n.sites - 1) + (n.spans - 2), derived: (n.sites - 1) + (n.spans - 1) + n.spans });
  });

  test('names the attributes of the file and which one each field was read from', () => {
    const { attributes, recognised, defaults } = created.preview.sources!;
    expect([...attributes.site].sort()).toEqual(['Country', 'Internal', 'Latitude', 'Longitude', 'cpu', 'label', 'type']);
    expect([...attributes.span].sort()).toEqual(['LinkLabel', 'LinkSpeedRaw', 'length']);
    expect(recognised.site).toEqual({ name: 'label', lat: 'Latitude', lon: 'Longitude', kind: 'type', cpu: 'cpu' });
    expect(recognised.span).toEqual({ capacityGbps: 'LinkSpeedRaw', lengthKm: 'length' });
    expect(defaults).toEqual({ ...DEFAULTS, routeFactor: 1.3 });
  });

  test('is stored with the preview: the detail answers the same sources', async () => {
    const detail = importDetailSchema.parse((await request(ctx.app).get(`/api/imports/${created.id}`).set('Cookie', ctx.planner)).body);
    expect(detail.preview.sources).toEqual(created.preview.sources);
  });
});

test('a route factor scales every derived length', async () => {
  const { preview: p } = await preview(graphmlText(nodes(), edges()), { defaults: { ...DEFAULTS, routeFactor: 2 } });
  for (const s of p.sources!.items!.spans.filter((x) => !fileLengthKm[x.id])) expect(s.lengthKm!).toBeCloseTo(turfLengthKm(s.a, s.b, 2), 2);
});

test('a node without coordinates is an error naming it, and so is each length that needed them, unless the file gives it', async () => {
  const { preview: p } = await preview(graphmlText(nodes({ dropCoordinatesOf: '9' }), edges()), { defaults: DEFAULTS });
  expect(p.errors).toEqual(expect.arrayContaining([
    { file: 'coast.graphml', path: 'node[9]', message: 'missing lat (key lat or Latitude) for a new site' },
    { file: 'coast.graphml', path: 'edge[e0-9]', message: 'missing lengthKm (key lengthKm or length); it cannot be derived: node "Pellingham" has no coordinates' },
    { file: 'coast.graphml', path: 'edge[e5-9]', message: 'missing lengthKm (key lengthKm or length); it cannot be derived: node "Pellingham" has no coordinates' },
  ]));
  expect(p.errors.map((e) => e.path)).not.toContain('edge[e9-10]');
});

test('without defaults the errors are what they always were', async () => {
  const { preview: p } = await preview(graphmlText(nodes(), edges()));
  const at = (path: string) => p.errors.filter((e) => e.path === path).map((e) => e.message);
  expect(at('node[3]')).toEqual(['missing kind (key kind or type) for a new site', 'missing cpu (key cpu) for a new site']);
  expect(at('node[2]')).toEqual(['missing cpu (key cpu) for a new site']);
  expect(at('edge[e3-1]')).toEqual(['missing capacityGbps (key capacityGbps, capacity or LinkSpeedRaw)', 'missing lengthKm (key lengthKm or length)']);
  expect(at('edge[e3-0]')).toEqual(['missing lengthKm (key lengthKm or length)']);
  expect(p.warnings.filter((w) => /site kind/.test(w.message))).toEqual([]);
  expect(p.sources!.defaults).toBeUndefined();
  // With a kind default but no other: "Green" is taken as missing, not refused, and the cpu is still missing.
  const kindOnly = (await preview(graphmlText(nodes(), edges()), { defaults: { siteKind: 'edge' } })).preview;
  expect(kindOnly.errors.filter((e) => e.path === 'node[2]').map((e) => e.message)).toEqual(['missing cpu (key cpu) for a new site']);
});

test('a "type" that is not a kind is refused without a kind default', async () => {
  const withCpu = nodes().map((n) => (n.id === '2' ? { ...n, data: { ...n.data, cpu: 8 } } : n));
  const { preview: p } = await preview(graphmlText(withCpu, edges()), { defaults: { cpuByKind: { edge: 8 }, spanCapacityGbps: 10 } });
  expect(p.errors.filter((e) => e.path === 'node[2]').map((e) => e.message)).toEqual([expect.stringMatching(/^kind: /)]);
  expect(p.errors.filter((e) => e.path === 'node[3]').map((e) => e.message)).toEqual(['missing kind (key kind or type) for a new site', 'missing cpu (key cpu) for a new site']);
  expect(p.warnings.filter((w) => /is not a site kind/.test(w.message))).toEqual([]);
});

test('apply writes the filled values; latency stays derived from length', async () => {
  const { id, preview: p } = await preview(graphmlText(nodes(), edges()), { defaults: DEFAULTS });
  expect((await apply(ctx, id)).status).toBe(200);
  const sites = (await ctx.pool.query('select id, kind, cpu from sites order by id')).rows;
  expect(sites).toEqual(p.sources!.items!.sites.map((s) => ({ id: s.id, kind: s.kind, cpu: s.cpu })).sort((a, b) => (a.id < b.id ? -1 : 1)));
  const network = await loadNetworkScenario(ctx.db);
  for (const item of p.sources!.items!.spans) {
    const span = network.spans.find((s) => s.id === item.id)!;
    expect(span).toMatchObject({ capacityGbps: item.capacityGbps, lengthKm: item.lengthKm, a: item.a, b: item.b });
    expect(span.latencyMs).toBeUndefined();
    expect(spanLatencyMs(span)).toBeCloseTo(span.lengthKm * FIBRE_MS_PER_KM, 9);
  }
});

test('re-importing over the applied network: kinds kept from the inventory are not listed, only the new site counts', async () => {
  const current = await loadNetworkScenario(ctx.db);
  const more = nodes().map((n) => ({ ...n, data: Object.fromEntries(Object.entries(n.data).filter(([k]) => k !== 'type')) }));
  more.push({ id: '12', data: { label: 'Fallow Ness', Latitude: 55.3, Longitude: -25.6 } });
  const { preview: p } = await preview(graphmlText(more, [...edges(), { id: 'e11-12', source: '11', target: '12', data: {} }]), {
    defaults: { siteKind: 'edge', cpuByKind: { edge: 8 }, spanCapacityGbps: 10 },
  });
  expect(p.errors).toEqual([]);
  expect(p.adds.sites).toEqual(['12']);
  expect(p.adds.spans).toEqual(['e11-12']);
  expect(p.changes.sites).toEqual([]);
  expect(p.changes.spans).toEqual([]);
  expect(p.sources!.values.sites['3']).toEqual({ name: 'file', lat: 'file', lon: 'file' });
  expect(p.sources!.values.sites['12']).toEqual({ name: 'file', lat: 'file', lon: 'file', kind: 'default', cpu: 'default' });
  expect(p.sources!.items!.sites.find((s) => s.id === '3')!.kind).toBe(current.sites.find((s) => s.id === '3')!.kind);
  // Counted: the added site (5 values) and the added span (capacity default, length and latency derived).
  expect(p.sources!.counts).toEqual({ file: 3, default: 3, derived: 2 });
});

test('a backbone-sized file (186 sites, 250 spans, no compute, few capacities) previews clean and its sources stay small', async () => {
  // Invented points on a grid; a ring plus 64 chords gives 250 spans. Ids apart from the sites applied above, so
  // every kind is ranked here rather than kept from the inventory.
  const id = (i: number) => `b${i}`;
  const big: GraphmlNode[] = [...Array(186).keys()].map((i) => ({
    id: id(i), data: { label: `Site ${i}`, Latitude: 40 + (i % 14) * 0.7, Longitude: -10 + Math.floor(i / 14) * 0.9, type: 'Green' },
  }));
  const links: GraphmlEdge[] = [...Array(186).keys()].map((i) => ({ source: id(i), target: id((i + 1) % 186), data: {} }));
  for (let i = 0; i < 64; i++) links.push({ source: id(i), target: id((i * 7 + 40) % 186), data: { LinkSpeedRaw: 1e10 } });
  const res = await upload(ctx, { text: graphmlText(big, links), name: 'backbone.graphml', defaults: DEFAULTS });
  const { preview: p } = importCreatedSchema.parse(res.body);
  expect(p.counts.errors).toBe(0);
  expect(Object.keys(p.sources!.values.sites)).toHaveLength(186);
  expect(Object.keys(p.sources!.values.spans)).toHaveLength(250);
  // ceil(10 % of 186) = 19 core, ceil(30 % of 186) = 56 aggregation.
  expect(p.sources!.items!.sites.filter((x) => x.kind === 'core')).toHaveLength(19);
  expect(p.sources!.items!.sites.filter((x) => x.kind === 'aggregation')).toHaveLength(56);
  // WARNING: the preview is stored as jsonb and sent whole to a phone; 256 kB is the budget for sources.
  expect(JSON.stringify(p.sources).length).toBeLessThan(256 * 1024);
});

describe('refused options', () => {
  const text = () => graphmlText(nodes(), edges());
  test.each([
    ['not JSON', '{siteKind:', /"defaults" is not valid JSON/],
    ['route factor under 1', { routeFactor: 0.9 }, /^defaults\.routeFactor: must be within 1…3$/],
    ['route factor over 3', { routeFactor: 3.5 }, /^defaults\.routeFactor: /],
    ['cpu of zero', { cpuByKind: { core: 0 } }, /^defaults\.cpuByKind\.core: must be greater than 0$/],
    ['negative capacity', { spanCapacityGbps: -5 }, /^defaults\.spanCapacityGbps: /],
    ['unknown site kind', { siteKind: 'hub' }, /^defaults\.siteKind: /],
    ['unknown key', { colour: 'red' }, /^defaults: unknown key "colour"$/],
  ])('defaults: %s → 400 BAD_DEFAULTS naming the key, nothing stored', async (_what, defaults, message) => {
    const rows = await importRowCount(ctx.pool);
    const res = await upload(ctx, { text: text(), name: 'coast.graphml', defaults });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('BAD_DEFAULTS');
    expect(res.body.error.message).toMatch(message);
    expect(await importRowCount(ctx.pool)).toBe(rows);
  });

  test.each([
    ['not JSON', 'site=lat', /"mapping" is not valid JSON/],
    ['a field we do not have', { site: { latitude: 'Latitude' } }, /^mapping\.site: unknown key "latitude" \(fields: name, kind, lat/],
    ['an attribute the file lacks', { span: { capacityGbps: 'bandwidth' } }, /^mapping span\.capacityGbps: the file's edges have no attribute "bandwidth"\.$/],
  ])('mapping: %s → 400 BAD_MAPPING, nothing stored', async (_what, mapping, message) => {
    const rows = await importRowCount(ctx.pool);
    const res = await upload(ctx, { text: text(), name: 'coast.graphml', mapping });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('BAD_MAPPING');
    expect(res.body.error.message).toMatch(message);
    expect(await importRowCount(ctx.pool)).toBe(rows);
  });
});
