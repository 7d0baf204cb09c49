// Command-line arguments of `npm run plan`: parsed strictly, every problem reported as a UsageError.
import type { PlanMode } from '../model/types';

export const MODES: readonly PlanMode[] = ['serial', 'islands', 'shared-eval', 'greedy', 'exact'];

export const USAGE = 'usage: npm run --silent plan -- <scenario.json> --window <id> [--mode serial|islands|shared-eval|greedy|exact] [--seed N] [--json]';

export class UsageError extends Error {}

export interface PlanArgs {
  file: string;
  window: string;
  mode: PlanMode;
  seed: number;
  json: boolean;
}

const VALUE_FLAGS = new Set(['--window', '--mode', '--seed']);

function splitFlags(argv: readonly string[]): { positional: string[]; values: Map<string, string>; json: boolean } {
  const positional: string[] = [];
  const values = new Map<string, string>();
  let json = false;
  for (let i = 0; i < argv.length; i += 1) {
    const arg = argv[i];
    if (arg === '--json') {
      json = true;
      continue;
    }
    if (!arg.startsWith('--') || arg === '-') {
      positional.push(arg);
      continue;
    }
    const eq = arg.indexOf('=');
    const flag = eq > 0 ? arg.slice(0, eq) : arg;
    if (!VALUE_FLAGS.has(flag)) throw new UsageError(`unknown option "${flag}"; ${USAGE}`);
    const value = eq > 0 ? arg.slice(eq + 1) : argv[++i];
    if (value === undefined || value === '') throw new UsageError(`option ${flag} needs a value`);
    if (values.has(flag)) throw new UsageError(`option ${flag} given twice`);
    values.set(flag, value);
  }
  return { positional, values, json };
}

export function parseArgs(argv: readonly string[]): PlanArgs {
  const { positional, values, json } = splitFlags(argv);
  if (positional.length === 0) throw new UsageError(`missing scenario file; ${USAGE}`);
  if (positional.length > 1) throw new UsageError(`expected one scenario file, got ${positional.length}: ${positional.join(' ')}`);
  const window = values.get('--window');
  if (window === undefined) throw new UsageError(`missing --window <id>; ${USAGE}`);
  const mode = values.get('--mode') ?? 'serial';
  if (!MODES.includes(mode as PlanMode)) throw new UsageError(`unknown mode "${mode}" (expected ${MODES.join(', ')})`);
  const seedText = values.get('--seed') ?? '1';
  if (!/^-?\d+$/.test(seedText) || !Number.isSafeInteger(Number(seedText))) throw new UsageError(`seed must be a whole number, got "${seedText}"`);
  return { file: positional[0], window, mode: mode as PlanMode, seed: Number(seedText), json };
}
