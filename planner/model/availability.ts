// Availability arithmetic for elements, paths and windows.
// Reference: ITU-T E.800 (definition of availability); series/parallel and exponential failure model are common practice.

export const HOURS_PER_YEAR = 8760;

/** Steady-state availability A = MTBF / (MTBF + MTTR). */
export function availability(mtbfHours: number, mttrHours: number): number {
  return mtbfHours / (mtbfHours + mttrHours);
}

/** Elements in series all have to work: A = Π Aᵢ (1 for an empty path). */
export function seriesAvailability(as: readonly number[]): number {
  let product = 1;
  for (const a of as) product *= a;
  return product;
}

/** Redundant elements in parallel fail only together: A = 1 − Π (1 − Aᵢ). */
export function parallelAvailability(as: readonly number[]): number {
  let allDown = 1;
  for (const a of as) allDown *= 1 - a;
  return 1 - allDown;
}

/** P(at least one failure within `hours`) with a constant failure rate λ = 1 / MTBF. */
export function failureProbability(hours: number, mtbfHours: number): number {
  if (!(mtbfHours > 0) || !Number.isFinite(mtbfHours)) return 0;
  // -expm1 keeps precision for the tiny probabilities of short windows.
  return -Math.expm1(-hours / mtbfHours);
}

/** Expected downtime in minutes over an 8760-hour year. */
export function downtimeMinutesPerYear(a: number): number {
  return (1 - a) * HOURS_PER_YEAR * 60;
}
