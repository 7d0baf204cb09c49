// Everything a slot search evaluates against, read once: the compiled inventory and its revision, freezes and
// active windows overlapping the range (with their elements and accepted plans), policies and tenants' notice days.
import type { Queryable } from '../../../db/client';
import { countComponents } from '../../../planner/impact/bridges';
import type { Inventory, SlicePlan, WindowSpec } from '../../../planner/model/types';
import type { PlanSlice } from '../../../shared/plans';
import type { Policies } from '../../../shared/policies';
import type { Scenario } from '../../../shared/scenario';
import { ACTIVE_WINDOW_STATUSES } from '../../../shared/windows';
import { selectInventoryRevision } from '../../queries/inventory/inventory-revision';
import { selectWindowsInRange } from '../../queries/slots/slot-windows';
import { listFreezes, type FreezeRow } from '../../queries/windows/freezes';
import { getPolicies } from '../../queries/windows/policies';
import { selectElementsByWindow, type ElementRow } from '../../queries/windows/window-rows';
import { currentInventory } from '../inventory/inventory-cache';
import { toSlicePlan } from '../plans/reservations';
import { outageOf, type Outage } from '../windows/pair-conflicts';
import { windowSpecOf } from '../windows/window-spec';
import { namesOf, type SlotNames } from './slot-words';

export type ContextWindow = {
  id: string; title: string; startMs: number; endMs: number; version: number; acceptedPlanId: string | null;
  elements: ElementRow[]; spec: WindowSpec; outage: Outage;
  /** the accepted plan's slices ([] without one) */
  slices: SlicePlan[];
};

export type ContextFreeze = { id: string; title: string; startMs: number; endMs: number; startsAt: Date; endsAt: Date };

export interface SlotContext {
  revision: number;
  scenario: Scenario;
  inventory: Inventory;
  names: SlotNames;
  freezes: ContextFreeze[];
  windows: ContextWindow[];
  policies: Policies;
  /** tenant id → days of notice it is owed: max(its contract's notice days, policy noticeLeadDays) */
  leadDays: Map<string, number>;
  /** components of the intact network (pair-conflicts' baseline) */
  baseComponents: number;
}

function storedSlices(result: unknown): SlicePlan[] {
  const slices = (result as { slices?: unknown } | null)?.slices;
  return Array.isArray(slices) ? (slices as PlanSlice[]).map(toSlicePlan) : [];
}

const freezeOf = (f: FreezeRow): ContextFreeze => ({
  id: f.id, title: f.title, startMs: f.startsAt.getTime(), endMs: f.endsAt.getTime(), startsAt: f.startsAt, endsAt: f.endsAt,
});

/**
 * Active windows overlapping [fromMs, toMs), with their elements and accepted plans. A campaign's spacing rule reads
 * them over its slots' range widened by its D days (server/services/campaigns/booked-spacing.ts).
 */
export async function loadContextWindows(db: Queryable, inventory: Inventory, fromMs: number, toMs: number): Promise<ContextWindow[]> {
  const rows = await selectWindowsInRange(db, new Date(fromMs), new Date(toMs), ACTIVE_WINDOW_STATUSES);
  const elements = await selectElementsByWindow(db, rows.map((r) => r.id));
  return rows.map((r): ContextWindow => {
    const els = elements.get(r.id) ?? [];
    return {
      id: r.id, title: r.title, startMs: r.startsAt.getTime(), endMs: r.endsAt.getTime(), version: r.version,
      acceptedPlanId: r.acceptedPlanId, elements: els,
      spec: windowSpecOf({ id: r.id, startsAt: r.startsAt, endsAt: r.endsAt, elements: els }),
      outage: outageOf(inventory.network, els),
      slices: r.acceptedPlanId ? storedSlices(r.planResult) : [],
    };
  });
}

/** Reads the context for slots inside [fromMs, toMs]. The revision is read first, so the inventory is at least that new. */
export async function loadSlotContext(db: Queryable, fromMs: number, toMs: number): Promise<SlotContext> {
  const revision = await selectInventoryRevision(db);
  const { scenario, inventory } = await currentInventory(db);
  const [from, to] = [new Date(fromMs), new Date(toMs)];
  const freezes = (await listFreezes(db, { from, to })).map(freezeOf);
  const windows = await loadContextWindows(db, inventory, fromMs, toMs);
  const policies = await getPolicies(db);
  const names = namesOf(scenario);
  const leadDays = new Map(scenario.tenants.map((t) => [t.id, Math.max(t.noticeDays, policies.noticeLeadDays)]));
  return {
    revision, scenario, inventory, names, freezes, windows, policies, leadDays,
    baseComponents: countComponents(inventory.network),
  };
}
