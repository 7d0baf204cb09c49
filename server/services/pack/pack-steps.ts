// The plan's make-before-break steps as rows for the pack and the moves CSV: one row per step, in order, by name.
import type { PackStep } from '../../../shared/change-pack';
import type { PlanReview } from '../../../shared/plans';
import type { PackNames } from './pack-names';

const asPath = (v: string | string[]) => (Array.isArray(v) ? v : [v]);

export function packSteps(review: Pick<PlanReview, 'steps' | 'slices'>, names: PackNames): PackStep[] {
  const bySlice = new Map(review.slices.map((s) => [s.slice, s]));
  return review.steps.map((step, i) => {
    const slice = bySlice.get(step.slice);
    const moving = step.kind === 'move-function';
    const site = (v: string | string[]) => names.site(Array.isArray(v) ? v[0] ?? '' : v);
    return {
      order: i + 1,
      sliceName: slice?.name ?? names.slice(step.slice),
      tenantName: names.tenant(slice?.tenantId ?? ''),
      kind: step.kind,
      what: moving ? names.fn(step.element) : names.tie(step.element),
      fromSite: moving ? site(step.from) : null,
      toSite: moving ? site(step.to) : null,
      fromPath: moving ? null : names.path(asPath(step.from)),
      toPath: moving ? null : names.path(asPath(step.to)),
      madeRoomFor: step.knockOn ? (slice?.madeRoomFor ?? []).map((m) => m.name) : [],
      needsSpare: step.needsSpare,
    };
  });
}

/** Every id the steps and slices name, so the caller can look the names up in one go each. */
export function idsToName(review: Pick<PlanReview, 'steps' | 'slices'>) {
  const sites = new Set<string>();
  const spans = new Set<string>();
  const functions = new Set<string>();
  const ties = new Set<string>();
  for (const step of review.steps) {
    if (step.kind === 'move-function') {
      functions.add(step.element);
      for (const v of [step.from, step.to]) asPath(v).forEach((id) => sites.add(id));
    } else {
      ties.add(step.element);
      for (const v of [step.from, step.to]) asPath(v).forEach((id) => spans.add(id));
    }
  }
  return { sites: [...sites], spans: [...spans], functions: [...functions], ties: [...ties], tenants: [...new Set(review.slices.map((s) => s.tenantId))] };
}
