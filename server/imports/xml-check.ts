// Well-formedness checks before GraphML parsing: the XML parser is lenient, so truncated files would slip through.
import { DOMParser } from '@xmldom/xmldom';
import { ImportFileError } from './errors';

const lineAt = (text: string, index: number) => text.slice(0, index).split('\n').length;

/** Skips comments, CDATA, processing instructions and the doctype; returns the first tag problem. */
function tagProblem(text: string): string | null {
  const stack: { name: string; line: number }[] = [];
  const tag = /<!--[\s\S]*?-->|<!\[CDATA\[[\s\S]*?\]\]>|<\?[\s\S]*?\?>|<!DOCTYPE[^>]*>|<(\/?)([A-Za-z_][\w:.-]*)((?:[^>"']|"[^"]*"|'[^']*')*?)(\/?)>/g;
  let last = 0;
  for (let m = tag.exec(text); m; m = tag.exec(text)) {
    if (text.slice(last, m.index).includes('<')) return `a "<" on line ${lineAt(text, last)} does not start a complete tag`;
    last = tag.lastIndex;
    const [, closing, name, , selfClosing] = m;
    if (name === undefined || selfClosing) continue;
    if (!closing) { stack.push({ name, line: lineAt(text, m.index) }); continue; }
    const open = stack.pop();
    if (!open) return `</${name}> on line ${lineAt(text, m.index)} closes nothing`;
    if (open.name !== name) return `</${name}> on line ${lineAt(text, m.index)} closes <${open.name}> opened on line ${open.line}`;
  }
  if (text.slice(last).includes('<')) return `a "<" on line ${lineAt(text, last)} does not start a complete tag`;
  const open = stack.pop();
  return open ? `<${open.name}> opened on line ${open.line} is never closed` : null;
}

/** Parses the XML strictly enough to refuse truncated or malformed files with a readable reason. */
export function parseXmlStrict(text: string, fileName: string): Document {
  const problem = tagProblem(text);
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
