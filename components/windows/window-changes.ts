// What an edit actually changes, so an untouched time or element list is not sent (and not mistaken for a change).
import type { Window, WindowPatch } from '@/shared/windows';
import type { WindowFormOutput } from '@/components/windows/window-form-state';

type Element = { kind: string; id: string; effect: string; fraction?: number | null };

function elementsSignature(elements: readonly Element[]): string {
  return elements
    .map((e) => `${e.kind}:${e.id}:${e.effect}:${e.effect === 'reduced' ? Number(e.fraction ?? 0).toFixed(4) : ''}`)
    .sort()
    .join('|');
}

const sameInstant = (a: string, b: string) => Date.parse(a) === Date.parse(b);

/** The PATCH body: `version` plus only the fields that differ from `current`. */
export function windowPatchFor(current: Window, output: WindowFormOutput, freezeOverrideReason: string | null): WindowPatch {
  const patch: WindowPatch = { version: current.version };
  if (output.title !== current.title) patch.title = output.title;
  if (!sameInstant(output.startsAt, current.startsAt)) patch.startsAt = output.startsAt;
  if (!sameInstant(output.endsAt, current.endsAt)) patch.endsAt = output.endsAt;
  if ((output.workType ?? null) !== current.workType) patch.workType = output.workType;
  if ((output.notes ?? null) !== current.notes) patch.notes = output.notes;
  if (elementsSignature(output.elements) !== elementsSignature(current.elements)) patch.elements = output.elements;
  if (freezeOverrideReason) patch.freezeOverrideReason = freezeOverrideReason;
  return patch;
}

/** True when the edit touches what the impact was computed from (DESIGN §3: it then goes back to draft). */
export function patchTouchesImpact(patch: WindowPatch): boolean {
  return patch.startsAt !== undefined || patch.endsAt !== undefined || patch.elements !== undefined;
}
