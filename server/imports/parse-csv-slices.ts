// The slices CSV: `slice` rows (attributes), and optionally `function` and `tie` rows that redefine the slice whole.
import { anchorSchema, functionSchema, sliceSchema, tieSchema, type Anchor, type ScenarioFunction, type ScenarioTie } from '../../shared/scenario';
import { readCsv, RowReader, type CsvColumns, type CsvRow } from './csv-read';
import type { CsvSlice, Issues, ParsedImport } from './types';

export const SLICE_COLUMNS: CsvColumns = {
  required: ['record', 'slice'],
  optional: [
    'id', 'tenant', 'name', 'sst', 'sd', 'priority', 'critical', 'cpu', 'site', 'anchor', 'moveCost', 'fixed',
    'from', 'to', 'bandwidthGbps', 'maxLatencyMs', 'minAvailability', 'path',
  ],
};

const sliceAttrsSchema = sliceSchema.omit({ functions: true, ties: true });
const columnOf = (path: PropertyKey[]) => (path[0] === 'tenant' || path[0] === 'id' ? String(path[0]) : String(path[0] ?? 'row'));

/** `core-1` (a site) or `55.1 -3.2 10` (latitude, longitude, radius in km). */
function readAnchor(r: RowReader): Anchor | undefined {
  const v = r.text('anchor');
  if (v === undefined) return undefined;
  const parts = v.split(/\s+/);
  if (parts.length === 3 && parts.every((p) => Number.isFinite(Number(p)))) {
    const [lat, lon, radiusKm] = parts.map(Number);
    const parsed = anchorSchema.safeParse({ lat, lon, radiusKm });
    if (!parsed.success) r.error(`column "anchor": "${v}" is not a valid point and radius`);
    return parsed.success ? parsed.data : undefined;
  }
  return { site: v };
}

type Acc = { slice: CsvSlice; functions: ScenarioFunction[]; ties: ScenarioTie[]; sites: Record<string, string>; paths: Record<string, string[]> };

function readSliceRow(r: RowReader, acc: Acc): void {
  if (acc.slice.attrs) return r.error(`slice "${acc.slice.sliceId}" has more than one slice row`);
  const value = {
    id: acc.slice.sliceId, tenant: r.text('tenant'), name: r.text('name'), sst: r.number('sst'), sd: r.text('sd'),
    priority: r.number('priority'), critical: r.boolean('critical'),
  };
  acc.slice.attrs = r.validate(sliceAttrsSchema, value, columnOf);
}

function readFunctionRow(r: RowReader, acc: Acc): void {
  const value = { id: r.text('id'), name: r.text('name'), cpu: r.number('cpu'), anchor: readAnchor(r), moveCost: r.number('moveCost'), fixed: r.boolean('fixed') };
  const site = r.text('site');
  if (!site) r.error('column "site": is required (the site the function is placed on)');
  const fn = r.validate(functionSchema, value, columnOf);
  if (fn && site) { acc.functions.push(fn); acc.sites[fn.id] = site; }
}

function readTieRow(r: RowReader, acc: Acc): void {
  const value = {
    id: r.text('id'), from: r.text('from'), to: r.text('to'), bandwidthGbps: r.number('bandwidthGbps'),
    maxLatencyMs: r.number('maxLatencyMs'), minAvailability: r.number('minAvailability'),
  };
  const tie = r.validate(tieSchema, value, columnOf);
  if (tie) { acc.ties.push(tie); acc.paths[tie.id] = (r.text('path') ?? '').split(/[\s>]+/).filter(Boolean); }
}

const READERS: Record<string, (r: RowReader, acc: Acc) => void> = { slice: readSliceRow, function: readFunctionRow, tie: readTieRow };

function finish(acc: Acc, fileName: string, issues: Issues): CsvSlice {
  const { slice } = acc;
  if (acc.functions.length > 0) {
    slice.body = { functions: acc.functions, ties: acc.ties, placement: { slice: slice.sliceId, sites: acc.sites, paths: acc.paths } };
  } else if (acc.ties.length > 0) {
    issues.errors.push({ file: fileName, row: slice.row, message: `slice "${slice.sliceId}" has tie rows but no function rows; give its functions too` });
  }
  return slice;
}

function groupRows(rows: CsvRow[], fileName: string, issues: Issues): Map<string, Acc> {
  const bySlice = new Map<string, Acc>();
  for (const row of rows) {
    const r = new RowReader(fileName, row);
    const sliceId = r.text('slice');
    const record = r.text('record')?.toLowerCase();
    const read = record ? READERS[record] : undefined;
    if (!sliceId) r.error('column "slice": is required');
    else if (!read) r.error(`column "record": "${record ?? ''}" must be slice, function or tie`);
    else {
      if (!bySlice.has(sliceId)) bySlice.set(sliceId, { slice: { sliceId, row: row.row, attrs: null, body: null }, functions: [], ties: [], sites: {}, paths: {} });
      read(r, bySlice.get(sliceId)!);
    }
    issues.errors.push(...r.errors);
  }
  return bySlice;
}

export function parseSlicesCsv(text: string, fileName: string): ParsedImport {
  const issues: Issues = { errors: [], warnings: [] };
  const rows = readCsv(text, fileName, SLICE_COLUMNS, issues);
  const slices = [...groupRows(rows, fileName, issues).values()].map((acc) => finish(acc, fileName, issues));
  return { ...issues, content: { kind: 'csv-slices', slices } };
}
