// Reads and validates a scenario file for the command line; any problem becomes a one-line UsageError.
import { readFileSync } from 'node:fs';
import type { Scenario } from '../../shared/scenario';
import { formatIssue, validateScenario } from '../../shared/scenario-validate';
import { UsageError } from './args';

export function readScenarioFile(file: string): Scenario {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    throw new UsageError(code === 'ENOENT' ? `scenario file not found: ${file}` : `cannot read scenario file ${file}: ${code ?? String(err)}`);
  }
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (err) {
    throw new UsageError(`scenario file ${file} is not valid JSON: ${(err as Error).message}`);
  }
  const v = validateScenario(data);
  if (!v.ok) {
    const more = v.errors.length > 1 ? ` (and ${v.errors.length - 1} more)` : '';
    throw new UsageError(`invalid scenario ${file}: ${formatIssue(v.errors[0])}${more}`);
  }
  return v.scenario;
}
