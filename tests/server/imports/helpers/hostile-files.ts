// Hostile import files (shared by the hostile-files test and bench/hostile-files.ts), each just under the 5 MB cap
// when "big": unclosed quotes (quadratic for a backtracking tag regex), deep nesting, and a DOM-heavy file.
const CAP_BYTES = 5 * 1024 * 1024;
const fill = (unit: string, budget: number) => unit.repeat(Math.floor(budget / unit.length));

export type HostileFile = { label: string; name: string; text: string; codes: string[] };

export function hostileFiles(): HostileFile[] {
  const deep = (n: number) => '<graphml><graph>' + '<data>'.repeat(n) + '</data>'.repeat(n) + '</graph></graphml>';
  const deepBig = Math.floor((CAP_BYTES - 64) / ('<data>'.length + '</data>'.length));
  return [
    { label: 'unclosed quotes, 64 kB', name: 'quotes.graphml', text: '<graphml>' + '<a "'.repeat(16000), codes: ['BAD_XML'] },
    { label: 'unclosed quotes, 5 MB', name: 'quotes-5mb.graphml', text: '<graphml>' + fill('<a "', CAP_BYTES - 64), codes: ['BAD_XML'] },
    { label: 'nested 20 000 deep, 260 kB', name: 'deep.graphml', text: deep(20000), codes: ['IMPORT_FILE_TOO_COMPLEX'] },
    { label: 'nested deep, 5 MB', name: 'deep-5mb.graphml', text: deep(deepBig), codes: ['IMPORT_FILE_TOO_COMPLEX'] },
  ];
}

/** Well-formed but over the reading budget: 1.3 million empty elements for the DOM parser (time or memory runs out). */
export function overBudgetFile(): HostileFile {
  const head = '<graphml><graph>';
  const tail = '</graph></graphml>';
  return {
    label: '1.3 million elements, 5 MB', name: 'many.graphml',
    text: head + fill('<n/>', CAP_BYTES - head.length - tail.length) + tail,
    codes: ['IMPORT_PARSE_TIMEOUT', 'IMPORT_FILE_TOO_COMPLEX'],
  };
}
