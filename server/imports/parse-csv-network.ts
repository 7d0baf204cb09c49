// The sites and spans CSV files: one row per site or span, added or changed by id (never removed).
import { siteSchema, spanSchema, type ScenarioSite, type ScenarioSpan } from '../../shared/scenario';
import { checkDuplicateIds, readCsv, RowReader, type CsvColumns } from './csv-read';
import type { Issues, ParsedImport } from './types';

export const SITE_COLUMNS: CsvColumns = {
  required: ['id', 'name', 'kind', 'lat', 'lon', 'cpu'],
  optional: ['mtbfHours', 'mttrHours'],
};
export const SPAN_COLUMNS: CsvColumns = {
  required: ['id', 'a', 'b', 'capacityGbps', 'lengthKm'],
  optional: ['latencyMs', 'mtbfHours', 'mttrHours', 'srlg'],
};

const firstKey = (path: PropertyKey[]) => String(path[0] ?? 'row');

/** SRLG tags in one cell, separated by spaces or semicolons. */
export function splitList(cell: string | undefined): string[] {
  return (cell ?? '').split(/[\s;]+/).filter(Boolean);
}

function siteFromRow(r: RowReader): ScenarioSite | null {
  const value = {
    id: r.text('id'), name: r.text('name'), kind: r.text('kind'), lat: r.number('lat'), lon: r.number('lon'),
    cpu: r.number('cpu'), mtbfHours: r.number('mtbfHours'), mttrHours: r.number('mttrHours'),
  };
  return r.validate(siteSchema, value, firstKey);
}

function spanFromRow(r: RowReader): ScenarioSpan | null {
  const srlg = splitList(r.text('srlg'));
  const value = {
    id: r.text('id'), a: r.text('a'), b: r.text('b'), capacityGbps: r.number('capacityGbps'), lengthKm: r.number('lengthKm'),
    latencyMs: r.number('latencyMs'), mtbfHours: r.number('mtbfHours'), mttrHours: r.number('mttrHours'),
    ...(srlg.length > 0 ? { srlg } : {}),
  };
  const span = r.validate(spanSchema, value, firstKey);
  if (span && span.a === span.b) { r.error(`span "${span.id}" joins site "${span.a}" to itself`); return null; }
  return span;
}

function parseRows<T extends { id: string }>(
  text: string, fileName: string, columns: CsvColumns, what: string, read: (r: RowReader) => T | null,
): Issues & { items: T[] } {
  const issues: Issues = { errors: [], warnings: [] };
  const rows = readCsv(text, fileName, columns, issues);
  const good: { id: string; row: number; value: T }[] = [];
  for (const row of rows) {
    const reader = new RowReader(fileName, row);
    const value = read(reader);
    issues.errors.push(...reader.errors);
    if (value) good.push({ id: value.id, row: row.row, value });
  }
  return { ...issues, items: checkDuplicateIds(good, fileName, what, issues) };
}

export function parseSitesCsv(text: string, fileName: string): ParsedImport {
  const { items, ...issues } = parseRows(text, fileName, SITE_COLUMNS, 'site', siteFromRow);
  return { ...issues, content: { kind: 'csv-sites', sites: items } };
}

export function parseSpansCsv(text: string, fileName: string): ParsedImport {
  const { items, ...issues } = parseRows(text, fileName, SPAN_COLUMNS, 'span', spanFromRow);
  return { ...issues, content: { kind: 'csv-spans', spans: items } };
}
