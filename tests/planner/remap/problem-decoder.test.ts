// The re-mapping problem's candidate lists and genome, and the decoder's bookkeeping (invented data).
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { greedyPlan } from '../../../planner/greedy/greedy-plan';
import { evaluatePlan } from '../../../planner/plan/evaluate-plan';
import { createDecoder, decode, genesFromPlacement, stayPutGenes } from '../../../planner/remap/decoder';
import { buildRemapProblem } from '../../../planner/remap/problem';
import { buildScenario } from '../../../scenarios/generate/scenario-builder';
import { scenarioWith, tinyNetwork, tinyScenario, window } from '../fixtures/tiny-scenario';

function tiny(windowId: string, opts = {}) {
  const sc = tinyScenario();
  const inv = buildInventory(sc);
  const w = compileWindow(sc.windows!.find((x) => x.id === windowId)!);
  return { inv, w, problem: buildRemapProblem(inv, w, opts) };
}

describe('buildRemapProblem', () => {
  it('lays out per slice a keep gene, an order key, one gene per function and one per tie, in priority order', () => {
    const { inv, problem } = tiny('w-site-b');
    expect(problem.slices.map((b) => inv.slices[b.slice].id)).toEqual(['s-transit', 's-hosted']);
    const size = (b: number) => 2 + inv.slices[problem.slices[b].slice].functions.length + inv.slices[problem.slices[b].slice].ties.length;
    expect(problem.dimension).toBe(size(0) + size(1));
    expect(problem.slices[0].keepGene).toBe(0);
    expect(problem.slices[0].orderGene).toBe(1);
    expect(problem.slices[1].keepGene).toBe(size(0));
    expect(problem.upper[0]).toBe(1);
    expect(problem.upper[1]).toBe(1);
    for (const t of problem.ties) expect(problem.upper[t.gene]).toBe(problem.kPaths);
    expect(problem.slices.every((b) => b.touched)).toBe(true);
  });

  it('puts the current site first when usable, never offers a down site, and gives fixed functions one site', () => {
    const { inv, problem } = tiny('w-site-b');
    const B = inv.network.siteIndex.get('B')!;
    for (const f of problem.functions) {
      expect(Array.from(f.candidates)).not.toContain(B);
      const current = inv.placements[f.slice].sites[f.fn];
      if (current !== B) expect(f.candidates[0]).toBe(current);
      if (inv.slices[f.slice].functions[f.fn].fixed) expect(f.candidates).toHaveLength(1);
    }
  });

  it('honours maxCandidates, excluded sites and pinned functions', () => {
    const { inv, problem } = tiny('w-site-b', { maxCandidates: 2, excludedSites: ['C'], pinned: ['s-hosted/app'] });
    const C = inv.network.siteIndex.get('C')!;
    for (const f of problem.functions) {
      expect(f.candidates.length).toBeLessThanOrEqual(2);
      expect(Array.from(f.candidates)).not.toContain(C);
    }
    const app = problem.functions.find((f) => inv.slices[f.slice].id === 's-hosted' && f.fn === 1)!;
    expect(Array.from(app.candidates)).toEqual([inv.network.siteIndex.get('A')]);
  });

  it('residual capacity excludes the affected slices but counts everyone else', () => {
    const { inv, problem } = tiny('w-site-b');
    const D = inv.network.siteIndex.get('D')!;
    expect(problem.residualCpu[D]).toBe(40 - 3); // s-quiet's d1 stays on D
    expect(problem.residualCpu[inv.network.siteIndex.get('B')!]).toBe(0);
  });
});

describe('decode', () => {
  it('stay-put genes reroute a slice whose span goes down instead of moving it', () => {
    const { inv, problem } = tiny('w-span-ab');
    const d = decode(problem, stayPutGenes(problem));
    expect(d.fitness.violation).toBe(0);
    for (const [s, p] of d.next) expect(p!.sites).toEqual(inv.placements[s].sites);
    expect(d.objective.rerouted).toBe(2);
    expect(d.objective.moveCost).toBeCloseTo(0.5, 12);
  });

  it('a keep gene below 0.5 leaves the slice out with its priority weight and no resources', () => {
    const { problem } = tiny('w-site-b');
    const genes = stayPutGenes(problem);
    genes[problem.slices[0].keepGene] = 0.1; // s-transit, priority 1 → weight 5
    const d = decode(problem, genes);
    expect(d.next.get(problem.slices[0].slice)).toBeNull();
    expect(d.objective.unresolvedWeight).toBe(5);
  });

  it('leaves a touched slice that cannot be placed whole unresolved, taking back what it had claimed', () => {
    const { inv, problem } = tiny('w-site-b');
    expect(decode(problem, stayPutGenes(problem)).objective.unresolved).toBe(0);
    problem.residualCpu.fill(0); // every site now full: no function fits anywhere
    const d = decode(problem, stayPutGenes(problem));
    expect(d.fitness.violation).toBe(0);
    expect(d.objective.unresolved).toBe(2);
    expect(d.objective.unresolvedWeight).toBe(problem.slices.reduce((w, b) => w + 6 - inv.slices[b.slice].priority, 0));
    expect(d.objective.usage).toBe(0);
  });

  it('the order keys decide which of two slices competing for one span gets it', () => {
    const { inv, problem } = tiny('w-site-b');
    // Room on every span for exactly one of the two slices' largest tie.
    const widest = Math.max(...problem.slices.flatMap((b) => inv.slices[b.slice].ties.map((t) => t.bandwidthGbps)));
    problem.residualGbps.fill(widest);
    problem.protectedGbps.fill(widest);
    const first = stayPutGenes(problem);
    const swapped = Float64Array.from(first);
    swapped[problem.slices[0].orderGene] = first[problem.slices[1].orderGene];
    swapped[problem.slices[1].orderGene] = first[problem.slices[0].orderGene];
    const a = decode(problem, first);
    const b = decode(problem, swapped);
    const placedA = [...a.next].filter(([, p]) => p !== null).map(([s]) => s);
    const placedB = [...b.next].filter(([, p]) => p !== null).map(([s]) => s);
    expect(placedA).not.toEqual(placedB);
  });

  it('a path gene picks another catalogue path than the current one when the planner asks for it', () => {
    // x on A and y on D are joined over A–C–D; z sits on E, which goes down, so the slice is re-placed.
    const sc = scenarioWith([{
      id: 's-three', functions: { x: ['A', 2], y: ['D', 2], z: ['E', 1] },
      ties: [['xy', 'x', 'y', 1, 50, ['ac', 'cd']], ['yz', 'y', 'z', 1, 50, ['de']]],
    }], tinyNetwork(), [window('w-e', { sites: ['E'] })]);
    const inv = buildInventory(sc);
    const problem = buildRemapProblem(inv, compileWindow(sc.windows![0]));
    const genes = stayPutGenes(problem);
    const id = (spans: readonly number[]) => spans.map((x) => inv.network.spans[x].id);
    expect(id(decode(problem, genes).next.get(0)!.paths[0])).toEqual(['ac', 'cd']);
    const A = inv.network.siteIndex.get('A')!;
    const D = inv.network.siteIndex.get('D')!;
    const list = problem.paths.get(0, 0, A, D);
    expect(Array.from({ length: list.count() }, (_, i) => id(list.at(i)!.spans))).toEqual([['ac', 'cd'], ['ab', 'bd']]);
    genes[problem.ties[0].gene] = problem.kPaths - 1e-9; // the last path of the catalogue
    expect(id(decode(problem, genes).next.get(0)!.paths[0])).toEqual(['ab', 'bd']);
  });

  it('greedy genes decode to exactly the greedy plan, and its objective agrees with evaluatePlan', () => {
    const sc = buildScenario({ sites: 30, slices: 150, seed: 3 });
    const inv = buildInventory(sc);
    for (const sw of sc.windows!) {
      const w = compileWindow(sw);
      const problem = buildRemapProblem(inv, w);
      const g = greedyPlan(problem);
      const d = createDecoder(problem).decode(g.genes);
      expect(d.fitness.violation).toBe(0);
      expect(d.next).toEqual(g.next);
      const e = evaluatePlan(inv, w, d.next);
      expect(d.objective.unresolvedWeight).toBe(e.unresolvedWeight);
      expect(d.objective.moveCost).toBeCloseTo(e.moveCost, 9);
      expect(d.objective.usage).toBeCloseTo(e.usage, 6);
      expect(d.objective.peakUtilisation).toBeCloseTo(e.peakUtilisation, 9);
      expect(genesFromPlacement(problem, g.next).length).toBe(problem.dimension);
      expect(createDecoder(problem).decode(genesFromPlacement(problem, g.next)).next).toEqual(g.next);
    }
  });
});
