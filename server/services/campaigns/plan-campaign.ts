// Plans a campaign: evaluates every element group over the campaign's slots with the slot finder (one shared
// context and re-map cache), finds the pairs of groups that must not be out together, and lets the scheduler
// choose a slot per group within the campaign's rules; a start too near a window booked elsewhere that touches the
// same slices is no option (booked-spacing.ts). The answer is the draft stored on the campaign's row.
import type { Queryable } from '../../../db/client';
import type { SearchProgress, SlotCandidate, SlotExclusionCode } from '../../../shared/slots';
import { currentInventory } from '../inventory/inventory-cache';
import { namedElements, namesOf, type SlotNames } from '../slots/slot-words';
import { bookedSpacingNote, bookedSpacingReason, keepSpacedFromBooked, type SpacedSlots } from './booked-spacing';
import { loadBookedTouches } from './booked-touches';
import type { CampaignProblem, CampaignSchedule, SlotEngine } from './engine';
import { problemOf, roundCost, type CampaignRequest, type StoredSchedule } from './stored-schedule';

export type PlanCampaignDeps = {
  db: Queryable;
  engine: SlotEngine;
  now: Date;
  onProgress: (p: SearchProgress) => void | Promise<void>;
  signal?: { readonly aborted: boolean };
};

/** The scheduler's seed: the same campaign on the same network gives the same draft. */
const SCHEDULE_SEED = 1;

export async function planCampaign(deps: PlanCampaignDeps, request: CampaignRequest): Promise<StoredSchedule> {
  const { db, engine } = deps;
  const startedMs = Date.now();
  const groups = request.groups.map((g) => ({ sites: g.sites, spans: g.spans }));
  // The finder counts (group, candidate) pairs; a campaign's progress counts groups evaluated, of all.
  const found = await engine.findSlotsForGroups(db, request, groups, {
    now: deps.now, signal: deps.signal,
    onProgress: (p) => deps.onProgress({
      phase: p.phase === 'preparing' ? 'preparing' : 'evaluating',
      done: p.total > 0 ? Math.floor((p.done * groups.length) / p.total) : 0, total: groups.length, elapsedMs: p.elapsedMs,
    }),
  });
  const { scenario, inventory } = await currentInventory(db);
  const names = namesOf(scenario);
  const clashes: Array<[number, number]> = [];
  for (let i = 0; i < groups.length; i++) {
    for (let j = i + 1; j < groups.length; j++) {
      if (engine.elementsClash(inventory, groups[i], groups[j], names).length > 0) clashes.push([i, j]);
    }
  }
  const minDays = request.minDaysBetweenTouches;
  const usable = found.map((f) => f.candidates.filter((c) => c.rank !== null && c.excluded === null));
  const booked = await loadBookedTouches(db, inventory, rangeOf(usable.flat()), request.hours, minDays);
  const spaced = usable.map((slots, i) => keepSpacedFromBooked(slots, found[i].touchedSlices, booked, minDays));
  const stored: Omit<StoredSchedule, 'assignment' | 'unscheduledReasons' | 'startCost' | 'moves' | 'iterations'> = {
    clashes,
    groups: request.groups.map((g, i) => ({
      label: g.label,
      elements: namedElements(names, groups[i]),
      touched: found[i].touchedSlices,
      slots: spaced[i].kept.map((c) => ({
        start: c.start, end: c.end, startMs: Date.parse(c.start), endMs: Date.parse(c.end), night: c.night,
        cost: c.cost, touched: c.touched, unresolved: c.unresolved, criticalTouched: c.criticalTouched, explanation: c.explanation,
      })),
    })),
  };
  const elapsed = () => Date.now() - startedMs;
  await deps.onProgress({ phase: 'scheduling', done: 0, total: groups.length, elapsedMs: elapsed() });
  const problem = problemOf({ ...stored, assignment: [], unscheduledReasons: [], startCost: 0, moves: 0, iterations: 0 }, request);
  const schedule = await scheduleWithProgress(deps, problem, elapsed);
  return {
    ...stored,
    assignment: schedule.assignment,
    unscheduledReasons: schedule.unscheduledReasons.map((reason, g) =>
      (reason === null ? null : unscheduledWords(reason, found[g].candidates, spaced[g], minDays, names))),
    startCost: roundCost(schedule.startWindowsCost),
    startScheduled: groups.length - schedule.startUnscheduled,
    moves: schedule.moves,
    iterations: schedule.iterations,
  };
}

/** The instants the slots span; null when there are none. */
function rangeOf(slots: readonly SlotCandidate[]): { fromMs: number; toMs: number } | null {
  if (slots.length === 0) return null;
  return slots.reduce((r, c) => ({ fromMs: Math.min(r.fromMs, Date.parse(c.start)), toMs: Math.max(r.toMs, Date.parse(c.end)) }),
    { fromMs: Infinity, toMs: -Infinity });
}

/**
 * An unscheduled group's reason. With no option left, the finder's own words, or the booked windows' when they
 * took out every usable start (the scheduler knows only that none is left); otherwise the scheduler's, plus the
 * starts booked windows took out.
 */
function unscheduledWords(
  reason: string, candidates: readonly SlotCandidate[], spaced: SpacedSlots<SlotCandidate>, minDays: number, names: SlotNames,
): string {
  if (spaced.kept.length === 0) {
    return spaced.ruledOut > 0 ? bookedSpacingReason(spaced.ruledOut, spaced.blocks, minDays, names) : noUsableStartReason(candidates);
  }
  return spaced.ruledOut > 0 ? `${reason} ${bookedSpacingNote(spaced.ruledOut, spaced.blocks, minDays, names)}` : reason;
}

/**
 * The scheduler's steps reach the job's progress in order (the engine reports them as they come, without waiting);
 * a failed write fails the plan once the scheduling has settled.
 */
async function scheduleWithProgress(deps: PlanCampaignDeps, problem: CampaignProblem, elapsed: () => number): Promise<CampaignSchedule> {
  let writes: Promise<void> = Promise.resolve();
  const scheduling = deps.engine.scheduleCampaign(problem, {
    seed: SCHEDULE_SEED, signal: deps.signal,
    onProgress: (done, total) => {
      writes = writes.then(async () => { await deps.onProgress({ phase: 'scheduling', done, total, elapsedMs: elapsed() }); });
    },
  });
  const schedule = await scheduling.finally(() => writes.catch(() => undefined));
  await writes;
  return schedule;
}

const EXCLUSION_WORDS: Record<SlotExclusionCode, string> = {
  FREEZE: 'inside a freeze',
  CONFLICT: 'in conflict with another window',
  LEAD_TIME: 'too late to give a tenant its notice',
  CRITICAL_STRANDED: 'cutting off a critical slice',
};

/** "No usable start: 40 of 42 cut off a critical slice, 2 inside a freeze. For example: …" (the commonest reason first). */
export function noUsableStartReason(candidates: readonly SlotCandidate[]): string {
  const byCode = new Map<SlotExclusionCode, SlotCandidate[]>();
  for (const c of candidates) if (c.excluded) byCode.set(c.excluded.code, [...(byCode.get(c.excluded.code) ?? []), c]);
  const ranked = [...byCode.entries()].sort((a, b) => b[1].length - a[1].length);
  if (ranked.length === 0) return 'It has no usable start in the range.';
  const counts = ranked.map(([code, list]) => `${list.length} ${EXCLUSION_WORDS[code]}`).join(', ');
  return `No usable start in the range (${candidates.length} checked): ${counts}. For example: ${ranked[0][1][0].excluded!.reason}`;
}
