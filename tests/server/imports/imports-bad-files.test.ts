// Bad uploads: each gets its own code or located preview error, and the inventory stays byte-for-byte the same.
import type { Scenario } from '../../../shared/scenario';
import { importCreatedSchema } from '../../../shared/imports';
import { jsonPath } from '../../../shared/scenario-validate-context';
import { loadNetworkScenario } from '../../../server/services/inventory/load-network-scenario';
import {
  apply, csv, importRowCount, inventoryFingerprint, setupScratchApp, upload, type ImportsContext,
} from './helpers/scratch-app';

let ctx: ImportsContext;
let current: Scenario;
let fingerprint: Record<string, string>;
beforeAll(async () => {
  ctx = await setupScratchApp({ seedDemo: true });
  current = await loadNetworkScenario(ctx.db);
  fingerprint = await inventoryFingerprint(ctx.pool);
}, 60_000);
afterEach(async () => {
  expect(await inventoryFingerprint(ctx.pool)).toEqual(fingerprint);
});
afterAll(() => ctx.dropDatabase());

const copy = (): Scenario => JSON.parse(JSON.stringify(current));
const SITE_HEADER = ['id', 'name', 'kind', 'lat', 'lon', 'cpu'];

/** Uploads, expects a 400/413 with the code, and that not even an imports row was written. */
async function expectRefused(file: { text: string | Buffer; name: string; kind?: string }, status: number, code: string, message: RegExp) {
  const rowsBefore = await importRowCount(ctx.pool);
  const res = await upload(ctx, file);
  expect(res.status).toBe(status);
  expect(res.body.error.code).toBe(code);
  expect(res.body.error.message).toMatch(message);
  expect(await importRowCount(ctx.pool)).toBe(rowsBefore);
}

/** Uploads, expects a 201 preview with errors, and that apply is then refused. */
async function expectPreviewErrors(file: { text: string; name: string; kind?: string }) {
  const res = await upload(ctx, file);
  expect(res.status).toBe(201);
  const body = importCreatedSchema.parse(res.body);
  expect(body.preview.errors.length).toBeGreaterThan(0);
  const refused = await apply(ctx, body.id);
  expect(refused.status).toBe(422);
  expect(refused.body.error.code).toBe('IMPORT_HAS_ERRORS');
  return body.preview.errors;
}

test('binary junk is refused as BINARY_FILE', async () => {
  const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d, 0x49, 0x48, 0x44, 0x52]);
  await expectRefused({ text: png, name: 'sites.csv' }, 400, 'BINARY_FILE', /binary/);
});

test('non-UTF-8 text is refused as NOT_UTF8, empty files as EMPTY_FILE', async () => {
  const latin1 = Buffer.from('id,name,kind,lat,lon,cpu\ns9,N\xe4rvik,edge,1,1,4\n', 'latin1');
  await expectRefused({ text: latin1, name: 'sites.csv' }, 400, 'NOT_UTF8', /UTF-8/);
  await expectRefused({ text: '', name: 'sites.csv' }, 400, 'EMPTY_FILE', /empty/);
  await expectRefused({ text: '  \n\n ', name: 'sites.csv' }, 400, 'EMPTY_FILE', /white space/);
});

test('a file over the size cap gets 413 FILE_TOO_LARGE', async () => {
  const small = { ...ctx, app: ctx.makeApp({ config: { ...ctx.config, importMaxBytes: 2048 } }) };
  const rowsBefore = await importRowCount(ctx.pool);
  const res = await upload(small, { text: 'id,name\n' + 'x'.repeat(4096), name: 'sites.csv' });
  expect(res.status).toBe(413);
  expect(res.body.error).toEqual({ code: 'FILE_TOO_LARGE', message: 'The file is larger than the import limit of 2 kB.' });
  expect(await importRowCount(ctx.pool)).toBe(rowsBefore);
});

test('the default cap is 5 MB', async () => {
  await expectRefused({ text: Buffer.alloc(5 * 1024 * 1024 + 1, 0x41), name: 'big.csv' }, 413, 'FILE_TOO_LARGE', /5 MB/);
});

test('truncated JSON and truncated or malformed GraphML are refused', async () => {
  const json = JSON.stringify(current);
  await expectRefused({ text: json.slice(0, json.length / 2), name: 'demo.json' }, 400, 'BAD_JSON', /truncated/);
  await expectRefused({ text: '{"format": "slackwater-scenario/1", "sites": [}', name: 'demo.json' }, 400, 'BAD_JSON', /is not valid JSON/);
  const graphml = '<?xml version="1.0"?><graphml><graph edgedefault="undirected"><node id="a"/><node id="b"/></graph></graphml>';
  await expectRefused({ text: graphml.slice(0, 70), name: 'net.graphml' }, 400, 'BAD_XML', /not well-formed/);
  await expectRefused({ text: graphml.replace('</graph>', ''), name: 'net.graphml' }, 400, 'BAD_XML', /closes <graph>/);
});

test('wrong-type files: JSON that is not a scenario, XML that is not GraphML, kind and content disagreeing, unknown kinds', async () => {
  await expectRefused({ text: '[1, 2, 3]', name: 'list.json' }, 400, 'WRONG_FILE_TYPE', /slackwater-scenario\/1/);
  await expectRefused({ text: '<svg><g/></svg>', name: 'drawing.xml' }, 400, 'WRONG_FILE_TYPE', /not GraphML/);
  await expectRefused({ text: '{"format":"slackwater-scenario/1"}', name: 'x.csv', kind: 'csv-sites' }, 400, 'WRONG_FILE_TYPE', /must be CSV text/);
  await expectRefused({ text: 'a,b\n1,2\n', name: 'x.csv', kind: 'spreadsheet' }, 400, 'UNKNOWN_IMPORT_KIND', /Unknown import kind/);
  await expectRefused({ text: 'hello world', name: 'notes.pdf' }, 400, 'UNKNOWN_IMPORT_KIND', /Cannot tell/);
});

test('no file in the upload is NO_FILE', async () => {
  const { default: request } = await import('supertest');
  const res = await request(ctx.app).post('/api/imports').set('Cookie', ctx.planner).field('kind', 'csv-sites');
  expect(res.status).toBe(400);
  expect(res.body.error.code).toBe('NO_FILE');
});

test('wrong CSV columns are errors on row 1', async () => {
  const errors = await expectPreviewErrors({ text: csv([['id', 'name', 'latitude', 'lon', 'cpu', 'kind'], ['s', 'S', 1, 1, 1, 'edge']]), name: 'sites.csv', kind: 'csv-sites' });
  expect(errors).toEqual(expect.arrayContaining([
    { file: 'sites.csv', row: 1, message: 'missing column "lat"' },
    expect.objectContaining({ row: 1, message: expect.stringMatching(/^unknown column "latitude"/) }),
  ]));
});

test('bad cells and duplicate ids in a CSV are errors on their rows', async () => {
  const text = csv([SITE_HEADER, ['n1', 'One', 'edge', 55, -25, 'lots'], ['n2', 'Two', 'hub', 55, -25, 4], ['n3', 'Three', 'edge', 55, -25, 4], ['n3', 'Again', 'edge', 55, -25, 4]]);
  const errors = await expectPreviewErrors({ text, name: 'sites.csv' });
  expect(errors).toEqual(expect.arrayContaining([
    { file: 'sites.csv', row: 2, message: 'column "cpu": "lots" is not a number' },
    expect.objectContaining({ row: 3, message: expect.stringMatching(/^column "kind"/) }),
    { file: 'sites.csv', row: 5, message: 'duplicate site id "n3" (first on row 4)' },
  ]));
});

test('broken references: a CSV span to an unknown site, a scenario path through an unknown span', async () => {
  const spanErrors = await expectPreviewErrors({ text: csv([['id', 'a', 'b', 'capacityGbps', 'lengthKm'], ['spx', current.sites[0].id, 'nowhere', 10, 5]]), name: 'spans.csv' });
  expect(spanErrors.map((e) => e.message).join('\n')).toMatch(/nowhere/);
  const s = copy();
  const tie = Object.keys(s.placements[0].paths)[0];
  s.placements[0].paths[tie] = ['sp-missing'];
  const errors = await expectPreviewErrors({ text: JSON.stringify(s), name: 'demo.json' });
  expect(errors).toContainEqual({ file: 'demo.json', path: jsonPath(['placements', 0, 'paths', tie, 0]), message: 'unknown span "sp-missing"' });
});

test('a non-contiguous path is an error at its JSON path', async () => {
  const s = copy();
  const index = s.placements.findIndex((p) => Object.values(p.paths).some((path) => path.length >= 2));
  const [tie, path] = Object.entries(s.placements[index].paths).find(([, p]) => p.length >= 2)!;
  s.placements[index].paths[tie] = [...path].reverse();
  const errors = await expectPreviewErrors({ text: JSON.stringify(s), name: 'demo.json' });
  expect(errors.some((e) => e.path?.startsWith(jsonPath(['placements', index, 'paths', tie])) && /does not continue the path|ends at site/.test(e.message))).toBe(true);
});

test('duplicate ids in a scenario file are errors', async () => {
  const s = copy();
  s.sites.push({ ...s.sites[0] });
  const errors = await expectPreviewErrors({ text: JSON.stringify(s), name: 'demo.json' });
  expect(errors.some((e) => e.path === `$.sites[${s.sites.length - 1}].id` || /duplicate/i.test(e.message))).toBe(true);
});

test('malformed GraphML structure: duplicate node ids and edges to unknown nodes', async () => {
  const graphml = `<?xml version="1.0"?><graphml xmlns="http://graphml.graphdrawing.org/xmlns"><graph edgedefault="undirected">
  <node id="a"/><node id="a"/><node id="b"/><edge id="e1" source="a" target="zz"/></graph></graphml>`;
  const errors = await expectPreviewErrors({ text: graphml, name: 'net.graphml' });
  expect(errors).toEqual(expect.arrayContaining([
    { file: 'net.graphml', path: 'node[a]', message: 'duplicate node id "a"' },
    { file: 'net.graphml', path: 'edge[e1]', message: 'target "zz" is not a node of the file' },
  ]));
});

test('removing a site that placements use is refused with the slices that use it', async () => {
  const used = current.placements[0].sites[Object.keys(current.placements[0].sites)[0]];
  const users = current.placements.filter((p) => Object.values(p.sites).includes(used)).map((p) => p.slice).sort();
  const s = copy();
  s.sites = s.sites.filter((x) => x.id !== used);
  s.spans = s.spans.filter((x) => x.a !== used && x.b !== used);
  const errors = await expectPreviewErrors({ text: JSON.stringify(s), name: 'demo.json' });
  const inUse = errors.find((e) => e.path === `sites[${used}]`);
  expect(inUse?.message).toMatch(/current placements use it/);
  for (const slice of users) expect(inUse?.message).toContain(slice);
});

test('a GraphML topology without a span that placements use is refused with the slices using it', async () => {
  const { scenarioToGraphml } = await import('../../../server/services/inventory/graphml-export');
  const span = current.placements.flatMap((p) => Object.values(p.paths).flat())[0];
  const users = current.placements.filter((p) => Object.values(p.paths).some((path) => path.includes(span))).map((p) => p.slice);
  const errors = await expectPreviewErrors({ text: scenarioToGraphml({ ...current, spans: current.spans.filter((x) => x.id !== span) }), name: 'net.graphml' });
  const inUse = errors.find((e) => e.path === `spans[${span}]`);
  for (const slice of users) expect(inUse?.message).toContain(slice);
});
