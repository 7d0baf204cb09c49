// Turns stored rows into the API's window shape, and loads windows with their conflict counts.
import type { Window, WindowStatus } from '../../../shared/windows';
import { durationHours } from '../../../shared/window-checks';
import {
  selectElementsByWindow, selectWindowRows, type ElementRow, type WindowFilter, type WindowRow,
} from '../../queries/windows/window-rows';
import type { Queryable } from '../../../db/client';
import { conflictsByWindow } from './conflicts';
import { WindowNotFoundError } from './errors';

export type LoadedWindow = WindowRow & { elements: ElementRow[] };

export function toWindow(w: LoadedWindow, conflictCount: number): Window {
  return {
    id: w.id, title: w.title,
    startsAt: w.startsAt.toISOString(), endsAt: w.endsAt.toISOString(),
    durationHours: durationHours(w.startsAt, w.endsAt),
    workType: w.workType, notes: w.notes, status: w.status as WindowStatus, version: w.version,
    owner: w.ownerId ? { id: w.ownerId, name: w.ownerName ?? '' } : null,
    elements: w.elements,
    freezeOverrideReason: w.freezeOverrideReason,
    conflictCount,
    touchesCritical: w.touchesCritical === true,
    impactStored: w.impactStored,
    mop: w.mopFileName === null ? null : {
      fileName: w.mopFileName, mime: w.mopMime ?? '', sizeBytes: w.mopSizeBytes ?? 0,
      uploadedAt: (w.mopUploadedAt ?? w.updatedAt).toISOString(),
    },
    createdAt: w.createdAt.toISOString(), updatedAt: w.updatedAt.toISOString(),
  };
}

export async function loadWindows(db: Queryable, filter: WindowFilter): Promise<LoadedWindow[]> {
  const rows = await selectWindowRows(db, filter);
  const elements = await selectElementsByWindow(db, rows.map((r) => r.id));
  return rows.map((r) => ({ ...r, elements: elements.get(r.id) ?? [] }));
}

/** One window, as the caller may see it (a tenant user gets 404 for a window that does not touch it). */
export async function loadWindow(db: Queryable, id: string, scopeTenant: string | null): Promise<LoadedWindow> {
  const [w] = await loadWindows(db, { ids: [id], scopeTenant });
  if (!w) throw new WindowNotFoundError(id);
  return w;
}

export async function windowViews(db: Queryable, filter: WindowFilter): Promise<Window[]> {
  const loaded = await loadWindows(db, filter);
  const conflicts = await conflictsByWindow(db, loaded, filter.scopeTenant ?? null);
  return loaded.map((w) => toWindow(w, conflicts.get(w.id)?.length ?? 0));
}

export async function windowView(db: Queryable, id: string, scopeTenant: string | null): Promise<Window> {
  const [view] = await windowViews(db, { ids: [id], scopeTenant });
  if (!view) throw new WindowNotFoundError(id);
  return view;
}
