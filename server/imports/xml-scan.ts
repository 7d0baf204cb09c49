// A single linear pass over XML text that checks tags balance, with a nesting limit. No regular expression
// backtracks here: each character is looked at a bounded number of times, so a hostile file costs what it weighs.
import { ImportTooComplexError } from './errors';

/** WARNING: deeper files are refused before the DOM parser (recursive) ever sees them. GraphML needs about 5. */
export const MAX_XML_DEPTH = 64;

/** 1-based line numbers of increasing offsets, counted incrementally (the scan never goes backwards). */
function lineCounter(text: string): (index: number) => number {
  let at = 0;
  let line = 1;
  return (index) => {
    for (; at < index; at++) if (text.charCodeAt(at) === 10) line++;
    return line;
  };
}

const isNameStart = (c: number) => (c >= 65 && c <= 90) || (c >= 97 && c <= 122) || c === 95;
const isNameChar = (c: number) => isNameStart(c) || (c >= 48 && c <= 57) || c === 58 || c === 46 || c === 45;

/** Markup that is not an element: comments, CDATA, processing instructions, the doctype (open and close marks). */
const SKIPPED: [open: string, close: string][] = [['<!--', '-->'], ['<![CDATA[', ']]>'], ['<?', '?>'], ['<!DOCTYPE', '>']];

type Tag = { end: number; name: string; closing: boolean; selfClosing: boolean };

/** The element tag starting at `start` (a "<"), or null when it is not a complete tag. */
function readTag(text: string, start: number): Tag | null {
  let i = start + 1;
  const closing = text.charCodeAt(i) === 47;
  if (closing) i++;
  if (!isNameStart(text.charCodeAt(i))) return null;
  const nameStart = i;
  while (i < text.length && isNameChar(text.charCodeAt(i))) i++;
  const name = text.slice(nameStart, i);
  for (; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 62) return { end: i + 1, name, closing, selfClosing: text.charCodeAt(i - 1) === 47 && i - 1 > nameStart };
    if (c === 34 || c === 39) {
      const close = text.indexOf(c === 34 ? '"' : "'", i + 1);
      if (close < 0) return null;
      i = close;
    }
  }
  return null;
}

/** The first tag problem in the text (a readable sentence), or null when every element is closed in order. */
export function xmlTagProblem(text: string, fileName: string): string | null {
  const lineAt = lineCounter(text);
  const stack: { name: string; line: number }[] = [];
  let i = text.indexOf('<');
  while (i >= 0) {
    const next = text.charCodeAt(i + 1);
    const skipped = next === 33 || next === 63 ? SKIPPED.find(([open]) => text.startsWith(open, i)) : undefined;
    let end: number;
    if (skipped) {
      const close = text.indexOf(skipped[1], i + skipped[0].length);
      if (close < 0) return `a "<" on line ${lineAt(i)} does not start a complete tag`;
      end = close + skipped[1].length;
    } else {
      const tag = readTag(text, i);
      if (!tag) return `a "<" on line ${lineAt(i)} does not start a complete tag`;
      end = tag.end;
      if (tag.closing) {
        const open = stack.pop();
        if (!open) return `</${tag.name}> on line ${lineAt(i)} closes nothing`;
        if (open.name !== tag.name) return `</${tag.name}> on line ${lineAt(i)} closes <${open.name}> opened on line ${open.line}`;
      } else if (!tag.selfClosing) {
        stack.push({ name: tag.name, line: lineAt(i) });
        if (stack.length > MAX_XML_DEPTH) {
          throw new ImportTooComplexError('IMPORT_FILE_TOO_COMPLEX',
            `"${fileName}" nests elements more than ${MAX_XML_DEPTH} deep (at <${tag.name}> on line ${lineAt(i)}); GraphML needs only a few levels.`);
        }
      }
    }
    i = text.indexOf('<', end);
  }
  const open = stack.pop();
  return open ? `<${open.name}> opened on line ${open.line} is never closed` : null;
}
