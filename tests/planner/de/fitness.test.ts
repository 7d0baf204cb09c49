// Deb's feasibility rules (K. Deb 2000, CMAME 186:311–338; secondary per REFERENCES.md).
import { compareFitness } from '../../../planner/de/differential-evolution';

describe('compareFitness (Deb 2000 rules)', () => {
  it('rule 1: a feasible candidate beats an infeasible one, whatever the objectives', () => {
    const feasible = { objective: [1000], violation: 0 };
    const infeasible = { objective: [0], violation: 0.001 };
    expect(compareFitness(feasible, infeasible)).toBeLessThan(0);
    expect(compareFitness(infeasible, feasible)).toBeGreaterThan(0);
  });
  it('rule 2: two feasible candidates compare by objective, lexicographically', () => {
    expect(compareFitness({ objective: [1, 9], violation: 0 }, { objective: [2, 0], violation: 0 })).toBeLessThan(0);
    expect(compareFitness({ objective: [1, 9], violation: 0 }, { objective: [1, 3], violation: 0 })).toBeGreaterThan(0);
    expect(compareFitness({ objective: [1, 3], violation: 0 }, { objective: [1, 3], violation: 0 })).toBe(0);
  });
  it('rule 3: two infeasible candidates compare by violation, ignoring a better objective', () => {
    expect(compareFitness({ objective: [100], violation: 1 }, { objective: [0], violation: 2 })).toBeLessThan(0);
    expect(compareFitness({ objective: [0], violation: 2 }, { objective: [100], violation: 1 })).toBeGreaterThan(0);
  });
});
