// The one route from a stored window to the planner: rows → the scenario format's window → compileWindow().
// The plan run hands the scenario window to the planner; impact, acceptance checks and reservations need the
// compiled WindowSpec. Both go through the same conversion, so a window means the same thing to every caller.
import { compileWindow } from '../../../planner/model/build-inventory';
import type { WindowSpec } from '../../../planner/model/types';
import type { ScenarioWindow } from '../../../shared/scenario';
import type { ElementRow } from '../../queries/windows/window-rows';

/** A stored window's times and elements: all the planner needs of it. */
export type WindowSubject = { id: string; startsAt: Date; endsAt: Date; elements: ElementRow[] };

type WindowCore = Pick<ScenarioWindow, 'id' | 'start' | 'end' | 'down' | 'reduced'>;

function windowCoreOf(w: WindowSubject): WindowCore {
  const down = (kind: 'site' | 'span') => w.elements.filter((e) => e.kind === kind && e.effect === 'down').map((e) => e.id);
  return {
    id: w.id, start: w.startsAt.toISOString(), end: w.endsAt.toISOString(),
    down: { sites: down('site'), spans: down('span') },
    reduced: w.elements.filter((e) => e.effect === 'reduced').map((e) =>
      (e.kind === 'site' ? { site: e.id, fraction: e.fraction ?? 1 } : { span: e.id, fraction: e.fraction ?? 1 })),
  };
}

/** The window as the scenario format writes it, which is what a plan run looks the window up in. */
export function scenarioWindowOf(w: WindowSubject & { title: string; workType?: string | null }): ScenarioWindow {
  const core = windowCoreOf(w);
  return {
    id: core.id, title: w.title, start: core.start, end: core.end, down: core.down, reduced: core.reduced,
    ...(w.workType ? { workType: w.workType } : {}),
  };
}

/** The planner's WindowSpec of a stored window: compileWindow() of its scenario window. */
export function windowSpecOf(w: WindowSubject): WindowSpec {
  return compileWindow(windowCoreOf(w));
}
