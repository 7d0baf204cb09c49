// `npm run bench:planner [-- --quick] [-- --json] [-- --only=<section>[,<section>…]]`: the planner benchmark,
// every section in one run (or only the named ones: impact (a)/(d), parallel (b), quality (c), real-shape (e)).
// Prints a table (or, with --json, one JSON summary) and names the missed targets at the end.
import { impactAndMemory } from './impact-bench';
import { log } from './instances';
import { parallelModes } from './parallel-bench';
import { qualityRefs } from './quality-bench';
import { realShape } from './real-shape-bench';
import { misses, printTable, type Row } from './report';

/** In run order: (a)/(d) first, so the peak RSS reported there is that of the 1,000-site / 20,000-slice instance. */
const SECTIONS: { name: string; letters: string[]; run: (quick: boolean) => Promise<Row[]> }[] = [
  { name: 'impact', letters: ['a', 'd'], run: impactAndMemory },
  { name: 'parallel', letters: ['b'], run: parallelModes },
  { name: 'quality', letters: ['c'], run: qualityRefs },
  { name: 'real-shape', letters: ['e'], run: realShape },
];

function parseOnly(argv: string[]): Set<string> | null {
  const given = argv.filter((a) => a.startsWith('--only='));
  if (given.length === 0) return null;
  const wanted = new Set<string>();
  for (const word of given.flatMap((a) => a.slice('--only='.length).split(','))) {
    const section = SECTIONS.find((s) => s.name === word || s.letters.includes(word));
    if (!section) throw new Error(`unknown section "${word}" (expected ${SECTIONS.map((s) => `${s.name} (${s.letters.join('/')})`).join(', ')})`);
    wanted.add(section.name);
  }
  return wanted;
}

async function main(argv: string[]): Promise<void> {
  const quick = argv.includes('--quick');
  const json = argv.includes('--json');
  const unknown = argv.filter((a) => a !== '--quick' && a !== '--json' && !a.startsWith('--only='));
  if (unknown.length > 0) throw new Error(`unknown argument(s): ${unknown.join(' ')} (expected --quick, --json, --only=<section>)`);
  const only = parseOnly(argv);
  const startMs = performance.now();
  const rows: Row[] = [];
  for (const section of SECTIONS) {
    if (only && !only.has(section.name)) continue;
    const sectionStartMs = performance.now();
    rows.push(...(await section.run(quick)));
    log(`${section.name} took ${((performance.now() - sectionStartMs) / 1000).toFixed(1)} s`);
  }
  const totalMs = performance.now() - startMs;
  log(`done in ${(totalMs / 1000).toFixed(1)} s`);
  const sections = only ? [...only] : SECTIONS.map((s) => s.name);
  if (json) {
    process.stdout.write(`${JSON.stringify({ quick, sections, totalMs: Math.round(totalMs), rows, missed: rows.filter((r) => r.met === false).map((r) => r.figure) }, null, 2)}\n`);
    return;
  }
  process.stdout.write(`Slackwater planner benchmark${quick ? ' (--quick)' : ''}${only ? ` — only ${sections.join(', ')}` : ''}; `
    + 'Waxman networks, BRITE convention P = α·exp(−d/(βL)), α = 0.5, β = 0.2; real-shape networks by preferential attachment (Barabási–Albert, m = 2)\n\n');
  process.stdout.write(`${printTable(rows)}\n\nTotal ${(totalMs / 1000).toFixed(1)} s. ${misses(rows)}\n`);
}

main(process.argv.slice(2)).catch((err) => {
  process.stderr.write(`bench: ${err instanceof Error ? err.stack : String(err)}\n`);
  process.exitCode = 1;
});
