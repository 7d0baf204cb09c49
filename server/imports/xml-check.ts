// Well-formedness checks before GraphML parsing: the XML parser is lenient, so truncated files would slip through.
import { DOMParser } from '@xmldom/xmldom';
import { ImportFileError } from './errors';
import { xmlTagProblem } from './xml-scan';

/** Parses the XML strictly enough to refuse truncated or malformed files with a readable reason. */
export function parseXmlStrict(text: string, fileName: string): Document {
  const problem = xmlTagProblem(text, fileName);
  if (problem) throw new ImportFileError('BAD_XML', `"${fileName}" is not well-formed XML (truncated?): ${problem}.`);
  const problems: string[] = [];
  const report = (m: string) => problems.push(m.replace(/^\[xmldom \w+\]\s*/, '').split('\n')[0]);
  const doc = new DOMParser({ errorHandler: { warning: report, error: report, fatalError: report } })
    .parseFromString(text, 'application/xml') as unknown as Document;
  if (problems.length > 0 || !doc?.documentElement) {
    throw new ImportFileError('BAD_XML', `"${fileName}" is not well-formed XML: ${problems[0] ?? 'no root element'}.`);
  }
  if (doc.documentElement.localName !== 'graphml' || doc.getElementsByTagName('graph').length === 0) {
    throw new ImportFileError('WRONG_FILE_TYPE', `"${fileName}" is XML but not GraphML (a <graphml> root with a <graph> inside).`);
  }
  return doc;
}
