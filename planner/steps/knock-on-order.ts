// Knock-on moves in the step order: a slice the window does not touch, moved to make room, completes its steps
// before any step of the touched slices it makes room for (they may need the room it frees).
import type { Inventory, SlicePlan } from '../model/types';
import type { PendingStep } from './step-list';

/** knock-on slice index → indices of the touched slices it makes room for (id form in, unknown ids skipped). */
export type MadeRoomFor = ReadonlyMap<number, readonly number[]>;

export function madeRoomForIndex(inv: Inventory, slices: readonly SlicePlan[]): Map<number, number[]> {
  const out = new Map<number, number[]>();
  for (const plan of slices) {
    const k = inv.sliceIndex.get(plan.slice);
    const touched = (plan.madeRoomFor ?? []).map((id) => inv.sliceIndex.get(id)).filter((t): t is number => t !== undefined);
    if (k !== undefined && touched.length > 0) out.set(k, touched);
  }
  return out;
}

/** Tracks which pending steps may go next: a touched slice waits until its knock-on slices' steps are done. */
export class KnockOnGate {
  private readonly waitsFor = new Map<number, number[]>();
  private readonly left = new Map<number, number>();

  constructor(private readonly madeRoomFor: MadeRoomFor, pending: readonly PendingStep[]) {
    for (const [k, touched] of madeRoomFor) {
      for (const t of touched) if (t !== k) this.waitsFor.set(t, [...(this.waitsFor.get(t) ?? []), k]);
    }
    for (const step of pending) this.left.set(step.slice, (this.left.get(step.slice) ?? 0) + 1);
  }

  isKnockOn(slice: number): boolean {
    return this.madeRoomFor.has(slice);
  }

  /** Knock-on steps first, otherwise the given order (stable). */
  sort(pending: PendingStep[]): PendingStep[] {
    return pending
      .map((step, i) => ({ step, i, rank: this.isKnockOn(step.slice) ? 0 : 1 }))
      .sort((a, b) => a.rank - b.rank || a.i - b.i)
      .map((x) => x.step);
  }

  mayGo(step: PendingStep): boolean {
    return (this.waitsFor.get(step.slice) ?? []).every((k) => (this.left.get(k) ?? 0) === 0);
  }

  done(step: PendingStep): void {
    this.left.set(step.slice, (this.left.get(step.slice) ?? 1) - 1);
  }
}
