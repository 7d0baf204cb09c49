// Worker-thread entry: rebuilds the window's re-mapping problem from the scenario and then evaluates
// genomes (shared evaluation) or evolves one island, as the parallel runner asks.
import { parentPort } from 'node:worker_threads';
import type { DEProblem } from '../de/differential-evolution';
import { buildInventory } from '../model/build-inventory';
import { toDEProblem } from '../remap/decoder';
import { buildRemapProblem } from '../remap/problem';
import { Island } from './island';
import type { ProblemShape, WorkerReply, WorkerRequest } from './worker-protocol';

let problem: DEProblem | null = null;
let island: Island | null = null;

function loaded(): DEProblem {
  if (!problem) throw new Error('worker has no problem loaded');
  return problem;
}

function handle(req: WorkerRequest): unknown {
  switch (req.kind) {
    case 'load': {
      const remap = buildRemapProblem(buildInventory(req.scenario), req.window, req.problemOptions);
      problem = toDEProblem(remap);
      island = null;
      const shape: ProblemShape = { dimension: remap.dimension, lower: remap.lower, upper: remap.upper };
      return shape;
    }
    case 'evaluate':
      return req.genes.map((g) => loaded().evaluate(g));
    case 'island-init':
      island = new Island(loaded(), req.size, req.seeds, req.rngSeed);
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
