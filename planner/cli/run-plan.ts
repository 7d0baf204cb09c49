// The command line's work, with its output streams passed in (tests drive it without spawning a process).
// Exit 0 with the plan on stdout; exit 2 with one line on stderr (and nothing on stdout) for bad input;
// exit 1 with one line on stderr when planning itself fails.
import { PlannerError } from '../errors';
import { compileWindow } from '../model/build-inventory';
import type { PlanResult } from '../model/types';
import { computePlan } from '../plan/compute-plan';
import { withParallelRunner } from '../workers/parallel-runner';
import { parseArgs, UsageError, type PlanArgs } from './args';
import { toJsonDocument, toTable } from './format-plan';
import { readScenarioFile } from './read-scenario-file';

async function run(args: PlanArgs): Promise<PlanResult> {
  const scenario = readScenarioFile(args.file);
  const w = (scenario.windows ?? []).find((x) => x.id === args.window);
  if (!w) throw new UsageError(`unknown window "${args.window}" in ${args.file}`);
  const window = compileWindow(w);
  // The pool starts threads only for the parallel modes.
  const computed = await withParallelRunner((parallel) => computePlan(scenario, window, { plan: { mode: args.mode, seed: args.seed, parallel } }));
  return computed.result;
}

function oneLine(message: string): string {
  return message.replace(/\s*\n\s*/g, ' ');
}

export interface Output {
  out(text: string): void;
  err(text: string): void;
}

export async function main(argv: readonly string[], io: Output): Promise<number> {
  try {
    const args = parseArgs(argv);
    const result = await run(args);
    io.out(args.json ? `${JSON.stringify(toJsonDocument(result))}\n` : `${toTable(result)}\n`);
    return 0;
  } catch (err) {
    const bad = err instanceof UsageError || (err instanceof PlannerError && err.code !== 'PLAN_UNVERIFIED');
    io.err(`plan: ${oneLine(err instanceof Error ? err.message : String(err))}\n`);
    return bad ? 2 : 1;
  }
}
