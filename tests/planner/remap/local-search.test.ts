// The memetic local search (ejection chains + cost climb) and the partial decodes it relies on (generated, invented scenario).
import { compareFitness } from '../../../planner/de/fitness';
import { buildScenario } from '../../../scenarios/generate/scenario-builder';
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { greedyPlan } from '../../../planner/greedy/greedy-plan';
import { createRng } from '../../../planner/random/rng';
import { createDecoder } from '../../../planner/remap/decoder';
import { localSearch } from '../../../planner/remap/local-search';
import { buildRemapProblem } from '../../../planner/remap/problem';
import { perturbedSeeds } from '../../../planner/remap/seeding';

const sc = buildScenario({ sites: 30, slices: 150, seed: 7 });
const inv = buildInventory(sc);
const problem = buildRemapProblem(inv, compileWindow(sc.windows![0]));

describe('localSearch', () => {
  it('evaluateFrom equals a full evaluate when only the listed blocks changed (order keys included)', () => {
    const decoder = createDecoder(problem);
    const base = greedyPlan(problem).genes;
    const others = perturbedSeeds(problem, [base], 8, createRng(5));
    expect(problem.slices.length).toBeGreaterThan(2);
    for (const other of others) {
      const genesOf = (b: number) => {
        const s = problem.slices[b];
        return [s.keepGene, s.orderGene, ...s.functions.map((k) => problem.functions[k].gene), ...s.ties.map((k) => problem.ties[k].gene)].filter((j) => j >= 0);
      };
      const changed = problem.slices.map((_s, b) => b).filter((b) => genesOf(b).some((j) => other[j] !== base[j]));
      if (changed.length === 0) continue;
      decoder.evaluateSaving(base);
      expect(decoder.evaluateFrom(other, changed)).toEqual(decoder.evaluate(other));
    }
  });

  it('never ends worse than its start, stays within bounds and is deterministic', () => {
    const decoder = createDecoder(problem);
    for (const start of perturbedSeeds(problem, [greedyPlan(problem).genes], 4, createRng(9))) {
      const a = localSearch(problem, decoder, start, 400);
      const b = localSearch(problem, decoder, start, 400);
      expect(compareFitness(a.fitness, decoder.evaluate(start))).toBeLessThanOrEqual(0);
      expect(decoder.evaluate(a.genes)).toEqual(a.fitness);
      expect(b.genes).toEqual(a.genes);
      expect(a.evaluations).toBeLessThanOrEqual(400 + 2 * problem.slices.length);
      a.genes.forEach((v, j) => {
        expect(v).toBeGreaterThanOrEqual(problem.lower[j]);
        expect(v).toBeLessThan(problem.upper[j]);
      });
    }
  });
});
