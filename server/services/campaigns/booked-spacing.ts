// The once-in-D-days rule against windows booked outside the campaign: a group's start is no option when a booked
// window touching one of the group's slices lies less than D calendar days from it. Days are counted as the
// campaign counts them among its own windows: by night (planner/campaign/compile-campaign.ts touchesTooClose).
import { dayNumber, touchesTooClose } from '../../../planner/campaign/compile-campaign';
import type { SlotHours } from '../../../shared/slots';
import { addDays, dayKeyAt, wallClockAt } from '../../../shared/zone-clock';
import { listWords, type SlotNames } from '../slots/slot-words';

/** A booked window as the rule reads it: its title, the nights it covers (day numbers) and the slices it touches. */
export interface BookedTouch {
  title: string;
  firstDay: number;
  lastDay: number;
  slices: ReadonlySet<string>;
}

/** A booked window that rules out a start, and the group's slices it touches too. */
export interface BookedBlock {
  window: BookedTouch;
  shared: readonly string[];
}

const minutesOf = (hhmm: string) => {
  const [h, m] = hhmm.split(':').map(Number);
  return h * 60 + m;
};

/**
 * The night an instant belongs to, as the slot finder names a slot's night: the local day whose allowed period
 * holds it. With hours that run past midnight (22:00–06:00), 01:00 belongs to the night before; any other time
 * belongs to its own day.
 */
export function nightOfInstant(instantMs: number, hours: SlotHours, timeZone: string): string {
  const day = dayKeyAt(instantMs, timeZone);
  const clock = wallClockAt(instantMs, timeZone);
  const start = minutesOf(hours.start);
  const end = minutesOf(hours.end);
  return end <= start && clock.hour * 60 + clock.minute < end ? addDays(day, -1) : day;
}

/** The nights a window covers, from the one its start belongs to through the one its last minute belongs to. */
export function nightsCovered(startMs: number, endMs: number, hours: SlotHours, timeZone: string): { firstDay: number; lastDay: number } {
  return {
    firstDay: dayNumber(nightOfInstant(startMs, hours, timeZone)),
    lastDay: dayNumber(nightOfInstant(Math.max(startMs, endMs - 1), hours, timeZone)),
  };
}

/** Whether a start on night `day` lies less than minDays from any night the booked window covers. */
export function tooCloseToBooked(day: number, w: Pick<BookedTouch, 'firstDay' | 'lastDay'>, minDays: number): boolean {
  const nearest = Math.min(Math.max(day, w.firstDay), w.lastDay);
  return touchesTooClose(day, nearest, minDays);
}

/** The booked windows sharing a slice with `touched`, each with the slices shared (sorted); the rest cannot block. */
export function bookedSharing(booked: readonly BookedTouch[], touched: readonly string[]): BookedBlock[] {
  const out: BookedBlock[] = [];
  for (const window of booked) {
    const shared = [...new Set(touched.filter((s) => window.slices.has(s)))].sort();
    if (shared.length > 0) out.push({ window, shared });
  }
  return out;
}

/** The windows among `sharing` that rule out a start on night `day`. */
export function blocksAt(sharing: readonly BookedBlock[], day: number, minDays: number): BookedBlock[] {
  return minDays > 0 ? sharing.filter((b) => tooCloseToBooked(day, b.window, minDays)) : [];
}

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
const quoted = (text: string) => `"${text}"`;
const sliceList = (b: BookedBlock, names: SlotNames) => listWords(b.shared.map((s) => quoted(names.slice(s))));

/**
 * The booked windows behind `blocks` in words (names, never ids): `"Duct repair", which also takes out "Harbour CCTV"`
 * for one; for several, each with its slices.
 */
function blockingWords(blocks: readonly BookedBlock[], names: SlotNames): string {
  const byWindow = new Map<BookedTouch, BookedBlock>();
  for (const b of blocks) byWindow.set(b.window, b);
  const distinct = [...byWindow.values()].sort((a, b) => a.window.firstDay - b.window.firstDay || a.window.title.localeCompare(b.window.title));
  if (distinct.length === 1) return `${quoted(distinct[0].window.title)}, which also takes out ${sliceList(distinct[0], names)}`;
  const each = distinct.map((b) => `${quoted(b.window.title)} (${sliceList(b, names)})`);
  return `a booked window that also takes out one of its slices: ${listWords(each)}`;
}

/**
 * Why a group whose every usable start falls near a booked window has none left: `Each of its 3 usable starts falls
 * within 7 days of "Duct repair", which also takes out "Harbour CCTV"; …`.
 */
export function bookedSpacingReason(usable: number, blocks: readonly BookedBlock[], minDays: number, names: SlotNames): string {
  const subject = usable === 1 ? 'Its only usable start falls' : `Each of its ${usable} usable starts falls`;
  return `${subject} within ${plural(minDays, 'day')} of ${blockingWords(blocks, names)}; `
    + `a slice may be touched at most once in ${plural(minDays, 'day')}.`;
}

/**
 * Why a draft's window can no longer be booked: a window booked since the draft was planned lies too near its night:
 * `Its night now falls within 7 days of "Duct repair", which also takes out "Harbour CCTV"; …`.
 */
export function bookedSinceReason(blocks: readonly BookedBlock[], minDays: number, names: SlotNames): string {
  return `Its night now falls within ${plural(minDays, 'day')} of ${blockingWords(blocks, names)}, booked since the draft `
    + `was planned; a slice may be touched at most once in ${plural(minDays, 'day')}. Plan the campaign again.`;
}

/** What a scheduler's reason adds when booked windows also ruled out some of the group's starts. */
export function bookedSpacingNote(ruledOut: number, blocks: readonly BookedBlock[], minDays: number, names: SlotNames): string {
  const subject = ruledOut === 1 ? 'Another start falls' : `Another ${ruledOut} starts fall`;
  return `${subject} within ${plural(minDays, 'day')} of ${blockingWords(blocks, names)}.`;
}

/** A group's usable slots with those too near a booked window taken out, how many were, and the windows that did. */
export interface SpacedSlots<T> {
  kept: T[];
  ruledOut: number;
  blocks: BookedBlock[];
}

/** Keeps the slots (each with its night, 'YYYY-MM-DD') no booked window touching one of `touched` lies too near. */
export function keepSpacedFromBooked<T extends { night: string }>(
  slots: readonly T[], touched: readonly string[], booked: readonly BookedTouch[], minDays: number,
): SpacedSlots<T> {
  const sharing = minDays > 0 ? bookedSharing(booked, touched) : [];
  if (sharing.length === 0) return { kept: [...slots], ruledOut: 0, blocks: [] };
  const kept: T[] = [];
  const blocks = new Set<BookedBlock>();
  for (const slot of slots) {
    const near = blocksAt(sharing, dayNumber(slot.night), minDays);
    if (near.length === 0) kept.push(slot);
    else near.forEach((b) => blocks.add(b));
  }
  return { kept, ruledOut: slots.length - kept.length, blocks: [...blocks] };
}
