// One vocabulary of counts for what a window does to slices, shared by the impact screen, the plan review, the
// sign-off summary and the server: touched slices, of which some must move and some only lose protection, the ones
// a plan cannot keep, and the untouched slices it moves to make room. Pure, so every screen counts the same way.
import { z } from 'zod';

export const TOUCH_COUNT_KEYS = ['touched', 'mustMove', 'protectionLost', 'unresolved', 'knockOn'] as const;
export type TouchCountKey = (typeof TOUCH_COUNT_KEYS)[number];

/** A figure is null when it needs a plan and there is none yet. */
export const touchCountsSchema = z.object({
  touched: z.number().int(),
  mustMove: z.number().int(),
  protectionLost: z.number().int(),
  unresolved: z.number().int().nullable(),
  knockOn: z.number().int().nullable(),
});
export type TouchCounts = z.infer<typeof touchCountsSchema>;

/** Labels and one-line definitions, read by every screen that shows the counts. */
export const TOUCH_COUNT_WORDS: Record<TouchCountKey, { label: string; definition: string }> = {
  touched: {
    label: 'Touched slices',
    definition: 'Every slice the work reaches: it must move, or it keeps running without its backup path.',
  },
  mustMove: {
    label: 'Must move',
    definition: 'Touched slices with a function on equipment going down, a link across it, or too little capacity left.',
  },
  protectionLost: {
    label: 'Lose protection, stay up',
    definition: 'Touched slices that keep running where they are but have no separate backup path during the work.',
  },
  unresolved: {
    label: 'Cannot be kept',
    definition: 'Of the slices that must move, those the plan finds no place for: they are down unless the work changes.',
  },
  knockOn: {
    label: 'Moved to make room',
    definition: 'Slices the work does not touch, moved so that touched slices keep running (not counted as touched).',
  },
};

/** Impact reasons that mean the slice cannot stay as it is (DESIGN §3 "Impact"); `unprotected` alone does not. */
const MUST_MOVE_REASONS: ReadonlySet<string> = new Set(['hosted', 'transit', 'squeezed']);

const PLAN_SLICE_REASONS = ['hosted'] as const;

export type TouchedSlice = { slice: string; reasons: readonly string[]; tenantId: string };
export type PlannedSlice = { slice: string; outcome: string; madeRoomFor: readonly unknown[]; tenantId: string };

export const mustMove = (s: Pick<TouchedSlice, 'reasons'>) => s.reasons.some((r) => MUST_MOVE_REASONS.has(r));
export const isKnockOnSlice = (s: Pick<PlannedSlice, 'madeRoomFor'>) => s.madeRoomFor.length > 0;

/**
 * The slices the window touches: the impact's list when there is one; otherwise the plan's own slices (a plan holds
 * only the ones that must move, so slices that merely lose protection are then missing).
 */
function touchedSlices(impact: readonly TouchedSlice[] | null, plan: readonly PlannedSlice[] | null): TouchedSlice[] {
  if (impact) return [...impact];
  // A plan's own (non knock-on) slices are exactly the ones that must move, whatever reasons they carry.
  return (plan ?? []).filter((s) => !isKnockOnSlice(s)).map((s) => ({ slice: s.slice, reasons: PLAN_SLICE_REASONS, tenantId: s.tenantId }));
}

export function touchCounts(impact: readonly TouchedSlice[] | null, plan: readonly PlannedSlice[] | null): TouchCounts {
  const touched = touchedSlices(impact, plan);
  const moving = touched.filter(mustMove).length;
  return {
    touched: touched.length,
    mustMove: moving,
    protectionLost: touched.length - moving,
    unresolved: plan ? plan.filter((s) => !isKnockOnSlice(s) && s.outcome === 'unresolved').length : null,
    knockOn: plan ? plan.filter(isKnockOnSlice).length : null,
  };
}

export type TenantTouch = {
  tenantId: string; touched: number; mustMove: number; protectionLost: number; moving: number; knockOn: number;
};

/**
 * Per tenant: every tenant with a touched slice or a knock-on move, with its counts; `moving` counts its touched
 * slices the plan moves or reroutes. Tenants with the most moving slices first, then by id for a stable order.
 */
export function tenantTouches(impact: readonly TouchedSlice[] | null, plan: readonly PlannedSlice[] | null): TenantTouch[] {
  const by = new Map<string, TenantTouch>();
  const entry = (tenantId: string) => {
    const found = by.get(tenantId) ?? { tenantId, touched: 0, mustMove: 0, protectionLost: 0, moving: 0, knockOn: 0 };
    by.set(tenantId, found);
    return found;
  };
  for (const s of touchedSlices(impact, plan)) {
    const e = entry(s.tenantId);
    e.touched += 1;
    if (mustMove(s)) e.mustMove += 1;
    else e.protectionLost += 1;
  }
  for (const s of plan ?? []) {
    const e = entry(s.tenantId);
    if (isKnockOnSlice(s)) e.knockOn += 1;
    else if (s.outcome === 'move' || s.outcome === 'reroute') e.moving += 1;
  }
  return [...by.values()].sort((a, b) => b.moving + b.knockOn - (a.moving + a.knockOn) || b.touched - a.touched
    || a.tenantId.localeCompare(b.tenantId));
}

/** The impact's affected slices (shared/window-impact.ts) in the shape the counts read. */
export function touchedFromImpact(affected: readonly { slice: string; reasons: readonly string[]; tenant: { id: string } }[]): TouchedSlice[] {
  return affected.map((a) => ({ slice: a.slice, reasons: a.reasons, tenantId: a.tenant.id }));
}
