// Conflicts of windows with every other active window overlapping them in time, computed on read so that
// counts are right for seeded, booked and edited windows alike (and after a network change).
import { countComponents } from '../../../planner/impact/bridges';
import type { Inventory } from '../../../planner/model/types';
import type { WindowConflict } from '../../../shared/window-impact';
import { ACTIVE_WINDOW_STATUSES, type WindowStatus } from '../../../shared/windows';
import {
  selectActiveOverlapping, selectElementsByWindow, selectWindowRows, type ElementRow,
} from '../../queries/windows/window-rows';
import type { Queryable } from '../../../db/client';
import { currentInventory } from '../inventory/inventory-cache';
import { conflictReasonWords, namesOf } from '../slots/slot-words';
import { outageOf, pairConflictReasons, type Outage } from './pair-conflicts';

export type ConflictSubject = { id: string; title: string; startsAt: Date; endsAt: Date; status: string; elements: ElementRow[] };

const isActive = (status: string) => ACTIVE_WINDOW_STATUSES.includes(status as WindowStatus);
const overlaps = (a: ConflictSubject, b: ConflictSubject) => a.startsAt < b.endsAt && b.startsAt < a.endsAt;

async function overlappingOthers(db: Queryable, subjects: ConflictSubject[]): Promise<ConflictSubject[]> {
  const from = new Date(Math.min(...subjects.map((w) => w.startsAt.getTime())));
  const to = new Date(Math.max(...subjects.map((w) => w.endsAt.getTime())));
  const rows = await selectActiveOverlapping(db, from, to, ACTIVE_WINDOW_STATUSES);
  const elements = await selectElementsByWindow(db, rows.map((r) => r.id));
  return rows.map((r) => ({ ...r, elements: elements.get(r.id) ?? [] }));
}

/** Keeps what a tenant user may see: conflicts with windows visible to it, and only its own stranded slices. */
async function scopeConflicts(
  db: Queryable, inv: Inventory, byWindow: Map<string, WindowConflict[]>, tenantId: string,
): Promise<void> {
  const otherIds = [...new Set([...byWindow.values()].flat().map((c) => c.window.id))];
  const visible = new Set((await selectWindowRows(db, { ids: otherIds, scopeTenant: tenantId })).map((r) => r.id));
  const own = (slice: string) => inv.slices[inv.sliceIndex.get(slice) ?? -1]?.tenant === tenantId;
  for (const [id, list] of byWindow) {
    const scoped = list.filter((c) => visible.has(c.window.id)).map((c) => ({
      ...c,
      reasons: c.reasons.flatMap((r) => {
        if (r.reason !== 'strands-slice') return [r];
        const ids = r.ids.filter(own);
        return ids.length > 0 ? [{ ...r, ids }] : [];
      }),
    })).filter((c) => c.reasons.length > 0);
    byWindow.set(id, scoped);
  }
}

/** Conflicts per subject window (withdrawn/finished windows have none); `scopeTenant` trims them for tenants. */
export async function conflictsByWindow(
  db: Queryable, subjects: ConflictSubject[], scopeTenant: string | null,
): Promise<Map<string, WindowConflict[]>> {
  const byWindow = new Map<string, WindowConflict[]>(subjects.map((w) => [w.id, []]));
  const active = subjects.filter((w) => isActive(w.status));
  if (active.length === 0) return byWindow;
  const others = await overlappingOthers(db, active);
  const pairs = active.flatMap((w) => others.filter((o) => o.id !== w.id && overlaps(w, o)).map((o) => [w, o] as const));
  if (pairs.length === 0) return byWindow;
  const { inventory: inv } = await currentInventory(db);
  const base = countComponents(inv.network);
  const outages = new Map<string, Outage>();
  const outage = (w: ConflictSubject) => {
    if (!outages.has(w.id)) outages.set(w.id, outageOf(inv.network, w.elements));
    return outages.get(w.id)!;
  };
  for (const [w, o] of pairs) {
    const reasons = pairConflictReasons(inv, { elements: w.elements, outage: outage(w) }, { elements: o.elements, outage: outage(o) }, base);
    if (reasons.length === 0) continue;
    byWindow.get(w.id)!.push({
      window: { id: o.id, title: o.title, startsAt: o.startsAt.toISOString(), endsAt: o.endsAt.toISOString(), status: o.status },
      reasons,
    });
  }
  if (scopeTenant !== null) await scopeConflicts(db, inv, byWindow, scopeTenant);
  return byWindow;
}

/**
 * One window's conflicts as the conflicts route answers them: each reason's message in names (the ids stay in
 * `ids` for the screens). Lists and details need only the counts, so only this reader pays for the names.
 */
export async function namedConflictsOf(db: Queryable, w: ConflictSubject): Promise<WindowConflict[]> {
  const list = (await conflictsByWindow(db, [w], null)).get(w.id) ?? [];
  if (list.length === 0) return list;
  const names = namesOf((await currentInventory(db)).scenario);
  return list.map((c) => ({
    ...c,
    reasons: c.reasons.map((r) => {
      const words = conflictReasonWords(r, names);
      return { ...r, message: `${words.charAt(0).toUpperCase()}${words.slice(1)}.` };
    }),
  }));
}
