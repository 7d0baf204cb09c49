// `npm run bench:planner [-- --quick] [-- --json]`: the planner benchmark, every section in one run.
// Prints a table (or, with --json, one JSON summary) and names the missed targets at the end.
import { impactAndMemory } from './impact-bench';
import { log } from './instances';
import { parallelModes } from './parallel-bench';
import { qualityRefs } from './quality-bench';
import { misses, printTable, type Row } from './report';

async function main(argv: string[]): Promise<void> {
  const quick = argv.includes('--quick');
  const json = argv.includes('--json');
  const unknown = argv.filter((a) => a !== '--quick' && a !== '--json');
  if (unknown.length > 0) throw new Error(`unknown argument(s): ${unknown.join(' ')} (expected --quick, --json)`);
  const startMs = performance.now();
  const rows: Row[] = [];
  // (a)/(d) first, so the peak RSS reported there is that of the 1,000-site / 20,000-slice instance.
  rows.push(...(await impactAndMemory(quick)));
  rows.push(...(await parallelModes(quick)));
  rows.push(...(await qualityRefs(quick)));
  const totalMs = performance.now() - startMs;
  log(`done in ${(totalMs / 1000).toFixed(1)} s`);
  if (json) {
    process.stdout.write(`${JSON.stringify({ quick, totalMs: Math.round(totalMs), rows, missed: rows.filter((r) => r.met === false).map((r) => r.figure) }, null, 2)}\n`);
    return;
  }
  process.stdout.write(`Slackwater planner benchmark${quick ? ' (--quick)' : ''}; Waxman networks, BRITE convention P = α·exp(−d/(βL)), α = 0.5, β = 0.2\n\n`);
  process.stdout.write(`${printTable(rows)}\n\nTotal ${(totalMs / 1000).toFixed(1)} s. ${misses(rows)}\n`);
}

main(process.argv.slice(2)).catch((err) => {
  process.stderr.write(`bench: ${err instanceof Error ? err.stack : String(err)}\n`);
  process.exitCode = 1;
});
