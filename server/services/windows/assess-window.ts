// Computes a window's impact with the planner, stores it for this version and moves draft → assessed.
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import { windowIsAssessable } from '../../../shared/permissions';
import { windowImpactSchema, type WindowImpact } from '../../../shared/window-impact';
import { findUnknownElements } from '../../queries/windows/elements';
import { upsertWindowImpact } from '../../queries/windows/impacts';
import { currentInventory } from '../inventory/inventory-cache';
import { computeWindowImpact } from './compute-impact';
import { IllegalTransitionError, StaleVersionError, UnknownElementsError } from './errors';
import { setWindowStatus } from './set-window-status';
import { loadWindow } from './window-view';

export async function assessWindow(
  db: Db, id: string, opts: { version?: number; user: Me; now: Date },
): Promise<WindowImpact> {
  const w = await loadWindow(db, id, null);
  if (!windowIsAssessable(w.status)) {
    throw new IllegalTransitionError(w.status, 'assessed', 'Only a draft or assessed window can be (re)assessed.');
  }
  if (opts.version !== undefined && opts.version !== w.version) throw new StaleVersionError();
  // The network may have changed since booking (an import); name what vanished rather than fail inside the planner.
  const unknown = await findUnknownElements(db, w.elements);
  if (unknown.length > 0) throw new UnknownElementsError(unknown);
  const { scenario, inventory } = await currentInventory(db);
  return db.transaction(async (tx) => {
    let impact: WindowImpact | undefined;
    await setWindowStatus(tx, {
      windowId: id, version: w.version, to: 'assessed', actorId: opts.user.id, action: 'window.assess', now: opts.now,
      alongside: async (version) => {
        // Checked against the API contract before it is stored: GET …/impact serves the stored JSON as is.
        impact = windowImpactSchema.parse(computeWindowImpact(scenario, inventory, { ...w, version }, opts.now));
        await upsertWindowImpact(tx, impact);
        return { affectedSlices: impact.affected.length, touchesCritical: impact.touchesCritical, splits: impact.splits };
      },
    });
    return impact!;
  });
}
