// Pure helpers behind the review: what the map draws and whether a plan may be accepted yet.
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
