// Benchmark functions with known minima for the DE tests.
// Source: SFU virtual library of simulation experiments (confirmed, per REFERENCES.md).
import type { DEProblem, Fitness } from '../../../planner/de/differential-evolution';

export function sphere(x: Float64Array): number {
  let s = 0;
  for (let i = 0; i < x.length; i += 1) s += x[i] * x[i];
  return s;
}

export function rastrigin(x: Float64Array): number {
  let s = 10 * x.length;
  for (let i = 0; i < x.length; i += 1) s += x[i] * x[i] - 10 * Math.cos(2 * Math.PI * x[i]);
  return s;
}

export function rosenbrock(x: Float64Array): number {
  let s = 0;
  for (let i = 0; i + 1 < x.length; i += 1) s += 100 * (x[i + 1] - x[i] * x[i]) ** 2 + (1 - x[i]) ** 2;
  return s;
}

/** An unconstrained problem on the box [lo, hi]^d. */
export function boxProblem(f: (x: Float64Array) => number, d: number, lo: number, hi: number): DEProblem {
  return {
    dimension: d,
    lower: new Float64Array(d).fill(lo),
    upper: new Float64Array(d).fill(hi),
    evaluate: (x): Fitness => ({ objective: [f(x)], violation: 0 }),
  };
}

/**
 * Deb's test problem 1, constrained Himmelblau (Deb 2000, secondary per REFERENCES.md):
 * f = (x²+y−11)² + (x+y²−7)², g1 = 4.84 − (x−0.05)² − (y−2.5)² ≥ 0, g2 = x² + (y−2.5)² − 4.84 ≥ 0.
 */
export function debProblem1(): DEProblem {
  return {
    dimension: 2,
    lower: new Float64Array([0, 0]),
    upper: new Float64Array([6, 6]),
    evaluate: (v): Fitness => {
      const [x, y] = v;
      const f = (x * x + y - 11) ** 2 + (x + y * y - 7) ** 2;
      const g1 = 4.84 - (x - 0.05) ** 2 - (y - 2.5) ** 2;
      const g2 = x * x + (y - 2.5) ** 2 - 4.84;
      return { objective: [f], violation: Math.max(0, -g1) + Math.max(0, -g2) };
    },
  };
}
