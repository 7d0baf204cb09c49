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

/** "2 unresolved (weight 5) · move cost 12.5" — the first two levels of the objective, as planners read them. */
export function formatObjective(objective: PlanObjective): string {
  const unresolved = objective.unresolved === 0
    ? 'nothing unresolved'
    : `${objective.unresolved} unresolved (weight ${formatCost(objective.unresolvedWeight)})`;
  return `${unresolved} · move cost ${formatCost(objective.moveCost)}`;
}

/** Words for the run form's choices, so the summary reads like the form the planner filled in. */
const MODE_WORDS: Record<PlanSettings['mode'], string> = { serial: 'One thread', islands: 'Islands (parallel)' };
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
 * "One thread · seed 7 · 40 candidates · 20 s limit · moves back after the window · up to 5 moves of untouched
 * slices · 2 functions kept in place · 1 site left out".
 */
export function settingsSummary(settings: PlanSettings): string {
  const parts = [
    MODE_WORDS[settings.mode],
    `seed ${settings.seed}`,
    `${settings.population} candidates`,
    `${settings.timeLimitSeconds} s limit`,
    AFTER_WORDS[settings.afterWindow],
    knockOnWords(settings),
  ];
  if (settings.pinned.length > 0) parts.push(`${settings.pinned.length} ${settings.pinned.length === 1 ? 'function' : 'functions'} kept in place`);
  if (settings.excludedSites.length > 0) parts.push(`${settings.excludedSites.length} ${settings.excludedSites.length === 1 ? 'site' : 'sites'} left out`);
  return parts.join(' · ');
}
