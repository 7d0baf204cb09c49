// Shared CSV reading: papaparse with a header, column checks, and a per-row reader that collects cell errors.
import Papa from 'papaparse';
import type { z } from 'zod';
import type { ImportIssue } from '../../shared/imports';
import type { Issues } from './types';

export type CsvColumns = { required: readonly string[]; optional: readonly string[] };
/** A data row with its line number (the header is row 1). */
export type CsvRow = { row: number; cells: Record<string, string> };

/** Parses and checks the header; returns rows only when the columns are right. */
export function readCsv(text: string, fileName: string, columns: CsvColumns, issues: Issues): CsvRow[] {
  const result = Papa.parse<Record<string, string>>(text, {
    header: true, delimiter: ',', skipEmptyLines: 'greedy', transformHeader: (h) => h.trim(),
  });
  const fields = result.meta.fields ?? [];
  const known = new Set([...columns.required, ...columns.optional]);
  const headerError = (message: string) => issues.errors.push({ file: fileName, row: 1, message });
  for (const col of columns.required) if (!fields.includes(col)) headerError(`missing column "${col}"`);
  for (const col of fields) if (!known.has(col)) headerError(`unknown column "${col}" (expected ${[...known].join(', ')})`);
  if (issues.errors.length > 0) return [];
  const badRows = new Set<number>();
  // Short rows are fine (trailing empty cells left out, as hand-written files do); long ones are not.
  for (const e of result.errors.filter((x) => x.code !== 'TooFewFields')) {
    if (e.row === undefined) { headerError(e.message); continue; }
    badRows.add(e.row);
    issues.errors.push({ file: fileName, row: e.row + 2, message: `${e.message} (${e.code})` });
  }
  if (result.data.length === 0) headerError('the file has a header but no data rows');
  return result.data.map((cells, i) => ({ row: i + 2, cells })).filter((r) => !badRows.has(r.row - 2));
}

/** Reads typed cells of one row; every problem is an error at the row, naming the column. */
export class RowReader {
  readonly errors: ImportIssue[] = [];
  constructor(private readonly fileName: string, private readonly r: CsvRow) {}

  error(message: string): void {
    this.errors.push({ file: this.fileName, row: this.r.row, message });
  }

  /** Trimmed cell text, or undefined when empty or absent. */
  text(col: string): string | undefined {
    const v = this.r.cells[col]?.trim();
    return v === undefined || v === '' ? undefined : v;
  }

  number(col: string): number | undefined {
    const v = this.text(col);
    if (v === undefined) return undefined;
    const n = Number(v);
    if (!Number.isFinite(n)) this.error(`column "${col}": "${v}" is not a number`);
    return Number.isFinite(n) ? n : undefined;
  }

  boolean(col: string): boolean | undefined {
    const v = this.text(col)?.toLowerCase();
    if (v === undefined) return undefined;
    if (['true', 'yes', '1'].includes(v)) return true;
    if (['false', 'no', '0'].includes(v)) return false;
    this.error(`column "${col}": "${v}" is not true or false`);
    return undefined;
  }

  /** Validates the assembled record; zod issues become errors naming their column. */
  validate<T>(schema: z.ZodType<T>, value: unknown, columnOf: (path: PropertyKey[]) => string): T | null {
    const parsed = schema.safeParse(value);
    if (parsed.success) return this.errors.length === 0 ? parsed.data : null;
    for (const issue of parsed.error.issues) {
      const missing = issue.code === 'invalid_type' && /received undefined/.test(issue.message);
      this.error(`column "${columnOf(issue.path)}": ${missing ? 'is required' : issue.message}`);
    }
    return null;
  }

  get row(): number {
    return this.r.row;
  }
}

/** Reports the second and later rows that repeat an id. */
export function checkDuplicateIds<T>(items: { id: string; row: number; value: T }[], fileName: string, what: string, issues: Issues): T[] {
  const first = new Map<string, number>();
  const out: T[] = [];
  for (const item of items) {
    const earlier = first.get(item.id);
    if (earlier !== undefined) {
      issues.errors.push({ file: fileName, row: item.row, message: `duplicate ${what} id "${item.id}" (first on row ${earlier})` });
      continue;
    }
    first.set(item.id, item.row);
    out.push(item.value);
  }
  return out;
}
