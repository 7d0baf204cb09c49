// Incremental evaluation (Decoder.evaluateLogged against a parent's log) gives exactly the fitness of a full
// decode, on generated and scarce real-shape instances, for trials that re-draw slices, change single genes or
// reorder blocks — and DE with it follows the same trajectory as DE without it.
import fc from 'fast-check';
import { runDE } from '../../../planner/de/differential-evolution';
import { greedyPlan } from '../../../planner/greedy/greedy-plan';
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { createRng } from '../../../planner/random/rng';
import { createDecoder, stayPutGenes, toDEProblem, type DecodeLog } from '../../../planner/remap/decoder';
import { buildRemapProblem, type RemapProblem } from '../../../planner/remap/problem';
import { perturbedSeeds } from '../../../planner/remap/seeding';
import { buildRealShapeScenario } from '../../../scenarios/generate/real-shape-scenario';
import { buildScenario } from '../../../scenarios/generate/scenario-builder';

const problems = new Map<string, RemapProblem | null>();

/** A window's problem with at least two blocks, or null (cached: the same instance serves several runs). */
function problemFor(kind: 'waxman' | 'real-shape', seed: number, knockOn: boolean): RemapProblem | null {
  const key = `${kind}|${seed}|${knockOn}`;
  if (!problems.has(key)) {
    const options = knockOn ? { knockOn: { maxMoves: 2 } } : {};
    let problem: RemapProblem | null = null;
    if (kind === 'waxman') {
      const sc = buildScenario({ sites: 25, slices: 120, seed, windows: 3 });
      const inv = buildInventory(sc);
      for (const w of sc.windows ?? []) {
        const p = buildRemapProblem(inv, compileWindow(w), options);
        if (p.slices.length >= 2) { problem = p; break; }
      }
    } else {
      const r = buildRealShapeScenario({ sites: 30, slices: 80, seed });
      const p = buildRemapProblem(buildInventory(r.scenario), compileWindow(r.window), options);
      problem = p.slices.length >= 2 ? p : null;
    }
    problems.set(key, problem);
  }
  return problems.get(key)!;
}

const caseArb = fc.record({
  kind: fc.constantFrom('waxman' as const, 'real-shape' as const),
  seed: fc.integer({ min: 1, max: 6 }),
  knockOn: fc.boolean(),
  rngSeed: fc.integer({ min: 1, max: 1_000_000 }),
  /** trials in a chain, each made from the previous one */
  steps: fc.array(fc.record({
    redrawn: fc.integer({ min: 0, max: 4 }),
    /** single genes set to a random value in their range (order keys included) */
    genes: fc.array(fc.tuple(fc.nat(), fc.double({ min: 0, max: 1, noNaN: true })), { maxLength: 6 }),
  }), { minLength: 1, maxLength: 5 }),
});

function trialOf(problem: RemapProblem, parent: Float64Array, step: { redrawn: number; genes: [number, number][] }, seed: number): Float64Array {
  const trial = step.redrawn > 0 ? perturbedSeeds(problem, [parent], 1, createRng(seed), step.redrawn)[0] : Float64Array.from(parent);
  for (const [j, u] of step.genes) {
    const g = j % problem.dimension;
    trial[g] = Math.min(problem.upper[g] - 1e-9, problem.lower[g] + u * (problem.upper[g] - problem.lower[g]));
  }
  return trial;
}

describe('incremental evaluation', () => {
  it('evaluateLogged against a parent log equals a full evaluate, along chains of trials', () => {
    let compared = 0;
    fc.assert(fc.property(caseArb, (c) => {
      const problem = problemFor(c.kind, c.seed, c.knockOn);
      if (problem === null) return;
      const full = createDecoder(problem);
      const incremental = createDecoder(problem);
      let genes = c.rngSeed % 2 === 0 ? greedyPlan(problem).genes : stayPutGenes(problem);
      let log: DecodeLog = incremental.evaluateLogged(genes, null).log;
      c.steps.forEach((step, i) => {
        const trial = trialOf(problem, genes, step, c.rngSeed + i);
        const r = incremental.evaluateLogged(trial, log);
        expect(r.fitness).toEqual(full.evaluate(trial));
        compared += 1;
        genes = trial;
        log = r.log;
      });
    }), { numRuns: 60 });
    expect(compared).toBeGreaterThan(0);
  });

  it('replays every block of an unchanged genome from the parent log (the log is used, not ignored)', () => {
    const problem = problemFor('real-shape', 2, true) ?? problemFor('waxman', 1, false)!;
    const decoder = createDecoder(problem);
    const genes = greedyPlan(problem).genes;
    const first = decoder.evaluateLogged(genes, null);
    const again = decoder.evaluateLogged(Float64Array.from(genes), first.log);
    expect(again.fitness).toEqual(first.fitness);
    expect(again.log.records.every((r, b) => r === first.log.records[b])).toBe(true);
  });

  it('a block whose own genes changed is decoded again, not replayed', () => {
    const problem = problemFor('waxman', 1, false)!;
    const decoder = createDecoder(problem);
    const genes = stayPutGenes(problem);
    const first = decoder.evaluateLogged(genes, null);
    const block = problem.slices[problem.slices.length - 1];
    const trial = Float64Array.from(genes);
    trial[problem.functions[block.functions[0]].gene] = problem.upper[problem.functions[block.functions[0]].gene] - 0.01;
    const again = decoder.evaluateLogged(trial, first.log);
    expect(again.log.records[problem.slices.length - 1]).not.toBe(first.log.records[problem.slices.length - 1]);
    expect(again.fitness).toEqual(decoder.evaluate(trial));
  });

  it('DE with incremental trials follows the same trajectory as DE with full decodes', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: 6 }), fc.boolean(), fc.integer({ min: 1, max: 1000 }), (seed, knockOn, deSeed) => {
      const problem = problemFor('real-shape', seed, knockOn);
      if (problem === null) return;
      const seeds = [greedyPlan(problem).genes, stayPutGenes(problem)];
      const options = { population: 8, F: 0.5, CR: 0.1, generations: 6 };
      const plain = runDE(toDEProblem(problem), options, createRng(deSeed), seeds);
      const fast = runDE(toDEProblem(problem, createDecoder(problem), { incremental: true }), options, createRng(deSeed), seeds);
      expect(fast.trace).toEqual(plain.trace);
      expect(Array.from(fast.best)).toEqual(Array.from(plain.best));
    }), { numRuns: 8 });
  });
});
