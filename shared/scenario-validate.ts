// Validates a `slackwater-scenario/1` document: the zod schema first, then every semantic problem with its JSON path.
import type { z } from 'zod';
import type { Scenario } from './scenario';
import { scenarioSchema } from './scenario';
import type { ScenarioIssue } from './scenario-validate-context';
import { buildIndex, IssueCollector, jsonPath } from './scenario-validate-context';
import { checkDuplicateIds, checkSliceRefs, checkSpanEnds, checkWindows } from './scenario-validate-refs';
import { checkPlacementContents, checkPlacementCoverage } from './scenario-validate-placements';
import { warnAnchorsAndLatency, warnCapacity } from './scenario-validate-usage';

export type { ScenarioIssue } from './scenario-validate-context';

export type ScenarioValidation =
  | { ok: true; scenario: Scenario; warnings: ScenarioIssue[] }
  | { ok: false; errors: ScenarioIssue[]; warnings: ScenarioIssue[] };

type ZodIssue = z.core.$ZodIssue;
type Key = PropertyKey;

function plainMessage(issue: ZodIssue): string {
  // zod says "expected string, received undefined" for a missing field; say it the way a person would.
  if (issue.code === 'invalid_type' && /received undefined$/.test(issue.message)) return `is required (expected ${issue.expected})`;
  return issue.message;
}

/** A failed union lists every branch's issues; report the branch that came closest (fewest issues). */
function flattenIssue(issue: ZodIssue, prefix: Key[]): { path: Key[]; message: string }[] {
  const path = [...prefix, ...issue.path];
  if (issue.code === 'invalid_union' && issue.errors.length > 0) {
    const closest = [...issue.errors].sort((a, b) => a.length - b.length)[0];
    if (closest.length > 0) return closest.flatMap((inner) => flattenIssue(inner, path));
  }
  return [{ path, message: plainMessage(issue) }];
}

export function zodIssuesToScenarioIssues(issues: readonly ZodIssue[]): ScenarioIssue[] {
  return issues
    .flatMap((issue) => flattenIssue(issue, []))
    .map(({ path, message }) => ({
      path: jsonPath(path.map((k) => (typeof k === 'number' ? k : String(k)))),
      message,
    }));
}

export function validateScenario(input: unknown): ScenarioValidation {
  const parsed = scenarioSchema.safeParse(input);
  // Semantic checks assume the shapes the schema guarantees, so a malformed file stops here.
  if (!parsed.success) return { ok: false, errors: zodIssuesToScenarioIssues(parsed.error.issues), warnings: [] };
  const scenario = parsed.data;
  const out = checkScenarioSemantics(scenario);
  if (out.errors.length > 0) return { ok: false, errors: out.errors, warnings: out.warnings };
  return { ok: true, scenario, warnings: out.warnings };
}

/**
 * The semantic checks alone, on a scenario whose shapes are already known good (validateScenario runs the schema
 * first; the streamed export checks each element's shape as it writes it, so it does not copy the whole document).
 */
export function checkScenarioSemantics(scenario: Scenario): { errors: ScenarioIssue[]; warnings: ScenarioIssue[] } {
  const ix = buildIndex(scenario);
  const out = new IssueCollector();
  checkDuplicateIds(scenario, out);
  checkSpanEnds(scenario, ix, out);
  checkSliceRefs(scenario, ix, out);
  checkWindows(scenario, ix, out);
  checkPlacementCoverage(scenario, ix, out);
  checkPlacementContents(scenario, ix, out);
  warnCapacity(scenario, ix, out);
  warnAnchorsAndLatency(scenario, ix, out);
  return { errors: out.errors, warnings: out.warnings };
}

export function formatIssue(issue: ScenarioIssue): string {
  return `${issue.path}: ${issue.message}`;
}
