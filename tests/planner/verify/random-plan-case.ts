// Small random instances with a valid plan for their window, for the verifier's mutation properties.
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import type { Inventory, Reservation, WindowSpec } from '../../../planner/model/types';
import type { PlanToVerify } from '../../../planner/verify/verify-plan';
import type { Scenario } from '../../../shared/scenario';
import { createRng } from '../../../planner/random/rng';
import { randomScenario } from '../fixtures/random-scenario';
import { handPlan } from './hand-plan';

export interface Case {
  scenario: Scenario;
  inv: Inventory;
  window: WindowSpec;
  plan: PlanToVerify;
  reservations?: Reservation;
}

export interface CaseParams {
  seed: number;
  sites: number;
  slices: number;
  /** chooses the corrupted element among those that qualify */
  pick: number;
  /** how deep the corruption cuts, in (0, 1) */
  share: number;
}

/** Chance that a site's vCPU is cut to exactly today's load, so that some sites are full. */
const FULL_SITE_SHARE = 0.3;

/**
 * Fits capacities to today's load: every capacity is lifted to at least the load, so the instance breaks nothing
 * before the window, and some sites are cut to exactly their load (at least 1 vCPU), so some are full.
 */
function fitToLoad(scenario: Scenario, rnd: () => number): Scenario {
  const cpu = new Map<string, number>();
  const gbps = new Map<string, number>();
  const slices = new Map(scenario.slices.map((s) => [s.id, s]));
  for (const p of scenario.placements) {
    const slice = slices.get(p.slice)!;
    for (const f of slice.functions) cpu.set(p.sites[f.id], (cpu.get(p.sites[f.id]) ?? 0) + f.cpu);
    for (const t of slice.ties) for (const x of p.paths[t.id]) gbps.set(x, (gbps.get(x) ?? 0) + t.bandwidthGbps);
  }
  for (const s of scenario.sites) {
    const load = Math.ceil(cpu.get(s.id) ?? 0);
    s.cpu = rnd() < FULL_SITE_SHARE ? Math.max(1, load) : Math.max(s.cpu, load);
  }
  for (const s of scenario.spans) s.capacityGbps = Math.max(s.capacityGbps, Math.ceil(gbps.get(s.id) ?? 0));
  return scenario;
}

/**
 * A random instance and a plan for its window built by hand-plan.ts, not by the planner: the properties must not
 * hang on the search, and the hand-built plans add knock-on entries the planner may not make.
 */
export function plannedCase(p: CaseParams): Case {
  const { scenario, window: w } = randomScenario(p.seed, { sites: p.sites, extraSpans: Math.ceil(p.sites / 2), slices: p.slices });
  const rnd = createRng(p.seed ^ 0x2545f491);
  fitToLoad(scenario, rnd);
  const inv = buildInventory(scenario);
  const window = compileWindow(w);
  return { scenario, inv, window, plan: handPlan(inv, window, rnd) };
}
