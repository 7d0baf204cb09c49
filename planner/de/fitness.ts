// Fitness of a candidate and its comparison by feasibility rules.
// Reference: K. Deb, "An efficient constraint handling method for genetic algorithms", CMAME 186 (2000) 311–338.

/** A candidate's quality: a lexicographic objective (smaller is better) and its total constraint violation. */
export interface Fitness {
  objective: number[];
  /** 0 when feasible; otherwise the summed, normalised amount by which constraints are broken. */
  violation: number;
}

export function isFeasible(f: Fitness): boolean {
  return f.violation <= 0;
}

/** Lexicographic comparison of two objective vectors (shorter vector ranks missing entries as equal). */
export function compareObjectiveVectors(a: readonly number[], b: readonly number[]): number {
  const n = Math.min(a.length, b.length);
  for (let i = 0; i < n; i += 1) {
    if (a[i] < b[i]) return -1;
    if (a[i] > b[i]) return 1;
  }
  return 0;
}

/**
 * Deb's three rules: a feasible candidate beats an infeasible one; two feasible ones compare by
 * objective; two infeasible ones by violation. Negative when `a` is better, 0 when equal.
 * Equal violations fall back to the objective — Deb is silent there and it only adds a tie-break.
 */
export function compareFitness(a: Fitness, b: Fitness): number {
  const aOk = isFeasible(a);
  const bOk = isFeasible(b);
  if (aOk && !bOk) return -1;
  if (!aOk && bOk) return 1;
  if (!aOk && !bOk && a.violation !== b.violation) return a.violation < b.violation ? -1 : 1;
  return compareObjectiveVectors(a.objective, b.objective);
}
