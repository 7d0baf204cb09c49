// DE/rand/1/bin on test functions with known minima and on Deb's constrained problem.
// Sources: Storn & Price 1997 (memory, operator definition); SFU virtual library (confirmed, minima and
// function values); Deb 2000 test problem 1 (secondary, optimum (2.246826, 2.381865), f ≈ 13.5908).
import { runDE, checkDEOptions } from '../../../planner/de/differential-evolution';
import { InvalidOptionError } from '../../../planner/errors';
import { createRng } from '../../../planner/random/rng';
import { boxProblem, debProblem1, rastrigin, rosenbrock, sphere } from './test-functions';

describe('test function values (SFU virtual library, confirmed)', () => {
  it('Rastrigin 2-D: f(1,0) = 1, f(0.5,0) = 20.25, f(0,0) = 0', () => {
    expect(rastrigin(new Float64Array([1, 0]))).toBeCloseTo(1, 12);
    expect(rastrigin(new Float64Array([0.5, 0]))).toBeCloseTo(20.25, 12);
    expect(rastrigin(new Float64Array([0, 0]))).toBe(0);
  });
  it('Rosenbrock is 0 at (1,1) and sphere is 0 at the origin', () => {
    expect(rosenbrock(new Float64Array([1, 1]))).toBe(0);
    expect(sphere(new Float64Array(5))).toBe(0);
  });
});

describe('runDE', () => {
  it('reaches the sphere minimum 0 in 5-D within 1e-6', () => {
    const r = runDE(boxProblem(sphere, 5, -5.12, 5.12), { population: 30, F: 0.5, CR: 0.9, generations: 600 }, createRng(1));
    expect(r.fitness.objective[0]).toBeLessThan(1e-6);
    for (const v of r.best) expect(Math.abs(v)).toBeLessThan(1e-3);
  });

  it('finds the Rosenbrock minimum (1,1) in 2-D within 1e-4', () => {
    const r = runDE(boxProblem(rosenbrock, 2, -5, 10), { population: 30, F: 0.5, CR: 0.9, generations: 800 }, createRng(2));
    expect(Math.abs(r.best[0] - 1)).toBeLessThan(1e-4);
    expect(Math.abs(r.best[1] - 1)).toBeLessThan(1e-4);
  });

  it('reaches the Rastrigin minimum 0 in 2-D within 1e-3 on a budget of 40 × 300 evaluations', () => {
    const r = runDE(boxProblem(rastrigin, 2, -5.12, 5.12), { population: 40, F: 0.5, CR: 0.9, generations: 300 }, createRng(3));
    expect(r.evaluations).toBeLessThanOrEqual(40 * 301);
    expect(r.fitness.objective[0]).toBeLessThan(1e-3);
  });

  it("solves Deb's test problem 1 to within 1e-2 of (2.246826, 2.381865), f ≈ 13.5908", () => {
    const r = runDE(debProblem1(), { population: 40, F: 0.5, CR: 0.9, generations: 400 }, createRng(4));
    expect(r.fitness.violation).toBe(0);
    expect(Math.abs(r.best[0] - 2.246826)).toBeLessThan(1e-2);
    expect(Math.abs(r.best[1] - 2.381865)).toBeLessThan(1e-2);
    expect(Math.abs(r.fitness.objective[0] - 13.5908)).toBeLessThan(1e-2);
  });

  it('is deterministic for a seed and differs for another seed', () => {
    const opts = { population: 12, F: 0.7, CR: 0.5, generations: 20 };
    const a = runDE(boxProblem(rastrigin, 3, -5.12, 5.12), opts, createRng(7));
    const b = runDE(boxProblem(rastrigin, 3, -5.12, 5.12), opts, createRng(7));
    const c = runDE(boxProblem(rastrigin, 3, -5.12, 5.12), opts, createRng(8));
    expect(Array.from(a.best)).toEqual(Array.from(b.best));
    expect(a.trace).toEqual(b.trace);
    expect(Array.from(c.best)).not.toEqual(Array.from(a.best));
  });

  it('never lets the best fitness get worse (greedy selection) and keeps trials in bounds', () => {
    const seen: number[] = [];
    const problem = boxProblem(sphere, 4, -1, 1);
    const inner = problem.evaluate;
    problem.evaluate = (x) => {
      for (const v of x) if (v < -1 || v > 1) throw new Error(`out of bounds: ${v}`);
      return inner(x);
    };
    runDE(problem, { population: 10, F: 1.8, CR: 1, generations: 50, onGeneration: (_g, f) => seen.push(f.objective[0]) }, createRng(5));
    expect(seen).toHaveLength(51);
    for (let i = 1; i < seen.length; i += 1) expect(seen[i]).toBeLessThanOrEqual(seen[i - 1]);
  });

  it('keeps a seed member that is already optimal', () => {
    const r = runDE(boxProblem(sphere, 3, -5, 5), { population: 8, F: 0.5, CR: 0.9, generations: 3 }, createRng(9), [new Float64Array(3)]);
    expect(r.fitness.objective[0]).toBe(0);
  });

  it('stops on the stall limit and on the time limit of an injected clock', () => {
    const flat = boxProblem(() => 1, 2, 0, 1);
    const stalled = runDE(flat, { population: 6, F: 0.5, CR: 0.9, generations: 100, stallGenerations: 5 }, createRng(1));
    expect(stalled.generations).toBe(5);
    let t = 0;
    const timed = runDE(flat, { population: 6, F: 0.5, CR: 0.9, generations: 100, timeLimitMs: 30, now: () => (t += 2) }, createRng(1));
    expect(timed.generations).toBeLessThan(100);
    expect(timed.generations).toBeGreaterThan(0);
  });

  it('says why it stopped: the stall limit, the generation budget or the time limit', () => {
    const flat = boxProblem(() => 1, 2, 0, 1);
    const options = { population: 6, F: 0.5, CR: 0.9 };
    expect(runDE(flat, { ...options, generations: 100, stallGenerations: 5 }, createRng(1)).stoppedBy).toBe('stall');
    // A generous time limit the run never reaches does not count.
    let t = 0;
    const budget = runDE(flat, { ...options, generations: 4, stallGenerations: 5, timeLimitMs: 1e9, now: () => (t += 1) }, createRng(1));
    expect(budget).toMatchObject({ generations: 4, stoppedBy: 'generations' });
    t = 0;
    expect(runDE(flat, { ...options, generations: 100, timeLimitMs: 30, now: () => (t += 2) }, createRng(1)).stoppedBy).toBe('time');
    // Cut short while evaluating the first population: time as well.
    t = 0;
    expect(runDE(flat, { ...options, generations: 100, timeLimitMs: 30, now: () => (t += 10) }, createRng(1))).toMatchObject({ generations: 0, stoppedBy: 'time' });
  });

  it('evaluates the first population within the time limit too, leaving the rest unevaluated', () => {
    let t = 0;
    let evaluated = 0;
    const counted = { ...boxProblem(sphere, 2, -1, 1) };
    const evaluate = counted.evaluate;
    counted.evaluate = (x) => { evaluated += 1; return evaluate(x); };
    const r = runDE(counted, { population: 10, F: 0.5, CR: 0.9, generations: 100, timeLimitMs: 30, now: () => (t += 10) }, createRng(1));
    expect(r.generations).toBe(0);
    expect(r.evaluations).toBe(evaluated);
    expect(evaluated).toBeLessThan(10);
    expect(r.fitness.violation).toBe(0);
  });

  it('rejects F, CR and population outside their ranges', () => {
    expect(() => checkDEOptions({ population: 10, F: 2.5, CR: 0.5, generations: 1 })).toThrow(InvalidOptionError);
    expect(() => checkDEOptions({ population: 10, F: 0.5, CR: 1.5, generations: 1 })).toThrow(InvalidOptionError);
    expect(() => checkDEOptions({ population: 3, F: 0.5, CR: 0.5, generations: 1 })).toThrow(InvalidOptionError);
  });
});
