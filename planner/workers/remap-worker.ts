// Worker-thread entry: rebuilds the window's re-mapping problem from the scenario and then evaluates
// genomes (shared evaluation) or evolves one island, as the parallel runner asks.
import { parentPort } from 'node:worker_threads';
import type { DEProblem } from '../de/differential-evolution';
import { buildInventory } from '../model/build-inventory';
import { createDecoder, toDEProblem } from '../remap/decoder';
import { localSearch } from '../remap/local-search';
import { buildRemapProblem, type RemapProblem } from '../remap/problem';
import { Island, type Polish } from './island';
import type { ProblemShape, WorkerReply, WorkerRequest } from './worker-protocol';

let problem: DEProblem | null = null;
let remap: RemapProblem | null = null;
let island: Island | null = null;

/** The re-mapper's local search on this thread's copy of the problem, with a decoder of its own. */
function polisher(r: RemapProblem): Polish {
  const decoder = createDecoder(r);
  return (genes, maxEvaluations, deadlineMs) => {
    const p = localSearch(r, decoder, genes, maxEvaluations, () => deadlineMs !== undefined && Date.now() >= deadlineMs);
    return { genes: p.genes, fitness: p.fitness };
  };
}

function loaded(): DEProblem {
  if (!problem) throw new Error('worker has no problem loaded');
  return problem;
}

function handle(req: WorkerRequest): unknown {
  switch (req.kind) {
    case 'load': {
      remap = buildRemapProblem(buildInventory(req.scenario), req.window, req.problemOptions);
      problem = toDEProblem(remap);
      island = null;
      const shape: ProblemShape = { dimension: remap.dimension, lower: remap.lower, upper: remap.upper };
      return shape;
    }
    case 'evaluate':
      return req.genes.map((g) => loaded().evaluate(g));
    case 'island-init':
      island = new Island(loaded(), req.size, req.seeds, req.rngSeed, remap ? polisher(remap) : undefined);
      return { best: island.best(), evaluations: req.size };
    case 'island-run':
      if (!island) throw new Error('worker has no island');
      return island.run(req.generations, req);
  }
}

parentPort?.on('message', (msg: { id: number; req: WorkerRequest }) => {
  let reply: WorkerReply;
  try {
    reply = { id: msg.id, ok: true, value: handle(msg.req) };
  } catch (err) {
    reply = { id: msg.id, ok: false, message: err instanceof Error ? err.message : String(err) };
  }
  parentPort?.postMessage(reply);
});
