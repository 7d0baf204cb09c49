// The optional text fields of an upload: `defaults` and `mapping` (JSON), checked before the file is read.
import type { z } from 'zod';
import {
  MAPPABLE_SITE_FIELDS, MAPPABLE_SPAN_FIELDS, importDefaultsSchema, importMappingSchema, type ImportDefaults, type ImportMapping,
} from '../../shared/imports';
import { ImportFileError } from './errors';

/** The first problem, naming the key it is about (`defaults.cpuByKind.core: must be greater than 0`). */
function describe(field: string, issue: z.core.$ZodIssue): string {
  const at = [field, ...issue.path.map(String)].join('.');
  if (issue.code === 'unrecognized_keys') {
    const allowed = at === 'mapping.site' ? MAPPABLE_SITE_FIELDS : at === 'mapping.span' ? MAPPABLE_SPAN_FIELDS : null;
    return `${at}: unknown key ${issue.keys.map((k) => `"${k}"`).join(', ')}${allowed ? ` (fields: ${allowed.join(', ')})` : ''}`;
  }
  return `${at}: ${issue.message}`;
}

function parseJsonField<T>(raw: unknown, field: string, code: string, schema: z.ZodType<T>): T | undefined {
  if (raw === undefined || (typeof raw === 'string' && raw.trim() === '')) return undefined;
  if (typeof raw !== 'string') throw new ImportFileError(code, `Send "${field}" once, as JSON text.`);
  let json: unknown;
  try {
    json = JSON.parse(raw);
  } catch (err) {
    throw new ImportFileError(code, `"${field}" is not valid JSON: ${(err as Error).message}`);
  }
  const parsed = schema.safeParse(json);
  if (!parsed.success) throw new ImportFileError(code, describe(field, parsed.error.issues[0]));
  return parsed.data;
}

/** 400 BAD_DEFAULTS when `defaults` is not JSON or a value is out of range; absent → undefined (no defaults). */
export function parseDefaultsField(raw: unknown): ImportDefaults | undefined {
  return parseJsonField(raw, 'defaults', 'BAD_DEFAULTS', importDefaultsSchema);
}

/** 400 BAD_MAPPING when `mapping` is not JSON or names a field we do not have; attributes are checked with the file. */
export function parseMappingField(raw: unknown): ImportMapping | undefined {
  return parseJsonField(raw, 'mapping', 'BAD_MAPPING', importMappingSchema);
}
