// What an audit row records of a window before and after a change.
import type { ElementRow } from '../../queries/windows/window-rows';

export type WindowSnapshotSource = {
  title: string; startsAt: Date; endsAt: Date; workType: string | null; notes: string | null;
  status: string; version: number; freezeOverrideReason: string | null; elements: ElementRow[];
};

export function windowSnapshot(w: WindowSnapshotSource) {
  return {
    title: w.title, startsAt: w.startsAt.toISOString(), endsAt: w.endsAt.toISOString(),
    workType: w.workType, notes: w.notes, status: w.status, version: w.version,
    freezeOverrideReason: w.freezeOverrideReason, elements: w.elements,
  };
}
