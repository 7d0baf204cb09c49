// Reads an uploaded import file: bytes → text → kind → parsed content. Runs in a check thread (check-thread.ts),
// because it is the part of an import that only the file decides the cost of.
import type { ImportKind, ImportMapping } from '../../shared/imports';
import { decodeUpload } from './decode-upload';
import { detectKind } from './detect-kind';
import { parseSitesCsv, parseSpansCsv } from './parse-csv-network';
import { parseSlicesCsv } from './parse-csv-slices';
import { parseGraphmlFile } from './parse-graphml';
import { parseScenarioFile } from './parse-scenario-file';
import type { ParsedImport } from './types';

/** `mapping` (our field → the file's attribute name) is read by the GraphML parser only. */
export type UploadReadInput = { fileName: string; bytes: Uint8Array; requestedKind?: string; mapping?: ImportMapping };
export type UploadRead = { kind: ImportKind; parsed: ParsedImport };

const PARSERS: Record<ImportKind, (text: string, fileName: string, options: { mapping?: ImportMapping }) => ParsedImport> = {
  scenario: parseScenarioFile,
  graphml: parseGraphmlFile,
  'csv-sites': parseSitesCsv,
  'csv-spans': parseSpansCsv,
  'csv-slices': parseSlicesCsv,
};

export function readUpload(input: UploadReadInput): UploadRead {
  const text = decodeUpload(Buffer.from(input.bytes.buffer, input.bytes.byteOffset, input.bytes.byteLength));
  const kind = detectKind(input.fileName, text, input.requestedKind);
  return { kind, parsed: PARSERS[kind](text, input.fileName, { mapping: input.mapping }) };
}
