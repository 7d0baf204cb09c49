// Words of the change-board pack: each slice's outcome with its note, and each step's from → to, by name.
import type { ChangePack, PackStep } from '@/shared/change-pack';
import { madeRoomSentence, OUTCOME_LABELS } from '@/components/plans/plan-format';

type PackSlice = NonNullable<ChangePack['plan']>['slices'][number];

/** Why the slice is listed as it is: a knock-on move, an unresolved slice and whether its outage was accepted. */
export function sliceNote(s: PackSlice): string {
  if (s.madeRoomFor.length > 0) return `${madeRoomSentence(s.outcome, s.madeRoomFor)} (the work does not touch it)`;
  if (s.outcome === 'unresolved') {
    const why = s.unresolvedReason ? `No place found: ${s.unresolvedReason}` : 'No place found';
    return `${why}. ${s.outageAccepted ? 'Outage accepted by the planner.' : 'Outage not accepted.'}`;
  }
  return s.critical ? 'Critical service' : '';
}

export function outcomeWord(s: PackSlice): string {
  return OUTCOME_LABELS[s.outcome];
}

/** "Site A → Site B" for a function move; "from Site A → Site B to Site A → Site C → Site B" for a reroute. */
export function stepWhere(step: PackStep): string {
  return step.kind === 'move-function' ? `${step.fromSite} → ${step.toSite}` : `from ${step.fromPath} to ${step.toPath}`;
}

export function stepFlags(step: PackStep): string {
  const flags: string[] = [];
  if (step.madeRoomFor.length > 0) flags.push(`Knock-on move: makes room for ${step.madeRoomFor.join(', ')}`);
  if (step.needsSpare) flags.push('Needs temporary spare capacity');
  return flags.join(' · ');
}

export const AFTER_WINDOW_WORDS = {
  return: 'After the window, the moved slices return to where they were.',
  keep: 'After the window, the moved slices stay where they moved to.',
} as const;
