// Decides what kind of import a file is: the `kind` field if given, else its extension, else its content.
import { IMPORT_KIND_NAMES, type ImportKind } from '../../shared/imports';
import { ImportFileError } from './errors';

type Shape = 'json' | 'xml' | 'text';

/** What the content looks like, from its first non-blank character. */
export function contentShape(text: string): Shape {
  const first = text.trimStart()[0];
  if (first === '{' || first === '[') return 'json';
  if (first === '<') return 'xml';
  return 'text';
}

const SHAPE_OF: Record<ImportKind, Shape> = {
  scenario: 'json', graphml: 'xml', 'csv-sites': 'text', 'csv-spans': 'text', 'csv-slices': 'text',
};
const SHAPE_NAME: Record<Shape, string> = { json: 'JSON', xml: 'XML', text: 'CSV text' };

/** Which CSV kind a header line describes (a column only that kind has). */
function csvKindFromHeader(text: string): ImportKind | null {
  const header = text.split(/\r?\n/, 1)[0].split(',').map((c) => c.trim().replace(/^"|"$/g, '').toLowerCase());
  if (header.includes('record')) return 'csv-slices';
  if (header.includes('a') && header.includes('b')) return 'csv-spans';
  if (header.includes('lat') || header.includes('kind')) return 'csv-sites';
  return null;
}

function kindFromName(fileName: string, text: string): ImportKind | null {
  const ext = fileName.toLowerCase().match(/\.([a-z0-9]+)$/)?.[1] ?? '';
  if (ext === 'json') return 'scenario';
  if (ext === 'graphml' || ext === 'xml') return 'graphml';
  if (ext === 'csv' || ext === 'txt') return csvKindFromHeader(text);
  return null;
}

function kindFromContent(text: string): ImportKind | null {
  const shape = contentShape(text);
  if (shape === 'json') return 'scenario';
  if (shape === 'xml') return 'graphml';
  return csvKindFromHeader(text);
}

export function detectKind(fileName: string, text: string, requested: string | undefined): ImportKind {
  let kind: ImportKind | null;
  if (requested !== undefined && requested !== '') {
    if (!(IMPORT_KIND_NAMES as readonly string[]).includes(requested)) {
      throw new ImportFileError('UNKNOWN_IMPORT_KIND', `Unknown import kind "${requested}"; use one of ${IMPORT_KIND_NAMES.join(', ')}.`);
    }
    kind = requested as ImportKind;
  } else {
    kind = kindFromName(fileName, text) ?? kindFromContent(text);
  }
  if (!kind) {
    throw new ImportFileError('UNKNOWN_IMPORT_KIND',
      `Cannot tell what kind of import "${fileName}" is; name it .json, .graphml or .csv (with a known header), or send the kind field.`);
  }
  const shape = contentShape(text);
  if (shape !== SHAPE_OF[kind]) {
    throw new ImportFileError('WRONG_FILE_TYPE', `A ${kind} import must be ${SHAPE_NAME[SHAPE_OF[kind]]}, but "${fileName}" holds ${SHAPE_NAME[shape]}.`);
  }
  return kind;
}
