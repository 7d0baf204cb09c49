// Writes an export to the response a piece at a time: the first bytes leave at once, the whole text is never held,
// and the event loop gets a turn between batches so other requests are answered while a large file goes out.
import type { Writable } from 'node:stream';
import type { z } from 'zod';
import {
  outlineSchema, placementSchema, scenarioSchema, siteSchema, sliceSchema, spanSchema, tenantSchema, type Scenario,
} from '../../../shared/scenario';
import { checkScenarioSemantics, formatIssue, zodIssuesToScenarioIssues } from '../../../shared/scenario-validate';
import { ExportInvalidError } from './errors';

/** Pieces gathered before one write: big enough to keep writes few, small enough to keep each turn short. */
const BATCH_CHARS = 64 * 1024;

const nextTurn = () => new Promise<void>((resolve) => { setImmediate(resolve); });

/**
 * Writes every piece to `out`, waiting for 'drain' when the client reads slower than we write (so a slow download
 * does not pile the file up in memory), and yielding to the event loop after each batch. Ends `out` when done.
 */
export async function streamPieces(out: Writable, pieces: Iterable<string>): Promise<void> {
  // One 'drain' and one 'close' listener for the whole export (the compression middleware hands 'drain' listeners to
  // its own stream and cannot take them back, so adding one per wait would pile them up). 'close' also wakes the
  // writer, so a client that went away never leaves the export waiting.
  let wake: (() => void) | null = null;
  const onReady = () => { wake?.(); wake = null; };
  out.on('drain', onReady);
  out.on('close', onReady);
  let batch = '';
  const flush = async () => {
    if (batch === '') return;
    const ok = out.write(batch);
    batch = '';
    if (!ok && !out.destroyed) await new Promise<void>((resolve) => { wake = resolve; });
    await nextTurn();
  };
  try {
    for (const piece of pieces) {
      if (out.destroyed) return;
      batch += piece;
      if (batch.length >= BATCH_CHARS) await flush();
    }
    await flush();
    if (!out.destroyed) out.end();
  } finally {
    out.off('drain', onReady);
    out.off('close', onReady);
  }
}

/** `value` as JSON.stringify(value, null, 2) prints it when nested `depth` levels deep. */
function nested(value: unknown, depth: number): string {
  return JSON.stringify(value, null, 2).replace(/\n/g, `\n${'  '.repeat(depth)}`);
}

type Section = 'sites' | 'spans' | 'tenants' | 'slices' | 'placements';
const SECTION_SCHEMAS: Record<Section, z.ZodType> = {
  sites: siteSchema, spans: spanSchema, tenants: tenantSchema, slices: sliceSchema, placements: placementSchema,
};
const SECTIONS = Object.keys(SECTION_SCHEMAS) as Section[];

/** One element checked against its own schema; the parsed value is what gets written (as validateScenario did). */
function checked(schema: z.ZodType, value: unknown, path: (string | number)[]): unknown {
  const parsed = schema.safeParse(value);
  if (parsed.success) return parsed.data;
  const issues = parsed.error.issues.map((issue) => ({ ...issue, path: [...path, ...issue.path] }));
  throw new ExportInvalidError(formatIssue(zodIssuesToScenarioIssues(issues)[0]));
}

/**
 * Validation without holding the document twice: before the first byte, the semantic checks (dangling references,
 * duplicate ids, placements that miss a function or name an unknown site or span) run on the loaded scenario, so a
 * broken inventory still answers 500 EXPORT_INVALID and no file. Each element's shape is then checked against its
 * section's schema just before it is written; the database's column types and constraints make a failure there
 * practically impossible, and if one happens the response is cut off (an incomplete download), never completed.
 */
export function assertExportable(scenario: Scenario): void {
  let first = firstSemanticError.get(scenario);
  if (first === undefined) {
    first = checkScenarioSemantics(scenario).errors[0] ?? null;
    firstSemanticError.set(scenario, first);
  }
  if (first !== null) throw new ExportInvalidError(formatIssue(first));
}

/**
 * The checks' verdict per scenario object: the cached inventory hands every export of one revision the same
 * (read-only) scenario, so the checks run once per revision, not once per download.
 */
const firstSemanticError = new WeakMap<Scenario, ReturnType<typeof checkScenarioSemantics>['errors'][number] | null>();

/**
 * Whether `JSON.stringify` prints `a` and `b` alike: the same keys in the same order (a key holding undefined is
 * left out, as JSON.stringify leaves it out) and alike values. Only plain objects and arrays are compared
 * member by member; anything else must be the very same value.
 */
function printsAlike(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return false;
  if (Array.isArray(a) || Array.isArray(b)) {
    if (!Array.isArray(a) || !Array.isArray(b) || a.length !== b.length) return false;
    for (let i = 0; i < a.length; i += 1) if (!printsAlike(a[i], b[i])) return false;
    return true;
  }
  const plain = (o: object) => Object.getPrototypeOf(o) === Object.prototype || Object.getPrototypeOf(o) === null;
  if (!plain(a) || !plain(b)) return false;
  const ra = a as Record<string, unknown>;
  const rb = b as Record<string, unknown>;
  const ka = Object.keys(ra).filter((k) => ra[k] !== undefined);
  const kb = Object.keys(rb).filter((k) => rb[k] !== undefined);
  if (ka.length !== kb.length) return false;
  for (let i = 0; i < ka.length; i += 1) if (ka[i] !== kb[i] || !printsAlike(ra[ka[i]], rb[ka[i]])) return false;
  return true;
}

/**
 * Scenarios whose every section element passed its schema and prints exactly as its parsed value does, found on
 * an export that ran to the end. The cached inventory hands every export of one revision the same frozen scenario,
 * so later exports of that revision print the elements as they are: parsing 20,000 slices again per download was
 * most of the export's time and most of the garbage it left (see docs/benchmarks.md).
 */
const elementsPrintAsParsed = new WeakSet<Scenario>();

/**
 * The scenario as `JSON.stringify(scenario, null, 2)` would print it, byte for byte, one element per piece.
 * Windows are not part of the inventory export.
 */
export function* scenarioJsonPieces(scenario: Scenario): Generator<string> {
  const head: string[] = [`  "format": ${JSON.stringify(checked(scenarioSchema.shape.format, scenario.format, ['format']))}`];
  if (scenario.name !== undefined) head.push(`  "name": ${JSON.stringify(checked(scenarioSchema.shape.name, scenario.name, ['name']))}`);
  if (scenario.outline !== undefined) {
    head.push(`  "outline": ${nested(checked(outlineSchema, scenario.outline, ['outline']), 1)}`);
  }
  yield `{\n${head.join(',\n')}`;
  const known = elementsPrintAsParsed.has(scenario);
  let alike = true;
  for (const section of SECTIONS) {
    const items: readonly unknown[] = scenario[section];
    if (items.length === 0) {
      yield `,\n  "${section}": []`;
      continue;
    }
    yield `,\n  "${section}": [\n`;
    for (let i = 0; i < items.length; i += 1) {
      let value = items[i];
      if (!known) {
        const parsed = checked(SECTION_SCHEMAS[section], value, [section, i]);
        if (alike && !printsAlike(parsed, value)) alike = false;
        value = parsed;
      }
      yield `${i === 0 ? '' : ',\n'}    ${nested(value, 2)}`;
    }
    yield '\n  ]';
  }
  yield '\n}';
  // Reached only when the whole file was asked for: an export cut off part way proves nothing about the rest.
  if (!known && alike) elementsPrintAsParsed.add(scenario);
}
