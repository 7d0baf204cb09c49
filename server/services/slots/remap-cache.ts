// Quick re-map answers kept per process: a slot on the same network state as an earlier one (same inventory
// revision, same elements out, same overlapping windows at the same versions with the same accepted plans, same
// limit) gets the same answer, so it is computed once and reused, within one search and across searches.
import type { Inventory, SlicePlan } from '../../../planner/model/types';

/** How many network states the process remembers; least recently used goes first. */
export const REMAP_CACHE_ENTRIES = 64;

export type RemapAnswer = {
  /** the plan's slices (affected ones and knock-on moves), in the planner's id form */
  slices: SlicePlan[];
  affected: string[];
  /**
   * why the re-map's search ended (planner PlanResult.stoppedBy): 'time' when the safety cap cut it short, so the
   * answer depends on the machine's speed and load; absent when the re-map had nothing to search
   */
  stoppedBy?: 'generations' | 'stall' | 'time';
  /** generations the search evolved */
  generations?: number;
};

export type RemapKeyParts = {
  revision: number;
  sites: readonly string[];
  spans: readonly string[];
  /** the overlapping windows: id, version and accepted plan id (null without one) */
  windows: readonly { id: string; version: number; acceptedPlanId: string | null }[];
  limitMs: number;
};

const sorted = (xs: readonly string[]) => [...xs].sort();

export function remapKey(p: RemapKeyParts): string {
  const windows = sorted(p.windows.map((w) => `${w.id}@${w.version}#${w.acceptedPlanId ?? '-'}`));
  return JSON.stringify([p.revision, sorted(p.sites), sorted(p.spans), windows, p.limitMs]);
}

type Entry = { inventory: Inventory; answer: RemapAnswer };

export class RemapCache {
  private readonly entries = new Map<string, Entry>();
  constructor(private readonly capacity = REMAP_CACHE_ENTRIES) {}

  get size(): number {
    return this.entries.size;
  }

  /** The answer for `key`, if it was computed on this very inventory (a rebuilt one is a different state). */
  get(key: string, inventory: Inventory): RemapAnswer | null {
    const entry = this.entries.get(key);
    if (!entry || entry.inventory !== inventory) return null;
    this.entries.delete(key);
    this.entries.set(key, entry);
    return entry.answer;
  }

  set(key: string, inventory: Inventory, answer: RemapAnswer): void {
    this.entries.delete(key);
    this.entries.set(key, { inventory, answer });
    while (this.entries.size > this.capacity) this.entries.delete(this.entries.keys().next().value!);
  }

  clear(): void {
    this.entries.clear();
  }
}

/** The process's cache, shared by every search and campaign. */
export const processRemapCache = new RemapCache();
