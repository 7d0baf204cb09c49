// One capacity tolerance for every planner check, so search, verification and steps never disagree.

/** Relative slack that absorbs floating-point sums (WARNING: verifyPlan and the decoder must share it). */
export const CAPACITY_TOLERANCE = 1e-9;

/** load fits within capacity up to the shared relative tolerance. */
export function fits(load: number, capacity: number): boolean {
  return load <= capacity + CAPACITY_TOLERANCE * Math.max(1, Math.abs(capacity));
}
