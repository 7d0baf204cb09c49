// Edits a window under optimistic locking; new times or elements after `assessed` send it back to draft
// and drop its stored impact (DESIGN §3), and the caller is told so.
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import { windowIsEditable } from '../../../shared/permissions';
import type { WindowPatch } from '../../../shared/windows';
import { deleteWindowImpact } from '../../queries/windows/impacts';
import { replaceElements, type ElementRow } from '../../queries/windows/window-rows';
import { clearAcceptedPlan } from '../plans/clear-accepted';
import { checkBooking, toElementRows } from './booking-checks';
import { StaleVersionError, WindowNotEditableError } from './errors';
import { setWindowStatus } from './set-window-status';
import { windowSnapshot } from './snapshot';
import { loadWindow, type LoadedWindow } from './window-view';

const sameElements = (a: ElementRow[], b: ElementRow[]) => {
  const key = (list: ElementRow[]) => list.map((e) => `${e.kind}:${e.id}:${e.effect}:${e.fraction ?? ''}`).sort().join('|');
  return key(a) === key(b);
};

function changes(current: LoadedWindow, patch: WindowPatch) {
  const startsAt = patch.startsAt === undefined ? current.startsAt : new Date(patch.startsAt);
  const endsAt = patch.endsAt === undefined ? current.endsAt : new Date(patch.endsAt);
  const timesChanged = startsAt.getTime() !== current.startsAt.getTime() || endsAt.getTime() !== current.endsAt.getTime();
  const elements = patch.elements === undefined ? current.elements : toElementRows(patch.elements);
  const elementsChanged = patch.elements !== undefined && !sameElements(elements, current.elements);
  return { startsAt, endsAt, timesChanged, elements, elementsChanged };
}

export async function editWindow(db: Db, id: string, patch: WindowPatch, user: Me, now: Date): Promise<{ reverted: boolean }> {
  const current = await loadWindow(db, id, null);
  if (!windowIsEditable(current.status)) throw new WindowNotEditableError(current.status);
  if (patch.version !== current.version) throw new StaleVersionError();
  const c = changes(current, patch);
  const freezeReason = await checkBooking(db, {
    times: c.timesChanged ? { startsAt: c.startsAt.toISOString(), endsAt: c.endsAt.toISOString() } : undefined,
    elements: c.elementsChanged ? patch.elements : undefined,
    freezeOverrideReason: patch.freezeOverrideReason ?? current.freezeOverrideReason,
  }, user, now);
  const invalidates = c.timesChanged || c.elementsChanged;
  const reverted = invalidates && current.status !== 'draft';
  const { status, ...columns } = {
    title: patch.title ?? current.title, startsAt: c.startsAt, endsAt: c.endsAt,
    workType: patch.workType === undefined ? current.workType : patch.workType,
    notes: patch.notes === undefined ? current.notes : patch.notes,
    status: reverted ? ('draft' as const) : current.status,
    freezeOverrideReason: c.timesChanged ? freezeReason : current.freezeOverrideReason,
  };
  await db.transaction(async (tx) => {
    await setWindowStatus(tx, {
      windowId: id, version: patch.version, to: status, set: columns, actorId: user.id, action: 'window.update', now,
      snapshot: { before: windowSnapshot(current), after: (version) => windowSnapshot({ ...columns, status, version, elements: c.elements }) },
      details: { reverted },
      alongside: async () => {
        if (c.elementsChanged) await replaceElements(tx, id, c.elements);
        const impactDropped = invalidates ? await deleteWindowImpact(tx, id) : false;
        const planDropped = reverted ? await clearAcceptedPlan(tx, id) : null;
        return { impactDropped, planDropped };
      },
    });
  });
  return { reverted };
}
