// Everything a plan run computes on, read from the database: settings, the current inventory with the window,
// and what overlapping accepted plans reserve. Problems that a retry cannot fix are RunRefusedError.
import type { Db } from '../../db/client';
import type { PlanRow } from '../queries/plans/plan-rows';
import { planSettingsSchema } from '../../shared/plans';
import { currentInventory } from '../services/inventory/inventory-cache';
import { reservationsFor } from '../services/plans/reservations';
import { WindowNotFoundError } from '../services/windows/errors';
import { loadWindow, type LoadedWindow } from '../services/windows/window-view';
import { scenarioWindowOf } from '../services/windows/window-spec';
import type { PlanThreadInput } from './plan-thread-protocol';

/** The run cannot succeed as requested; its message is shown to the planner as the run's error. */
export class RunRefusedError extends Error {}

async function loadCurrentWindow(db: Db, plan: PlanRow): Promise<LoadedWindow> {
  let w: LoadedWindow;
  try {
    w = await loadWindow(db, plan.windowId, null);
  } catch (err) {
    if (err instanceof WindowNotFoundError) throw new RunRefusedError('The window no longer exists.');
    throw err;
  }
  if (w.version !== plan.windowVersion) {
    throw new RunRefusedError(
      `The window was edited after this run was requested (version ${plan.windowVersion}, now ${w.version}); run the plan again.`,
    );
  }
  return w;
}

export async function loadPlanInput(db: Db, plan: PlanRow): Promise<PlanThreadInput> {
  const settings = planSettingsSchema.safeParse(plan.settings);
  if (!settings.success) {
    throw new RunRefusedError(`The run's settings are not valid: ${settings.error.issues.map((i) => i.message).join('; ')}`);
  }
  const w = await loadCurrentWindow(db, plan);
  // The process's compiled inventory of the current revision (built once, shared with the API's reads).
  const { scenario, inventory } = await currentInventory(db);
  const { reservations, reservedFor } = await reservationsFor(db, w.id, inventory);
  return {
    scenario: { ...scenario, windows: [scenarioWindowOf(w)] },
    windowId: w.id, settings: settings.data, reservations, reservedFor,
  };
}
