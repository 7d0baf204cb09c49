// GraphML in published style (Latitude/Longitude, label, LinkSpeedRaw in bit/s, length in km) into an empty network.
import { importCreatedSchema } from '../../../shared/imports';
import { apply, csv, inventoryFingerprint, setupScratchApp, upload, type ImportsContext } from './helpers/scratch-app';

let ctx: ImportsContext;
beforeAll(async () => { ctx = await setupScratchApp({ seedDemo: false }); }, 60_000);
afterAll(() => ctx.dropDatabase());

// Hand-written in the style of published research topologies: keys declared with attr.name, edges without ids
// for two of them, a LinkSpeedRaw in bit/s. All places invented.
const nodes = [
  ['0', 'Brackenford', 55.61, -25.12], ['1', 'Hollin Quay', 55.48, -25.3], ['2', 'Marrow Fell', 55.52, -24.95],
  ['3', 'Stennet', 55.7, -25.01], ['4', 'Orrin Point', 55.41, -25.05],
] as const;
const edges = [
  ['e01', '0', '1', 'capacity', '100', 24.5], ['e02', '0', '2', 'LinkSpeedRaw', '40000000000', 17.2],
  ['e23', '2', '3', 'capacity', '10', 21], [null, '3', '0', 'capacity', '100', 11.8], [null, '1', '4', 'capacity', '25', 15.3],
] as const;

function publishedGraphml(options: { withSiteData: boolean }): string {
  const node = ([id, label, lat, lon]: (typeof nodes)[number]) => `    <node id="${id}">
      <data key="d0">${label}</data><data key="d1">${lat}</data><data key="d2">${lon}</data>${options.withSiteData ? '<data key="d3">edge</data><data key="d4">32</data>' : ''}
    </node>`;
  const edge = ([id, s, t, key, value, km]: (typeof edges)[number]) =>
    `    <edge ${id ? `id="${id}" ` : ''}source="${s}" target="${t}"><data key="${key === 'capacity' ? 'd5' : 'd6'}">${value}</data><data key="d7">${km}</data><data key="d8">fibre</data></edge>`;
  return `<?xml version="1.0" encoding="utf-8"?>
<graphml xmlns="http://graphml.graphdrawing.org/xmlns" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance" xsi:schemaLocation="http://graphml.graphdrawing.org/xmlns http://graphml.graphdrawing.org/xmlns/1.0/graphml.xsd">
  <key attr.name="label" attr.type="string" for="node" id="d0" />
  <key attr.name="Latitude" attr.type="double" for="node" id="d1" />
  <key attr.name="Longitude" attr.type="double" for="node" id="d2" />
  <key attr.name="type" attr.type="string" for="node" id="d3" />
  <key attr.name="cpu" attr.type="double" for="node" id="d4" />
  <key attr.name="capacity" attr.type="double" for="edge" id="d5" />
  <key attr.name="LinkSpeedRaw" attr.type="double" for="edge" id="d6" />
  <key attr.name="length" attr.type="double" for="edge" id="d7" />
  <key attr.name="LinkType" attr.type="string" for="edge" id="d8" />
  <graph edgedefault="undirected">
${nodes.map(node).join('\n')}
${edges.map(edge).join('\n')}
  </graph>
</graphml>
`;
}

test('missing site kind and compute are reported per node, not guessed, and nothing is written', async () => {
  const before = await inventoryFingerprint(ctx.pool);
  const res = await upload(ctx, { text: publishedGraphml({ withSiteData: false }), name: 'coast.graphml' });
  const { preview, id } = importCreatedSchema.parse(res.body);
  for (const [nodeId] of nodes) {
    expect(preview.errors).toContainEqual({ file: 'coast.graphml', path: `node[${nodeId}]`, message: 'missing kind (key kind or type) for a new site' });
    expect(preview.errors).toContainEqual({ file: 'coast.graphml', path: `node[${nodeId}]`, message: 'missing cpu (key cpu) for a new site' });
  }
  expect((await apply(ctx, id)).body.error.code).toBe('IMPORT_HAS_ERRORS');
  expect(await inventoryFingerprint(ctx.pool)).toEqual(before);
});

test('a missing length is an error; a missing latency is not (the format derives it from length)', async () => {
  const text = publishedGraphml({ withSiteData: true }).replace('<data key="d7">24.5</data>', '');
  const { preview } = importCreatedSchema.parse((await upload(ctx, { text, name: 'coast.graphml' })).body);
  expect(preview.errors).toEqual([{ file: 'coast.graphml', path: 'edge[e01]', message: 'missing lengthKm (key lengthKm or length)' }]);
});

test('the published-style topology gives the expected sites and spans', async () => {
  const { preview, id } = importCreatedSchema.parse((await upload(ctx, { text: publishedGraphml({ withSiteData: true }), name: 'coast.graphml' })).body);
  expect(preview.errors).toEqual([]);
  expect(preview.adds.sites.sort()).toEqual(['0', '1', '2', '3', '4']);
  expect(preview.adds.spans.sort()).toEqual(['1-4', '3-0', 'e01', 'e02', 'e23']);
  expect(preview.warnings.filter((w) => /has no id/.test(w.message)).map((w) => w.path).sort()).toEqual(['edge[1-4]', 'edge[3-0]']);
  expect((await apply(ctx, id)).status).toBe(200);
  const sites = (await ctx.pool.query('select id, name, kind, lat, lon, cpu from sites order by id')).rows;
  expect(sites).toEqual(nodes.map(([nid, name, lat, lon]) => ({ id: nid, name, kind: 'edge', lat, lon, cpu: 32 })));
  const spans = (await ctx.pool.query('select id, site_a as a, site_b as b, capacity_gbps as cap, length_km as km, latency_ms as lat from spans order by id')).rows;
  expect(spans).toEqual([
    { id: '1-4', a: '1', b: '4', cap: 25, km: 15.3, lat: null },
    { id: '3-0', a: '3', b: '0', cap: 100, km: 11.8, lat: null },
    { id: 'e01', a: '0', b: '1', cap: 100, km: 24.5, lat: null },
    { id: 'e02', a: '0', b: '2', cap: 40, km: 17.2, lat: null }, // 40 000 000 000 bit/s = 40 Gbit/s
    { id: 'e23', a: '2', b: '3', cap: 10, km: 21, lat: null },
  ]);
});

test('a later topology without kind/cpu keeps them from the known sites, and removes what it lacks', async () => {
  const text = publishedGraphml({ withSiteData: false }).replace(/<node id="4">[\s\S]*?<\/node>/, '').replace(/<edge source="1" target="4">.*<\/edge>/, '');
  const { preview, id } = importCreatedSchema.parse((await upload(ctx, { text, name: 'coast-v2.graphml' })).body);
  expect(preview.errors).toEqual([]);
  expect(preview.removes.sites).toEqual(['4']);
  expect(preview.removes.spans).toEqual(['1-4']);
  expect(preview.changes.sites).toEqual([]);
  expect((await apply(ctx, id)).status).toBe(200);
  expect((await ctx.pool.query('select count(*)::int as n from sites')).rows[0].n).toBe(4);
  // A sites CSV adds rows back but never removes any.
  const csvPreview = importCreatedSchema.parse((await upload(ctx, { text: csv([['id', 'name', 'kind', 'lat', 'lon', 'cpu'], ['9', 'Nine', 'core', 55, -25, 4]]), name: 's.csv' })).body);
  expect(csvPreview.preview.removes.sites).toEqual([]);
});
