// Pure helpers behind the review: what the map draws, the chart's points, and whether a plan may be accepted yet.
import type { PlanReview, PlanSlice } from '@/shared/plans';

export type Elements = { sites: string[]; spans: string[] };

function collect(into: { sites: Set<string>; spans: Set<string> }, sites: Iterable<string>, spans: Iterable<string>) {
  for (const s of sites) into.sites.add(s);
  for (const s of spans) into.spans.add(s);
}

const asElements = (set: { sites: Set<string>; spans: Set<string> }): Elements => ({ sites: [...set.sites], spans: [...set.spans] });

/**
 * Old and new positions to draw. For one chosen slice, its whole placement before and after; otherwise only what
 * changes in the plan: the sites moved functions leave and reach, and the old and new paths of rerouted ties.
 */
export function planMapElements(slices: readonly PlanSlice[], selectedSlice: string | null): { before: Elements; after: Elements } {
  const before = { sites: new Set<string>(), spans: new Set<string>() };
  const after = { sites: new Set<string>(), spans: new Set<string>() };
  const chosen = selectedSlice ? slices.filter((s) => s.slice === selectedSlice) : slices;
  for (const slice of chosen) {
    if (selectedSlice) {
      collect(before, Object.values(slice.before.sites), Object.values(slice.before.paths).flat());
      if (slice.after) collect(after, Object.values(slice.after.sites), Object.values(slice.after.paths).flat());
      continue;
    }
    collect(before, slice.moves.map((m) => m.from), slice.reroutes.flatMap((r) => r.from));
    collect(after, slice.moves.map((m) => m.to), slice.reroutes.flatMap((r) => r.to));
  }
  return { before: asElements(before), after: asElements(after) };
}

export type ChartPoint = { value: number };

/** At most this many points reach the chart: a long run's every generation would only blur the line. */
export const CHART_MAX_POINTS = 40;

/** Move cost and unresolved weight of the best member over the generations, thinned evenly, last point kept. */
export function convergenceSeries(trace: PlanReview['trace'], maxPoints = CHART_MAX_POINTS): { moveCost: ChartPoint[]; unresolved: ChartPoint[] } {
  if (trace.length === 0) return { moveCost: [], unresolved: [] };
  const step = Math.max(1, Math.ceil(trace.length / maxPoints));
  const picked = trace.filter((_, i) => i % step === 0);
  if (picked[picked.length - 1] !== trace[trace.length - 1]) picked.push(trace[trace.length - 1]);
  // No per-point labels: at phone widths the chart cuts them to a character; the caption gives the range instead.
  return {
    moveCost: picked.map((p) => ({ value: p.best.moveCost })),
    unresolved: picked.map((p) => ({ value: p.best.unresolvedWeight })),
  };
}

/** Slices the plan leaves unresolved, which must each be ticked (outage accepted) before accepting. */
export function unresolvedSlices(review: Pick<PlanReview, 'slices'>): PlanSlice[] {
  return review.slices.filter((s) => s.outcome === 'unresolved');
}

export function outagesAllTicked(review: Pick<PlanReview, 'slices'>, ticked: readonly string[]): boolean {
  return unresolvedSlices(review).every((s) => ticked.includes(s.slice));
}

/** "1.2 %" relative gap; null when there is none to show. */
export function formatGap(gap: number | null): string | null {
  if (gap === null || !Number.isFinite(gap)) return null;
  return `${(gap * 100).toFixed(gap < 0.01 ? 2 : 1)} %`;
}
