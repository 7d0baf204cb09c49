// Computes a window's impact with the planner, stores it for this version and moves draft → assessed.
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import type { WindowImpact } from '../../../shared/window-impact';
import { insertAuditEntry } from '../../queries/audit';
import { findUnknownElements } from '../../queries/windows/elements';
import { upsertWindowImpact } from '../../queries/windows/impacts';
import { updateWindowRow } from '../../queries/windows/window-rows';
import { loadInventory } from '../inventory/load-scenario';
import { computeWindowImpact } from './compute-impact';
import { IllegalTransitionError, StaleVersionError, UnknownElementsError } from './errors';
import { loadWindow } from './window-view';

export async function assessWindow(
  db: Db, id: string, opts: { version?: number; user: Me; now: Date },
): Promise<WindowImpact> {
  const w = await loadWindow(db, id, null);
  if (w.status !== 'draft' && w.status !== 'assessed') {
    throw new IllegalTransitionError(w.status, 'assessed', 'Only a draft or assessed window can be (re)assessed.');
  }
  if (opts.version !== undefined && opts.version !== w.version) throw new StaleVersionError();
  // The network may have changed since booking (an import); name what vanished rather than fail inside the planner.
  const unknown = await findUnknownElements(db, w.elements);
  if (unknown.length > 0) throw new UnknownElementsError(unknown);
  const { scenario, inventory } = await loadInventory(db);
  return db.transaction(async (tx) => {
    const version = await updateWindowRow(tx, id, w.version, { status: 'assessed', now: opts.now });
    if (version === null) throw new StaleVersionError();
    const impact = computeWindowImpact(scenario, inventory, { ...w, version }, opts.now);
    await upsertWindowImpact(tx, impact);
    await insertAuditEntry(tx, {
      actorId: opts.user.id, action: 'window.assess', entity: 'window', entityId: id, at: opts.now,
      before: { status: w.status, version: w.version },
      after: {
        status: 'assessed', version, affectedSlices: impact.affected.length,
        touchesCritical: impact.touchesCritical, splits: impact.splits,
      },
    });
    return impact;
  });
}
