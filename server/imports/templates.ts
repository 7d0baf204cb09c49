// CSV templates (server/imports/templates/*.csv): the header and one example row per record type.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { CSV_TEMPLATE_KINDS } from '../../shared/imports';

const FILES: Record<(typeof CSV_TEMPLATE_KINDS)[number], string> = {
  'csv-sites': 'sites.csv', 'csv-spans': 'spans.csv', 'csv-slices': 'slices.csv',
};

export function isTemplateKind(kind: string): kind is (typeof CSV_TEMPLATE_KINDS)[number] {
  return (CSV_TEMPLATE_KINDS as readonly string[]).includes(kind);
}

export function templateFile(kind: (typeof CSV_TEMPLATE_KINDS)[number]): { fileName: string; text: string } {
  const fileName = FILES[kind];
  return { fileName, text: readFileSync(path.join(__dirname, 'templates', fileName), 'utf8') };
}
