// Benchmark rows and their printing: every figure, its target and whether the target is met.

export interface Row {
  section: string;
  figure: string;
  value: string;
  target?: string;
  /** undefined = information only; null = target not measurable in this run (no qualifying case) */
  met?: boolean | null;
}

export const ms = (x: number) => `${x < 10 ? x.toFixed(2) : x.toFixed(0)} ms`;
export const pct = (x: number) => `${(100 * x).toFixed(1)} %`;

export function printTable(rows: Row[]): string {
  const cells = [['', 'figure', 'value', 'target', 'met'], ...rows.map((r) => [
    r.section, r.figure, r.value, r.target ?? '', r.met === undefined ? '' : r.met === null ? 'n/a' : r.met ? 'yes' : 'NO',
  ])];
  const widths = cells[0].map((_, c) => Math.max(...cells.map((row) => row[c].length)));
  const line = (row: string[]) => row.map((cell, c) => cell.padEnd(widths[c])).join(' │ ').trimEnd();
  const rule = widths.map((w) => '─'.repeat(w)).join('─┼─');
  return [line(cells[0]), rule, ...cells.slice(1).map(line)].join('\n');
}

export function misses(rows: Row[]): string {
  const missed = rows.filter((r) => r.met === false);
  const open = rows.filter((r) => r.met === null);
  const parts = [missed.length === 0 ? 'All measurable targets met.'
    : `Targets missed: ${missed.map((r) => `${r.section} ${r.figure} (${r.value}; target ${r.target})`).join('; ')}.`];
  if (open.length > 0) parts.push(`Not measurable in this run: ${open.map((r) => `${r.section} ${r.figure}`).join('; ')}.`);
  return parts.join(' ');
}
