// Names holding a NUL or a lone surrogate in an upload: the preview reports an error naming the field (the
// character written as a visible escape), or the upload is refused with a code; never a 500, inventory unchanged.
import { importCreatedSchema } from '../../../shared/imports';
import { csv, inventoryFingerprint, setupScratchApp, upload, type ImportsContext } from './helpers/scratch-app';

let ctx: ImportsContext;
let fingerprint: Record<string, string>;
beforeAll(async () => {
  ctx = await setupScratchApp({ seedDemo: false });
  fingerprint = await inventoryFingerprint(ctx.pool);
}, 60_000);
afterEach(async () => {
  expect(await inventoryFingerprint(ctx.pool)).toEqual(fingerprint);
});
afterAll(() => ctx.dropDatabase());

const SITE_HEADER = ['id', 'name', 'kind', 'lat', 'lon', 'cpu'];

async function previewErrors(file: { text: string; name: string }) {
  const res = await upload(ctx, file);
  expect(res.status).toBe(201);
  return importCreatedSchema.parse(res.body).preview.errors;
}

test('a CSV holding a raw NUL byte is refused as binary (400 BINARY_FILE), never a 500', async () => {
  const res = await upload(ctx, { name: 'sites.csv', text: csv([SITE_HEADER, ['s-2', 'Bad\u0000name', 'edge', 1, 2, 8]]) });
  expect(res.status).toBe(400);
  expect(res.body.error.code).toBe('BINARY_FILE');
});

test('a file name holding a NUL is refused by the multipart reader with 400 BAD_UPLOAD, never a 500', async () => {
  const res = await upload(ctx, { name: 'sites\u0000.csv', text: csv([SITE_HEADER]) });
  expect(res.status).toBe(400);
  expect(res.body.error.code).toBe('BAD_UPLOAD');
});

test('a scenario file with a lone surrogate in a site name and a NUL in a placement key gets errors naming them', async () => {
  const scenario = {
    format: 'slackwater-scenario/1',
    sites: [{ id: 'a', name: 'x\ud800y', kind: 'edge', lat: 1, lon: 1, cpu: 4 }],
    spans: [], tenants: [], slices: [],
    placements: [{ slice: 'z', sites: { 'f\u0000': 'a\u0000' }, paths: {} }],
  };
  const errors = await previewErrors({ name: 'net.json', text: JSON.stringify(scenario) });
  const paths = errors.map((e) => e.path);
  expect(paths).toEqual(expect.arrayContaining(['$.sites[0].name', '$.placements[0].sites']));
  // The value under the bad key is reported too; its path shows the key's NUL as a visible escape.
  expect(paths.some((p) => p?.includes('\\u0000'))).toBe(true);
  expect(errors.every((e) => !/[\0\ud800]/.test(JSON.stringify(e)))).toBe(true);
});
