// The campaign problem in the shape the scheduler works on: nights as numbers, day counts for the spacing rule,
// each group's neighbours under the spacing and clash rules, and the words that name groups and nights.
import { InvalidOptionError } from '../errors';
import type { CampaignProblem } from './types';

const MS_PER_DAY = 86_400_000;
const WEEKDAYS = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'];
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

export interface CompiledCampaign {
  problem: CampaignProblem;
  groupCount: number;
  maxPerNight: number;
  minDays: number;
  /** per group, per slot: interned night, calendar day number (days since 1970-01-01), cost */
  night: Int32Array[];
  day: Int32Array[];
  cost: Float64Array[];
  /** per group: night id → its slot indices on that night */
  slotsByNight: Map<number, number[]>[];
  /** night strings by id */
  nights: string[];
  /** per night id: the groups with at least one slot on it */
  groupsByNight: number[][];
  /** groups sharing a touched slice with each group (empty lists when the spacing rule is off) */
  touchNeighbours: number[][];
  clashNeighbours: number[][];
}

/** Calendar day number of a 'YYYY-MM-DD' key: zone-free, the spacing rule compares dates, not instants. */
export function dayNumber(night: string): number {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(night);
  if (!m) throw new InvalidOptionError(`"${night}" is not a night (expected YYYY-MM-DD)`);
  return Math.round(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3])) / MS_PER_DAY);
}

/**
 * The spacing rule's one test: two touches of a slice on calendar days `dayA` and `dayB` (day numbers) break "at most
 * once in `minDays` days" when they lie less than minDays apart; 0 turns the rule off. Windows booked elsewhere are
 * held to it too (server/services/campaigns/booked-spacing.ts).
 */
export function touchesTooClose(dayA: number, dayB: number, minDays: number): boolean {
  return minDays > 0 && Math.abs(dayA - dayB) < minDays;
}

/** A night as a person reads it: "Tue 8 Dec 2026". */
export function formatNight(night: string): string {
  const d = new Date(dayNumber(night) * MS_PER_DAY);
  return `${WEEKDAYS[d.getUTCDay()]} ${d.getUTCDate()} ${MONTHS[d.getUTCMonth()]} ${d.getUTCFullYear()}`;
}

export function groupLabel(p: CampaignProblem, g: number): string {
  return p.groups[g]?.label ?? `group ${g + 1}`;
}

/** The most items a reason names before it counts the rest ("… and 7 more nights"). */
export const LIST_AT_MOST = 5;

/** "a", "a and b", "a, b and c"; past `atMost` items, "a, b, c, d, e and 7 more <noun>". */
export function listWords(items: string[], atMost = Infinity, noun = 'more'): string {
  if (items.length > atMost) return `${items.slice(0, atMost).join(', ')} and ${items.length - atMost} ${noun}`;
  return items.length <= 1 ? items.join('') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

export function slotsOverlap(a: { startMs: number; endMs: number }, b: { startMs: number; endMs: number }): boolean {
  return a.startMs < b.endMs && b.startMs < a.endMs;
}

/** Groups that share at least one touched slice, per group. */
function touchNeighboursOf(p: CampaignProblem): number[][] {
  const bySlice = new Map<string, number[]>();
  p.groups.forEach((g, i) => {
    for (const slice of new Set(g.touched)) {
      const list = bySlice.get(slice);
      if (list) list.push(i);
      else bySlice.set(slice, [i]);
    }
  });
  const sets = p.groups.map(() => new Set<number>());
  for (const list of bySlice.values()) for (const a of list) for (const b of list) if (a !== b) sets[a].add(b);
  return sets.map((s) => [...s].sort((a, b) => a - b));
}

export function checkRules(p: CampaignProblem): void {
  const { maxPerNight, minDaysBetweenTouches } = p.rules;
  if (!Number.isInteger(maxPerNight) || maxPerNight < 1) throw new InvalidOptionError('maxPerNight must be a whole number of at least 1');
  if (!Number.isInteger(minDaysBetweenTouches) || minDaysBetweenTouches < 0) {
    throw new InvalidOptionError('minDaysBetweenTouches must be a whole number of days, 0 or more');
  }
  for (const [i, j] of p.clashes) {
    if (!Number.isInteger(i) || !Number.isInteger(j) || i < 0 || j < 0 || i >= p.groups.length || j >= p.groups.length || i === j) {
      throw new InvalidOptionError(`clash [${i}, ${j}] does not name two different groups`);
    }
  }
}

export function compileCampaign(p: CampaignProblem): CompiledCampaign {
  checkRules(p);
  const nightIds = new Map<string, number>();
  const intern = (night: string) => {
    let id = nightIds.get(night);
    if (id === undefined) {
      dayNumber(night);
      id = nightIds.size;
      nightIds.set(night, id);
    }
    return id;
  };
  const night = p.groups.map((g) => Int32Array.from(g.slots, (s) => intern(s.night)));
  const nights = [...nightIds.keys()];
  const nightDay = nights.map(dayNumber);
  const slotsByNight = night.map((ids) => {
    const map = new Map<number, number[]>();
    ids.forEach((id, s) => {
      const list = map.get(id);
      if (list) list.push(s);
      else map.set(id, [s]);
    });
    return map;
  });
  const clashSets = p.groups.map(() => new Set<number>());
  for (const [i, j] of p.clashes) {
    clashSets[i].add(j);
    clashSets[j].add(i);
  }
  const minDays = p.rules.minDaysBetweenTouches;
  return {
    problem: p,
    groupCount: p.groups.length,
    maxPerNight: p.rules.maxPerNight,
    minDays,
    night,
    day: night.map((ids) => Int32Array.from(ids, (id) => nightDay[id])),
    cost: p.groups.map((g) => Float64Array.from(g.slots, (s) => s.cost)),
    slotsByNight,
    nights,
    groupsByNight: nights.map((_, id) => p.groups.flatMap((_g, i) => (slotsByNight[i].has(id) ? [i] : []))),
    touchNeighbours: minDays > 0 ? touchNeighboursOf(p) : p.groups.map(() => []),
    clashNeighbours: clashSets.map((s) => [...s].sort((a, b) => a - b)),
  };
}
