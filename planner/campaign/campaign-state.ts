// A schedule being built or searched: each group's slot, the windows per night and the objective, with the rule
// checks the constructive start and the local search share.
import type { CompiledCampaign } from './compile-campaign';
import { slotsOverlap, touchesTooClose } from './compile-campaign';
import { UNSCHEDULED_PENALTY } from './types';

export const UNSCHEDULED = -1;

/** What keeps a group out of one slot, given everything else as placed. */
export interface SlotBlockers {
  /** the night already holds maxPerNight windows of other groups */
  nightFull: boolean;
  /** groups touching a shared slice less than minDays away */
  spacing: number[];
  /** groups that must not overlap and do */
  clash: number[];
}

export class CampaignState {
  readonly assign: Int32Array;
  readonly nightCount: Int32Array;

  constructor(readonly c: CompiledCampaign) {
    this.assign = new Int32Array(c.groupCount).fill(UNSCHEDULED);
    this.nightCount = new Int32Array(c.nights.length);
  }

  place(g: number, s: number): void {
    this.unplace(g);
    this.assign[g] = s;
    this.nightCount[this.c.night[g][s]]++;
  }

  unplace(g: number): void {
    const s = this.assign[g];
    if (s === UNSCHEDULED) return;
    this.nightCount[this.c.night[g][s]]--;
    this.assign[g] = UNSCHEDULED;
  }

  /** The cost of group g where it is: its slot's cost, or the penalty when unscheduled. */
  costOf(g: number): number {
    const s = this.assign[g];
    return s === UNSCHEDULED ? UNSCHEDULED_PENALTY : this.c.cost[g][s];
  }

  /** The objective summed afresh in group order (the same order the final figures use). */
  objective(): number {
    let windows = 0;
    let unscheduled = 0;
    for (let g = 0; g < this.c.groupCount; g++) {
      const s = this.assign[g];
      if (s === UNSCHEDULED) unscheduled++;
      else windows += this.c.cost[g][s];
    }
    return windows + UNSCHEDULED_PENALTY * unscheduled;
  }

  /** Whether group g may take slot s with every other group as placed (g's own current slot does not count). */
  canPlace(g: number, s: number): boolean {
    const { c, assign } = this;
    const night = c.night[g][s];
    const own = assign[g] !== UNSCHEDULED && c.night[g][assign[g]] === night ? 1 : 0;
    if (this.nightCount[night] - own >= c.maxPerNight) return false;
    if (c.minDays > 0) {
      const day = c.day[g][s];
      for (const h of c.touchNeighbours[g]) {
        const a = assign[h];
        if (a !== UNSCHEDULED && touchesTooClose(c.day[h][a], day, c.minDays)) return false;
      }
    }
    const slots = c.problem.groups;
    for (const h of c.clashNeighbours[g]) {
      const a = assign[h];
      if (a !== UNSCHEDULED && slotsOverlap(slots[g].slots[s], slots[h].slots[a])) return false;
    }
    return true;
  }

  /** Every reason g cannot take s (empty lists and nightFull false when it can). */
  blockers(g: number, s: number): SlotBlockers {
    const { c, assign } = this;
    const night = c.night[g][s];
    const own = assign[g] !== UNSCHEDULED && c.night[g][assign[g]] === night ? 1 : 0;
    const spacing: number[] = [];
    const clash: number[] = [];
    if (c.minDays > 0) {
      for (const h of c.touchNeighbours[g]) {
        const a = assign[h];
        if (a !== UNSCHEDULED && touchesTooClose(c.day[h][a], c.day[g][s], c.minDays)) spacing.push(h);
      }
    }
    const groups = c.problem.groups;
    for (const h of c.clashNeighbours[g]) {
      const a = assign[h];
      if (a !== UNSCHEDULED && slotsOverlap(groups[g].slots[s], groups[h].slots[a])) clash.push(h);
    }
    return { nightFull: this.nightCount[night] - own >= c.maxPerNight, spacing, clash };
  }

  /** Groups placed on night id `night`, other than g. */
  groupsOnNight(night: number, except: number): number[] {
    const out: number[] = [];
    for (let h = 0; h < this.c.groupCount; h++) {
      const a = this.assign[h];
      if (h !== except && a !== UNSCHEDULED && this.c.night[h][a] === night) out.push(h);
    }
    return out;
  }

  snapshot(): Int32Array {
    return this.assign.slice();
  }

  restore(snap: Int32Array): void {
    for (let g = 0; g < this.c.groupCount; g++) this.unplace(g);
    for (let g = 0; g < this.c.groupCount; g++) if (snap[g] !== UNSCHEDULED) this.place(g, snap[g]);
  }
}
