// The quick re-map as a port: the slot finder hands it a network state (the group's work as a window, the capacity
// the overlapping windows hold) and gets the plan's slices back. The default runs the planner on the calling
// thread; the slot jobs pass one backed by a worker thread (server/jobs/slot-remap-thread.ts), so a re-map never
// blocks the event loop of the process hosting them.
import { compileWindow } from '../../../planner/model/build-inventory';
import type { Inventory, Reservation } from '../../../planner/model/types';
import { computePlan } from '../../../planner/plan/compute-plan';
import type { PlanSettings } from '../../../shared/plans';
import type { Scenario, ScenarioWindow } from '../../../shared/scenario';
import type { RemapAnswer } from './remap-cache';

/** The group's work as the planner reads a window (no title: nobody reads it). */
export type RemapWindow = Pick<ScenarioWindow, 'id' | 'start' | 'end' | 'down' | 'reduced'>;

/**
 * The planner options of a quick re-map: the plan defaults with a small budget in counts (generations, decodes per
 * local search), so its answer does not depend on the machine's speed, and a time limit as a safety cap.
 */
export type RemapPlan = Pick<PlanSettings, 'mode' | 'seed' | 'population' | 'knockOn' | 'maxKnockOnMoves'> & {
  timeLimitMs: number;
  generations: number;
  polishEvaluations: number;
};

export interface RemapRequest {
  window: RemapWindow;
  /** capacity the overlapping windows' accepted plans and elements hold ({} when none overlaps) */
  reservations: Reservation;
  plan: RemapPlan;
}

export interface QuickRemapper {
  /** the plan for one network state; `onBusy` is called now and then while it computes (progress reports) */
  remap(req: RemapRequest, onBusy?: () => void): Promise<RemapAnswer>;
  /** frees what the remapper holds (a thread); it takes no more requests */
  close(): Promise<void>;
}

/** Makes the remapper for one search, on the scenario its context read and the inventory built from it. */
export type QuickRemapperFactory = (scenario: Scenario, inventory: Inventory) => QuickRemapper;

/** One quick re-map with the planner, on whatever thread calls it; `now` is the clock (tests pass their own). */
export async function quickRemap(
  scenario: Scenario, inventory: Inventory, req: RemapRequest, onBusy?: () => void, now?: () => number,
): Promise<RemapAnswer> {
  const computed = await computePlan(scenario, compileWindow(req.window), {
    inventory, plan: { ...req.plan, reservations: req.reservations, ...(now ? { now } : {}) }, onProgress: onBusy && (() => onBusy()),
  });
  const { slices, affected, stoppedBy, generations } = computed.result;
  return { slices, affected, ...(stoppedBy ? { stoppedBy } : {}), ...(generations !== undefined ? { generations } : {}) };
}

/** The default: re-maps on the calling thread (tests and the command line; fast to start, blocks while it runs). */
export const inProcessRemapper: QuickRemapperFactory = (scenario, inventory) => ({
  remap: (req, onBusy) => quickRemap(scenario, inventory, req, onBusy),
  close: async () => undefined,
});
