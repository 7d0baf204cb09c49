// Every rule a campaign's assignment breaks, in words a planner reads (the draft's manual moves are checked with
// it), and why an unscheduled group found no slot.
import { type CampaignState, UNSCHEDULED } from './campaign-state';
import {
  checkRules, dayNumber, formatNight, groupLabel, LIST_AT_MOST, listWords, slotsOverlap, touchesTooClose,
} from './compile-campaign';
import type { CampaignProblem } from './types';

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

function capitalised(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** Every broken rule of `assignment` (slot index per group, null = unscheduled), in words; [] when it keeps them all. */
export function campaignIssues(p: CampaignProblem, assignment: (number | null)[]): string[] {
  checkRules(p);
  const issues: string[] = [];
  if (assignment.length !== p.groups.length) {
    issues.push(`The schedule lists ${plural(assignment.length, 'group')} but the campaign has ${p.groups.length}.`);
  }
  const placed: { g: number; s: number; night: string; day: number }[] = [];
  p.groups.forEach((group, g) => {
    const s = assignment[g];
    if (s === null || s === undefined) return;
    if (!Number.isInteger(s) || s < 0 || s >= group.slots.length) {
      issues.push(`${capitalised(groupLabel(p, g))} is given a start that is not one of its ${plural(group.slots.length, 'usable start')}.`);
      return;
    }
    placed.push({ g, s, night: group.slots[s].night, day: dayNumber(group.slots[s].night) });
  });

  const byNight = new Map<string, number[]>();
  for (const w of placed) byNight.set(w.night, [...(byNight.get(w.night) ?? []), w.g]);
  for (const [night, gs] of [...byNight].sort((a, b) => a[0].localeCompare(b[0]))) {
    if (gs.length > p.rules.maxPerNight) {
      issues.push(`${formatNight(night)} holds ${plural(gs.length, 'window')} (${listWords(gs.map((g) => groupLabel(p, g)))}); `
        + `the campaign allows at most ${p.rules.maxPerNight} a night.`);
    }
  }

  const D = p.rules.minDaysBetweenTouches;
  const clash = new Set(p.clashes.map(([i, j]) => `${Math.min(i, j)}:${Math.max(i, j)}`));
  for (let x = 0; x < placed.length; x++) {
    for (let y = x + 1; y < placed.length; y++) {
      const a = placed[x];
      const b = placed[y];
      const apart = Math.abs(a.day - b.day);
      if (touchesTooClose(a.day, b.day, D)) {
        const touchedB = new Set(p.groups[b.g].touched);
        const shared = new Set(p.groups[a.g].touched.filter((t) => touchedB.has(t))).size;
        if (shared > 0) {
          issues.push(`${capitalised(groupLabel(p, a.g))} (${formatNight(a.night)}) and ${groupLabel(p, b.g)} (${formatNight(b.night)}) `
            + `touch ${plural(shared, 'common slice')} ${apart === 0 ? 'on the same night' : `${plural(apart, 'day')} apart`}; `
            + `a slice may be touched at most once in ${plural(D, 'day')}.`);
        }
      }
      if (clash.has(`${a.g}:${b.g}`) && slotsOverlap(p.groups[a.g].slots[a.s], p.groups[b.g].slots[b.s])) {
        issues.push(`${capitalised(groupLabel(p, a.g))} and ${groupLabel(p, b.g)} must not be out at the same time, `
          + `but their windows overlap (${formatNight(a.night)}).`);
      }
    }
  }
  return issues;
}

/** Why unscheduled group g finds no slot in `state`: which rule rules out its starts, naming nights and groups. */
export function unscheduledReason(state: CampaignState, g: number): string {
  const { c } = state;
  const p = c.problem;
  const slots = p.groups[g].slots;
  if (slots.length === 0) return 'It has no usable start: the slot finder ruled out every start in the range.';
  const fullNights = new Set<number>();
  const spacing = new Set<number>();
  const clash = new Set<number>();
  let byNight = 0;
  let bySpacing = 0;
  let byClash = 0;
  for (let s = 0; s < slots.length; s++) {
    const b = state.blockers(g, s);
    if (b.nightFull) {
      byNight++;
      fullNights.add(c.night[g][s]);
    }
    if (b.spacing.length > 0) bySpacing++;
    if (b.clash.length > 0) byClash++;
    b.spacing.forEach((h) => spacing.add(h));
    b.clash.forEach((h) => clash.add(h));
  }
  const names = (set: Set<number>) => listWords([...set].sort((a, b) => a - b).map((h) => groupLabel(p, h)), LIST_AT_MOST, 'more groups');
  const parts: string[] = [];
  if (byNight > 0) {
    const nights = [...fullNights].map((n) => c.nights[n]).sort().map(formatNight);
    parts.push(`${byNight} fall on nights that already hold ${plural(c.maxPerNight, 'window')}, the most allowed (${listWords(nights, LIST_AT_MOST, 'more nights')})`);
  }
  if (bySpacing > 0) {
    parts.push(`${bySpacing} lie within ${plural(c.minDays, 'day')} of a window touching the same slices (${names(spacing)})`);
  }
  if (byClash > 0) parts.push(`${byClash} overlap a window that must not be out at the same time (${names(clash)})`);
  if (state.assign[g] !== UNSCHEDULED || parts.length === 0) return 'It fits one of its starts as the schedule stands; schedule the campaign again.';
  return `None of its ${plural(slots.length, 'usable start')} keeps the campaign's rules: ${parts.join('; ')}.`;
}
