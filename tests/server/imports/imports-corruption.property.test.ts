// Property: a corrupted CSV or scenario file never writes anything unless its preview is clean, and an
// errored preview can never be applied.
import fc from 'fast-check';
import { importCreatedSchema } from '../../../shared/imports';
import { loadNetworkScenario } from '../../../server/services/inventory/load-network-scenario';
import { apply, csv, importRowCount, inventoryFingerprint, setupScratchApp, upload, type ImportsContext } from './helpers/scratch-app';

let ctx: ImportsContext;
let sitesCsv: string;
let scenarioJson: string;
let fingerprint: Record<string, string>;
beforeAll(async () => {
  ctx = await setupScratchApp({ seedDemo: true });
  const current = await loadNetworkScenario(ctx.db);
  const header = ['id', 'name', 'kind', 'lat', 'lon', 'cpu', 'mtbfHours', 'mttrHours'];
  sitesCsv = csv([header, ...current.sites.slice(0, 6).map((s) => header.map((h) => s[h as keyof typeof s] as string | number)),
    ['prop-new', 'Lantern Rock', 'cell-site', 55.3, -25.2, 8, '', '']]);
  // One value per line, so line-level corruptions hit single fields and brackets.
  scenarioJson = JSON.stringify(current, null, 1);
  fingerprint = await inventoryFingerprint(ctx.pool);
}, 60_000);
afterAll(() => ctx.dropDatabase());

type Corruption =
  | { op: 'flip'; at: number; byte: number }
  | { op: 'truncate'; at: number }
  | { op: 'deleteLine'; at: number }
  | { op: 'duplicateLine'; at: number }
  | { op: 'garbage'; at: number; junk: string };

const corruption: fc.Arbitrary<Corruption> = fc.oneof(
  fc.record({ op: fc.constant('flip' as const), at: fc.nat(), byte: fc.integer({ min: 0, max: 255 }) }),
  fc.record({ op: fc.constant('truncate' as const), at: fc.nat() }),
  fc.record({ op: fc.constant('deleteLine' as const), at: fc.nat() }),
  fc.record({ op: fc.constant('duplicateLine' as const), at: fc.nat() }),
  fc.record({ op: fc.constant('garbage' as const), at: fc.nat(), junk: fc.string({ unit: 'binary', maxLength: 12 }) }),
);

/** Applies the corruption to the file's bytes (flip, truncate) or lines (delete, duplicate, replace a cell). */
function corrupt(text: string, c: Corruption): Buffer {
  const bytes = Buffer.from(text, 'utf8');
  if (c.op === 'flip') { const out = Buffer.from(bytes); out[c.at % out.length] ^= c.byte || 1; return out; }
  if (c.op === 'truncate') return bytes.subarray(0, c.at % bytes.length);
  const lines = text.split('\n');
  const i = c.at % lines.length;
  if (c.op === 'deleteLine') lines.splice(i, 1);
  if (c.op === 'duplicateLine') lines.splice(i, 0, lines[i]);
  if (c.op === 'garbage') {
    const cells = lines[i].split(/([,:])/);
    cells[(c.at >> 3) % cells.length] = c.junk;
    lines[i] = cells.join('');
  }
  return Buffer.from(lines.join('\n'), 'utf8');
}

async function checkOne(file: { text: Buffer; name: string }): Promise<void> {
  const rowsBefore = await importRowCount(ctx.pool);
  const res = await upload(ctx, file);
  expect([201, 400, 413]).toContain(res.status);
  if (res.status !== 201) {
    expect(typeof res.body.error.code).toBe('string');
    expect(await importRowCount(ctx.pool)).toBe(rowsBefore);
  } else {
    const body = importCreatedSchema.parse(res.body);
    if (body.preview.errors.length > 0) {
      const refused = await apply(ctx, body.id);
      expect(refused.status).toBe(422);
      expect(refused.body.error.code).toBe('IMPORT_HAS_ERRORS');
    }
  }
  expect(await inventoryFingerprint(ctx.pool)).toEqual(fingerprint);
}

test('corrupted sites CSV files answer 4xx or a preview, write nothing, and errored previews cannot be applied', async () => {
  await fc.assert(fc.asyncProperty(corruption, (c) => checkOne({ text: corrupt(sitesCsv, c), name: 'sites.csv' })), { numRuns: 40, seed: 4242 });
}, 120_000);

test('corrupted scenario files answer 4xx or a preview, write nothing, and errored previews cannot be applied', async () => {
  await fc.assert(fc.asyncProperty(corruption, (c) => checkOne({ text: corrupt(scenarioJson, c), name: 'scenario.json' })), { numRuns: 25, seed: 4243 });
}, 180_000);

test('the uncorrupted files preview without errors (so the corruptions above are what fails)', async () => {
  for (const [text, name] of [[sitesCsv, 'sites.csv'], [scenarioJson, 'scenario.json']]) {
    const body = importCreatedSchema.parse((await upload(ctx, { text, name })).body);
    expect(body.preview.errors).toEqual([]);
  }
});
