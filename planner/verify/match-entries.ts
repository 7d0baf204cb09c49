// Matches a plan's entries to slices: unknown, duplicate, missing and extra entries, and the knock-on rules.
import type { Inventory, SlicePlan } from '../model/types';
import type { Violation } from './violation';

export interface PlanToVerify {
  affected: string[];
  slices: SlicePlan[];
}

/**
 * An entry for a slice the window does not affect is a knock-on move: allowed only when it names the affected
 * slices it makes room for, and it must really move or reroute the slice (an untouched slice is never taken out
 * of service, and 'stays' would make room for nothing).
 */
function checkKnockOn(entry: SlicePlan, affected: ReadonlySet<string>, out: Violation[]): boolean {
  const report = (code: string, message: string) => out.push({ slice: entry.slice, code, message });
  for (const target of entry.madeRoomFor ?? []) {
    if (!affected.has(target)) report('knock-on-target', `makes room for "${target}", which the window does not affect`);
  }
  if (entry.outcome === 'unresolved') {
    report('knock-on-unresolved', 'a slice the window does not affect cannot be taken out of service');
    return false;
  }
  if (entry.outcome === 'stays') report('knock-on-stays', 'a knock-on entry that stays makes no room');
  return true;
}

/**
 * Maps entries to slice indices. Entries that are dropped (unknown, duplicate, extra, or an unresolved knock-on)
 * leave their slice at its current placement, so its load still counts.
 */
export function matchEntries(inv: Inventory, plan: PlanToVerify, out: Violation[]): Map<number, SlicePlan> {
  const affected = new Set(plan.affected);
  const entries = new Map<number, SlicePlan>();
  const seen = new Set<number>();
  for (const entry of plan.slices) {
    const s = inv.sliceIndex.get(entry.slice);
    const knockOn = (entry.madeRoomFor?.length ?? 0) > 0;
    if (s === undefined) out.push({ slice: entry.slice, code: 'unknown-slice', message: `unknown slice "${entry.slice}"` });
    else if (seen.has(s)) out.push({ slice: entry.slice, code: 'duplicate-slice', message: 'more than one entry for this slice' });
    else if (affected.has(entry.slice)) {
      if (knockOn) out.push({ slice: entry.slice, code: 'knock-on-target', message: 'an affected slice is not a knock-on move' });
      entries.set(s, entry);
    } else if (!knockOn) {
      out.push({ slice: entry.slice, code: 'extra-slice', message: 'entry for a slice the window does not affect' });
    } else if (checkKnockOn(entry, affected, out)) entries.set(s, entry);
    if (s !== undefined) seen.add(s);
  }
  const present = new Set(plan.slices.map((e) => e.slice));
  for (const id of affected) {
    if (!inv.sliceIndex.has(id)) out.push({ slice: id, code: 'unknown-slice', message: `unknown affected slice "${id}"` });
    else if (!present.has(id)) out.push({ slice: id, code: 'missing-slice', message: 'affected slice has no entry' });
  }
  return entries;
}
