// Reads a `slackwater-scenario/1` JSON file: syntax problems refuse the upload, schema problems become preview errors.
import type { ImportIssue } from '../../shared/imports';
import { SCENARIO_FORMAT, scenarioSchema } from '../../shared/scenario';
import { zodIssuesToScenarioIssues } from '../../shared/scenario-validate';
import { ImportFileError } from './errors';
import type { ParsedImport } from './types';

/** "at position 123" in V8's JSON messages → line and column, so the message points somewhere useful. */
function where(text: string, message: string): string {
  const pos = Number(message.match(/position (\d+)/)?.[1]);
  if (!Number.isFinite(pos)) return '';
  const before = text.slice(0, pos).split('\n');
  return ` (line ${before.length}, column ${before[before.length - 1].length + 1})`;
}

function parseJson(text: string, fileName: string): unknown {
  try {
    return JSON.parse(text);
  } catch (err) {
    const message = (err as Error).message;
    const pos = Number(message.match(/position (\d+)/)?.[1]);
    // A cut-off file fails at its very end (or with "end of input"), whatever token it was cut in.
    if (/end of JSON input|Unterminated/i.test(message) || pos >= text.trimEnd().length) {
      throw new ImportFileError('BAD_JSON', `"${fileName}" ends before its JSON is complete; the file looks truncated.`);
    }
    throw new ImportFileError('BAD_JSON', `"${fileName}" is not valid JSON${where(text, message)}: ${message}`);
  }
}

export function parseScenarioFile(text: string, fileName: string): ParsedImport {
  const json = parseJson(text, fileName);
  const format = (json as { format?: unknown } | null)?.format;
  if (typeof json !== 'object' || json === null || Array.isArray(json) || format !== SCENARIO_FORMAT) {
    throw new ImportFileError('WRONG_FILE_TYPE', `"${fileName}" is JSON but not a scenario file: "format" must be "${SCENARIO_FORMAT}".`);
  }
  const warnings: ImportIssue[] = [];
  const { windows, ...rest } = json as Record<string, unknown>;
  if (Array.isArray(windows) && windows.length > 0) {
    warnings.push({ file: fileName, path: '$.windows', message: `${windows.length} window(s) in the file are ignored; book maintenance windows in the calendar.` });
  }
  const parsed = scenarioSchema.safeParse(rest);
  if (!parsed.success) {
    const errors = zodIssuesToScenarioIssues(parsed.error.issues).map((i) => ({ file: fileName, path: i.path, message: i.message }));
    return { errors, warnings, content: { kind: 'scenario', scenario: null } };
  }
  return { errors: [], warnings, content: { kind: 'scenario', scenario: parsed.data } };
}
