// Every import kind with a valid file: preview lists the right adds/changes/removes, apply writes them in one go.
import request from 'supertest';
import { importCreatedSchema, importDetailSchema, importListSchema } from '../../../shared/imports';
import { loadNetworkScenario } from '../../../server/services/inventory/load-network-scenario';
import { apply, csv, inventoryFingerprint, setupScratchApp, upload, type ImportsContext } from './helpers/scratch-app';

let ctx: ImportsContext;
beforeAll(async () => { ctx = await setupScratchApp({ seedDemo: true }); }, 60_000);
afterAll(() => ctx.dropDatabase());

const currentPlacement = async (sliceId: string) =>
  (await ctx.pool.query('select revision, current, reason, sites, paths from placements where slice_id = $1 order by revision', [sliceId])).rows;

/** GET an export as the exact text served (supertest would otherwise parse JSON or drop unknown types). */
async function exported(path: string): Promise<{ text: string; fileName: string }> {
  const res = await request(ctx.app).get(path).set('Cookie', ctx.planner).buffer(true)
    .parse((stream, done) => {
      let text = '';
      stream.setEncoding('utf8');
      stream.on('data', (chunk: string) => { text += chunk; });
      stream.on('end', () => done(null, text));
    });
  expect(res.status).toBe(200);
  return { text: res.body as string, fileName: /filename="([^"]+)"/.exec(res.headers['content-disposition'])![1] };
}

test('export → import round trip of the demo previews zero changes (GET /api/export/scenario)', async () => {
  const file = await exported('/api/export/scenario');
  const res = await upload(ctx, { text: file.text, name: file.fileName });
  expect(res.status).toBe(201);
  const body = importCreatedSchema.parse(res.body);
  expect(body.kind).toBe('scenario');
  expect(body.preview.errors).toEqual([]);
  expect(body.preview.counts).toMatchObject({ adds: 0, changes: 0, removes: 0, errors: 0 });
});

test('export → import round trip of the GraphML export previews zero changes (GET /api/export/graphml)', async () => {
  const file = await exported('/api/export/graphml');
  const body = importCreatedSchema.parse((await upload(ctx, { text: file.text, name: file.fileName })).body);
  expect(body.kind).toBe('graphml');
  expect(body.preview.errors).toEqual([]);
  expect(body.preview.counts).toMatchObject({ adds: 0, changes: 0, removes: 0 });
});

test('sites CSV: adds a new site and changes an existing one; apply writes both and an audit row', async () => {
  const before = (await loadNetworkScenario(ctx.db)).sites[0];
  const text = csv([
    ['id', 'name', 'kind', 'lat', 'lon', 'cpu', 'mtbfHours', 'mttrHours'],
    ['site-new-1', 'Gullstrand', 'edge', 55.61, -25.4, 48, '', ''],
    [before.id, before.name, before.kind, before.lat, before.lon, before.cpu + 8, before.mtbfHours, before.mttrHours],
  ]);
  const body = importCreatedSchema.parse((await upload(ctx, { text, name: 'sites.csv' })).body);
  expect(body.kind).toBe('csv-sites');
  expect(body.preview.errors).toEqual([]);
  expect(body.preview.adds.sites).toEqual(['site-new-1']);
  expect(body.preview.changes.sites).toEqual([{ id: before.id, fields: [{ field: 'cpu', before: before.cpu, after: before.cpu + 8 }] }]);
  expect(body.preview.removes.sites).toEqual([]);
  const res = await apply(ctx, body.id);
  expect(res.status).toBe(200);
  expect(res.body).toMatchObject({ id: body.id, status: 'applied', counts: { adds: 1, changes: 1 } });
  const rows = (await ctx.pool.query('select id, cpu from sites where id = any($1) order by id', [[before.id, 'site-new-1']])).rows;
  expect(rows).toEqual(expect.arrayContaining([{ id: before.id, cpu: before.cpu + 8 }, { id: 'site-new-1', cpu: 48 }]));
  const audit = (await ctx.pool.query("select actor_id, after from audit_log where action = 'import.apply' and entity_id = $1", [body.id])).rows;
  expect(audit).toHaveLength(1);
  expect(audit[0].actor_id).toBe(ctx.users.planner.id);
  expect(audit[0].after).toMatchObject({ fileName: 'sites.csv', counts: { adds: 1, changes: 1 } });
});

test('spans CSV: adds a span between existing sites (latency left to the length)', async () => {
  const s = await loadNetworkScenario(ctx.db);
  const text = csv([
    ['id', 'a', 'b', 'capacityGbps', 'lengthKm', 'latencyMs', 'srlg'],
    ['sp-new-1', s.sites[0].id, 'site-new-1', 40, 12.5, '', 'duct-x;duct-y'],
  ]);
  const body = importCreatedSchema.parse((await upload(ctx, { text, name: 'spans.csv' })).body);
  expect(body.preview.errors).toEqual([]);
  expect(body.preview.adds.spans).toEqual(['sp-new-1']);
  expect((await apply(ctx, body.id)).status).toBe(200);
  const [row] = (await ctx.pool.query("select site_a, site_b, latency_ms, srlg from spans where id = 'sp-new-1'")).rows;
  expect(row).toEqual({ site_a: s.sites[0].id, site_b: 'site-new-1', latency_ms: null, srlg: ['duct-x', 'duct-y'] });
});

test('slices CSV: a new slice with functions, ties and placement; a moved function makes a new placement revision', async () => {
  const s = await loadNetworkScenario(ctx.db);
  const span = s.spans.find((x) => x.id === 'sp-new-1')!;
  const existing = s.slices[0];
  const placement = s.placements.find((p) => p.slice === existing.id)!;
  const header = ['record', 'slice', 'id', 'tenant', 'name', 'sst', 'priority', 'cpu', 'site', 'from', 'to', 'bandwidthGbps', 'maxLatencyMs', 'path'];
  const rows: (string | number | undefined)[][] = [
    header,
    ['slice', 'sl-new-1', '', s.tenants[0].id, 'Quay cameras', 1, 3],
    ['function', 'sl-new-1', 'sl-new-1-a', '', 'Camera gateway', '', '', 1, span.a],
    ['function', 'sl-new-1', 'sl-new-1-b', '', 'Video analytics', '', '', 2, span.b],
    ['tie', 'sl-new-1', 'sl-new-1-t', '', '', '', '', '', '', 'sl-new-1-a', 'sl-new-1-b', 0.1, 40, span.id],
  ];
  // The existing slice keeps its functions and ties but has them all on one site: empty paths.
  const onOneSite = Object.values(placement.sites)[0];
  for (const f of existing.functions) rows.push(['function', existing.id, f.id, '', f.name, '', '', f.cpu, onOneSite]);
  for (const t of existing.ties) rows.push(['tie', existing.id, t.id, '', '', '', '', '', '', t.from, t.to, t.bandwidthGbps, t.maxLatencyMs, '']);
  const body = importCreatedSchema.parse((await upload(ctx, { text: csv(rows), name: 'slices.csv' })).body);
  expect(body.preview.errors).toEqual([]);
  expect(body.preview.adds.slices).toEqual(['sl-new-1']);
  expect(body.preview.adds.placements).toEqual(['sl-new-1']);
  expect(body.preview.changes.placements.map((c) => c.id)).toEqual([existing.id]);
  expect((await apply(ctx, body.id)).status).toBe(200);
  expect(await currentPlacement('sl-new-1')).toEqual([expect.objectContaining({ revision: 1, current: true, reason: 'import' })]);
  const history = await currentPlacement(existing.id);
  expect(history.map((r) => [r.revision, r.current])).toEqual([[1, false], [2, true]]);
  expect(history[1]).toMatchObject({ reason: 'import', sites: Object.fromEntries(existing.functions.map((f) => [f.id, onOneSite])) });
});

test('scenario file: removing a slice and its now-unused span applies both; list and detail show the import', async () => {
  const s = await loadNetworkScenario(ctx.db);
  const target = { ...s, slices: s.slices.filter((x) => x.id !== 'sl-new-1'), placements: s.placements.filter((p) => p.slice !== 'sl-new-1') };
  target.spans = target.spans.filter((x) => x.id !== 'sp-new-1');
  const body = importCreatedSchema.parse((await upload(ctx, { text: JSON.stringify(target), name: 'smaller.json' })).body);
  expect(body.preview.errors).toEqual([]);
  expect(body.preview.removes).toMatchObject({ slices: ['sl-new-1'], placements: ['sl-new-1'], spans: ['sp-new-1'], sites: [] });
  expect((await apply(ctx, body.id)).status).toBe(200);
  expect((await ctx.pool.query("select count(*)::int as n from slices where id = 'sl-new-1'")).rows[0].n).toBe(0);
  expect((await ctx.pool.query("select count(*)::int as n from spans where id = 'sp-new-1'")).rows[0].n).toBe(0);
  const list = importListSchema.parse((await request(ctx.app).get('/api/imports').set('Cookie', ctx.admin)).body);
  expect(list.imports[0]).toMatchObject({ id: body.id, status: 'applied', fileName: 'smaller.json', appliedBy: ctx.users.planner.id });
  const detail = importDetailSchema.parse((await request(ctx.app).get(`/api/imports/${body.id}`).set('Cookie', ctx.admin)).body);
  expect(detail.preview.removes.slices).toEqual(['sl-new-1']);
  // After apply the stored state matches the file exactly: a second upload of it changes nothing.
  const again = importCreatedSchema.parse((await upload(ctx, { text: JSON.stringify(target), name: 'smaller.json' })).body);
  expect(again.preview.counts).toMatchObject({ adds: 0, changes: 0, removes: 0, errors: 0 });
});

test('a preview writes nothing to the inventory', async () => {
  const before = await inventoryFingerprint(ctx.pool);
  const text = csv([['id', 'name', 'kind', 'lat', 'lon', 'cpu'], ['site-only-previewed', 'Nowhere', 'core', 1, 1, 8]]);
  expect((await upload(ctx, { text, name: 'sites.csv' })).status).toBe(201);
  expect(await inventoryFingerprint(ctx.pool)).toEqual(before);
});

test('the CSV templates download and import cleanly as their kind', async () => {
  for (const kind of ['csv-sites', 'csv-spans', 'csv-slices']) {
    const res = await request(ctx.app).get(`/api/imports/templates/${kind}`).set('Cookie', ctx.planner);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/attachment/);
    const preview = importCreatedSchema.parse((await upload(ctx, { text: res.text, name: `template-${kind}.csv` })).body);
    expect(preview.kind).toBe(kind);
    // The template's rows refer to example ids, so only reference errors may appear, never column errors.
    expect(preview.preview.errors.filter((e) => e.row === 1)).toEqual([]);
  }
  expect((await request(ctx.app).get('/api/imports/templates/scenario').set('Cookie', ctx.planner)).status).toBe(400);
});
