// Words and figures for move plans: run states, outcomes, durations, costs and a one-line summary of the settings.
import type { PlanObjective, PlanProgress, PlanRunStatus, PlanSettings, SliceOutcome } from '@/shared/plans';

export const PLAN_STATUS_LABELS: Record<PlanRunStatus, string> = {
  queued: 'Waiting for a worker',
  running: 'Computing',
  done: 'Finished',
  failed: 'Failed',
  cancelled: 'Cancelled',
};

export const OUTCOME_LABELS: Record<SliceOutcome, string> = {
  stays: 'Stays',
  reroute: 'Reroute',
  move: 'Move',
  unresolved: 'Unresolved',
};

/** "Quay cranes", "Quay cranes and Tram signalling", "A, B and C". */
export function listWords(names: readonly string[]): string {
  if (names.length <= 1) return names[0] ?? '';
  return `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}

/** Why a knock-on move is in the plan: "Moved to make room for Quay cranes" (names, never ids). */
export function madeRoomSentence(outcome: SliceOutcome, names: readonly string[]): string {
  return `${outcome === 'reroute' ? 'Rerouted' : 'Moved'} to make room for ${listWords(names)}`;
}

/**
 * How long a finished run took: the search alone (what `computeMs` measures) and the whole run as the progress bar
 * counted it (preparing the network, the search, the greedy and exact references, writing up). Both are wall time.
 */
export function runTimeWords(searchMs: number, wholeRunMs: number | null): string {
  const search = `search ${formatDurationMs(searchMs)}`;
  if (wholeRunMs === null || wholeRunMs <= searchMs) return `${search} wall time`;
  return `${search} of ${formatDurationMs(wholeRunMs)} wall time in all (the rest: preparing the network and the reference solvers)`;
}

/** "850 ms", "12.4 s", "3 min 05 s". */
export function formatDurationMs(ms: number): string {
  if (ms < 1_000) return `${Math.round(ms)} ms`;
  const seconds = ms / 1_000;
  if (seconds < 60) return `${seconds.toFixed(1)} s`;
  const whole = Math.round(seconds);
  return `${Math.floor(whole / 60)} min ${String(whole % 60).padStart(2, '0')} s`;
}

/** Move costs are sums of per-function weights: two decimals at most, no trailing zeros. */
export function formatCost(value: number): string {
  return String(Math.round(value * 100) / 100);
}

/**
 * What a move cost counts, in the planner's own terms (planner/plan/evaluate-plan.ts: each moved function adds its
 * `moveCost`, 1 unless the inventory sets more for a stateful one; each rerouted link adds REROUTE_COST = 0.25).
 */
export const MOVE_COST_DEFINITION =
  'Move cost counts points: each function moved adds its own weight (1, more for a stateful function that carries state across), each link rerouted adds 0.25.';

/** "12.5 points", "1 point". */
export function formatMovePoints(value: number): string {
  const text = formatCost(value);
  return `${text} ${text === '1' ? 'point' : 'points'}`;
}

/**
 * What the planner weighs for slices left without a place (planner/plan/evaluate-plan.ts sliceWeight): each counts
 * 6 − its priority, so a priority-1 slice counts 5 and a priority-5 slice 1.
 */
export const UNPLACED_PRIORITY_DEFINITION =
  'Priority points left without a place: each slice the plan cannot keep counts 5 at priority 1, down to 1 at priority 5.';

/** Share of the time limit used so far, 0–1; the reference solvers run after the limit, so it stays full then. */
export function progressFraction(progress: Pick<PlanProgress, 'elapsedMs' | 'timeLimitMs' | 'phase'>): number {
  if (progress.phase === 'references' || progress.phase === 'finishing') return 1;
  if (!(progress.timeLimitMs > 0)) return 0;
  return Math.min(1, Math.max(0, progress.elapsedMs / progress.timeLimitMs));
}

/**
 * Time used by the run so far. While searching: "5.0 s of 20.0 s", or "21.2 s (limit 20.0 s)" once a round runs
 * past the limit. After the search (references, write-up) the server keeps the clock moving, so the
 * figure is the whole run's time and the search's limit is named beside it rather than as a share.
 */
export function elapsedFigure(progress: Pick<PlanProgress, 'elapsedMs' | 'phase'> | null, limitMs: number): string {
  const elapsed = formatDurationMs(progress?.elapsedMs ?? 0);
  const limit = formatDurationMs(limitMs);
  if (progress && (progress.phase === 'references' || progress.phase === 'finishing')) {
    return `${elapsed} in all (search limit ${limit})`;
  }
  if (progress && progress.elapsedMs > limitMs) return `${elapsed} (limit ${limit})`;
  return `${elapsed} of ${limit}`;
}

export const PHASE_LABELS: Record<PlanProgress['phase'], string> = {
  preparing: 'Preparing the network',
  searching: 'Searching for placements',
  references: 'Running the greedy and exact references',
  finishing: 'Writing up the result',
};

/**
 * "2 slices cannot be kept (8 priority points) · move cost 12.5 points" — the first two levels of the objective, as
 * planners read them.
 */
export function formatObjective(objective: PlanObjective): string {
  const n = objective.unresolved;
  const unresolved = n === 0
    ? 'every slice kept'
    : `${n} ${n === 1 ? 'slice cannot' : 'slices cannot'} be kept (${formatCost(objective.unresolvedWeight)} priority points)`;
  return `${unresolved} · move cost ${formatMovePoints(objective.moveCost)}`;
}

export const SEARCH_EFFORTS = ['quick', 'standard', 'thorough'] as const;
export type SearchEffort = (typeof SEARCH_EFFORTS)[number];

/**
 * Search effort in planners' words, mapped to how many candidate plans the search weighs each round (the
 * `population` setting; standard is the contract's default of 40).
 */
export const EFFORT: Record<SearchEffort, { label: string; population: number; hint: string }> = {
  quick: { label: 'Quick', population: 16, hint: 'Weighs 16 plans a round: an answer in seconds, fine for small windows.' },
  standard: { label: 'Standard', population: 40, hint: 'Weighs 40 plans a round: the usual balance of time and quality.' },
  thorough: { label: 'Thorough', population: 100, hint: 'Weighs 100 plans a round: for big windows with many slices; each round takes longer.' },
};

/** The effort a population matches, or null for a number set by hand. */
export function effortOf(population: number): SearchEffort | null {
  return SEARCH_EFFORTS.find((e) => EFFORT[e].population === population) ?? null;
}

export const BOTH_CORES_HINT =
  'Splits the search over both processor cores of the plan worker: the same quality of plan, sooner on big windows.';

/** Words for the run form's choices, so the summary reads like the form the planner filled in. */
const MODE_WORDS: Record<PlanSettings['mode'], string> = { serial: 'one processor core', islands: 'both processor cores' };
const AFTER_WORDS: Record<PlanSettings['afterWindow'], string> = {
  return: 'moves back after the window',
  keep: 'keeps the new placement after the window',
};

/** "up to 5 moves of untouched slices" / "no moves of untouched slices". */
export function knockOnWords(settings: Pick<PlanSettings, 'knockOn' | 'maxKnockOnMoves'>): string {
  const n = settings.maxKnockOnMoves;
  if (!settings.knockOn || n === 0) return 'no moves of untouched slices';
  return `up to ${n} ${n === 1 ? 'move' : 'moves'} of untouched slices`;
}

/**
 * "Standard search on one processor core · 20 s limit · moves back after the window · up to 5 moves of untouched
 * slices · 2 functions kept in place · 1 site left out · run number 7".
 */
export function settingsSummary(settings: PlanSettings): string {
  const effort = effortOf(settings.population);
  const search = effort ? `${EFFORT[effort].label} search` : `Search weighing ${settings.population} plans a round`;
  const parts = [
    `${search} on ${MODE_WORDS[settings.mode]}`,
    `${settings.timeLimitSeconds} s limit`,
    AFTER_WORDS[settings.afterWindow],
    knockOnWords(settings),
  ];
  if (settings.pinned.length > 0) parts.push(`${settings.pinned.length} ${settings.pinned.length === 1 ? 'function' : 'functions'} kept in place`);
  if (settings.excludedSites.length > 0) parts.push(`${settings.excludedSites.length} ${settings.excludedSites.length === 1 ? 'site' : 'sites'} left out`);
  parts.push(`run number ${settings.seed}`);
  return parts.join(' · ');
}
