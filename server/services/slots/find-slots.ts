// The slot finder: for one group of sites and spans (or several, for a campaign) and a timing, every candidate
// slot evaluated and ranked: usable ones by cost (ties by earlier start), then the excluded ones by start, each
// with its reason. The context is read once; quick re-map answers are shared within the search and, per network
// state, across searches in the process (remap-cache.ts).
import type { Queryable } from '../../../db/client';
import { countComponents } from '../../../planner/impact/bridges';
import type { Inventory } from '../../../planner/model/types';
import type { SearchProgress, SlotCandidate, SlotSearchRequest, SlotSearchSummary } from '../../../shared/slots';
import { slotTimes, slotTimingIssue, type SlotTiming } from '../../../shared/slot-times';
import { NETWORK_TIME_ZONE } from '../../../shared/time-zone';
import type { ElementRow } from '../../queries/windows/window-rows';
import { getPolicies } from '../../queries/windows/policies';
import { currentInventory } from '../inventory/inventory-cache';
import { outageOf, pairConflictReasons } from '../windows/pair-conflicts';
import { SlotRequestError, SlotSearchCancelledError } from './errors';
import {
  DEFAULT_REMAP_LIMIT_MS, GroupEvaluator, scaledRemapLimitMs, type EvaluatedSlot, type SearchRemaps,
} from './evaluate-slot';
import { inProcessRemapper, type QuickRemapperFactory } from './quick-remap';
import { processRemapCache } from './remap-cache';
import { loadSlotContext } from './slot-context';
import {
  conflictReasonWords, listWords, namedElements, namesOf, type NamedElement, type SlotNames,
} from './slot-words';

export { SlotRequestError, SlotSearchCancelledError } from './errors';
export { SLOT_COST_WEIGHTS, NOTICE_SPARE_CAP_DAYS, DEFAULT_REMAP_LIMIT_MS } from './evaluate-slot';

export type SlotProgressFn = (p: SearchProgress) => void | Promise<void>;

export interface FindSlotsOptions {
  now: Date;
  onProgress?: SlotProgressFn;
  signal?: { readonly aborted: boolean };
  /** per quick re-map run; default: scaledRemapLimitMs for one group (300 ms – 2 s by size), 300 ms for several */
  remapLimitMs?: number;
  /**
   * Makes the search's remapper (closed when the search ends); default: on the calling thread. The slot jobs pass
   * one backed by a worker thread, so a re-map does not stall the process's event loop.
   */
  remapper?: QuickRemapperFactory;
}

export interface SlotElements { sites: string[]; spans: string[] }

export interface GroupSlots {
  /** ranked as in the API (usable by rank, then excluded by start) */
  candidates: SlotCandidate[];
  /** slice ids the group's work touches (union over its usable slots) */
  touchedSlices: string[];
  summary: SlotSearchSummary;
}

/** How often progress is reported at least while candidates are evaluated. */
const PROGRESS_EVERY_MS = 250;

const nextTurn = () => new Promise<void>((resolve) => setImmediate(resolve));


/**
 * Problems with a group's elements, in words: ids that are no site or span at all, and ids given as the other kind
 * ("Ring 2 is a site, not a span").
 */
function elementProblems(
  scenario: { sites: { id: string; name: string }[]; spans: { id: string }[] }, group: SlotElements, label?: string,
): string[] {
  const sites = new Set(scenario.sites.map((s) => s.id));
  const spans = new Set(scenario.spans.map((s) => s.id));
  const names = new Map(scenario.sites.map((s) => [s.id, s.name]));
  const where = label ? ` (group "${label}")` : '';
  const out: string[] = [];
  const wrongKind = [
    ...group.sites.filter((id) => !sites.has(id) && spans.has(id)).map((id) => `${id} is a span, not a site`),
    ...group.spans.filter((id) => !spans.has(id) && sites.has(id)).map((id) => `${names.get(id) ?? id} is a site, not a span`),
  ];
  const unknown = [...group.sites, ...group.spans].filter((id) => !sites.has(id) && !spans.has(id));
  if (unknown.length > 0) out.push(`These sites or spans do not exist${where}: ${listWords([...new Set(unknown)], 10)}.`);
  if (wrongKind.length > 0) out.push(`${listWords(wrongKind, 10)}${where}.`);
  return out;
}

/**
 * Checks a search request before it is queued: every element exists, the timing gives a usable list of starts,
 * and the work is no longer than policy allows. Answers the elements with their names (for the search's heading).
 */
export async function checkSlotRequest(db: Queryable, request: SlotSearchRequest): Promise<NamedElement[]> {
  return (await checkSlotGroups(db, request, [{ sites: request.sites, spans: request.spans }]))[0];
}

/** The same checks for several groups over one timing (campaigns); labels name the groups in the messages. */
export async function checkSlotGroups(
  db: Queryable, timing: SlotTiming, groups: (SlotElements & { label?: string })[],
): Promise<NamedElement[][]> {
  const { scenario } = await currentInventory(db);
  const problems = groups.flatMap((g) => elementProblems(scenario, g, groups.length > 1 ? g.label : undefined));
  const issue = slotTimingIssue(timing, NETWORK_TIME_ZONE);
  if (issue) problems.push(issue);
  const policies = await getPolicies(db);
  if (timing.durationHours > policies.maxWindowHours) {
    problems.push(`The work lasts ${timing.durationHours} hours; a window may last at most ${policies.maxWindowHours} hours.`);
  }
  if (problems.length > 0) throw new SlotRequestError(problems);
  const names = namesOf(scenario);
  return groups.map((g) => namedElements(names, g));
}

/** Usable candidates by cost (ties by earlier start) with ranks 1, 2, …; then the excluded ones by start. */
export function rankSlots(evaluated: EvaluatedSlot[]): SlotCandidate[] {
  const usable = evaluated.filter((e) => !e.candidate.excluded)
    .sort((a, b) => a.candidate.cost - b.candidate.cost || a.startMs - b.startMs);
  const excluded = evaluated.filter((e) => e.candidate.excluded).sort((a, b) => a.startMs - b.startMs);
  return [
    ...usable.map((e, i) => ({ ...e.candidate, rank: i + 1 })),
    ...excluded.map((e) => ({ ...e.candidate, rank: null })),
  ];
}

export async function findSlots(db: Queryable, request: SlotSearchRequest, opts: FindSlotsOptions): Promise<GroupSlots> {
  const [only] = await findSlotsForGroups(db, request, [{ sites: request.sites, spans: request.spans }], opts);
  return only;
}

/**
 * Several groups over the same timing, sharing one context and one re-map cache. Progress counts (group,
 * candidate) pairs evaluated, of groups × candidates. Between candidates the search checks the signal (aborted:
 * SlotSearchCancelledError) and lets other work on the event loop run.
 */
export async function findSlotsForGroups(
  db: Queryable, timing: SlotTiming, groups: SlotElements[], opts: FindSlotsOptions,
): Promise<GroupSlots[]> {
  const startedMs = Date.now();
  const elapsed = () => Date.now() - startedMs;
  const issue = slotTimingIssue(timing, NETWORK_TIME_ZONE);
  if (issue) throw new SlotRequestError([issue]);
  const slots = slotTimes(timing, NETWORK_TIME_ZONE);
  const total = slots.length * groups.length;
  let done = 0;
  let lastReport = -Infinity;
  const report = async (phase: SearchProgress['phase'], force = false) => {
    if (!opts.onProgress || (!force && elapsed() - lastReport < PROGRESS_EVERY_MS)) return;
    lastReport = elapsed();
    await opts.onProgress({ phase, done, total, elapsedMs: lastReport });
  };
  await report('preparing', true);
  const ctx = await loadSlotContext(db, slots[0].startMs, slots[slots.length - 1].endMs);
  const remapper = (opts.remapper ?? inProcessRemapper)(ctx.scenario, ctx.inventory);
  // The remapper may hold a thread: closed however the search ends (done, cancelled or failed).
  try {
    const out: GroupSlots[] = [];
    const memo: SearchRemaps['memo'] = new Map();
    for (const group of groups) {
      const remaps: SearchRemaps = {
        memo, cache: processRemapCache, stats: { runs: 0, reused: 0, cutShort: 0 }, limitMs: opts.remapLimitMs ?? DEFAULT_REMAP_LIMIT_MS,
        remapper,
        // A report in the middle of a run is a courtesy: a failure there shows again at the next candidate's report.
        onBusy: () => { report('evaluating').catch(() => undefined); },
      };
      const evaluator = new GroupEvaluator(ctx, group, timing.durationHours, remaps);
      if (opts.remapLimitMs === undefined && groups.length === 1) remaps.limitMs = scaledRemapLimitMs(evaluator.mustMoveCount());
      const limitMs = remaps.limitMs;
      const groupStart = elapsed();
      const evaluated: EvaluatedSlot[] = [];
      for (const slot of slots) {
        if (opts.signal?.aborted) throw new SlotSearchCancelledError(done, total);
        evaluated.push(await evaluator.evaluate(slot, opts.now));
        done += 1;
        await report('evaluating');
        await nextTurn();
      }
      const candidates = rankSlots(evaluated);
      const touched = new Set<string>();
      for (const e of evaluated) if (!e.candidate.excluded) e.touchedIds.forEach((id) => touched.add(id));
      const usable = candidates.filter((c) => c.rank !== null).length;
      out.push({
        candidates,
        touchedSlices: [...touched].sort(),
        summary: {
          usable, excluded: candidates.length - usable, remapRuns: remaps.stats.runs, reusedRuns: remaps.stats.reused,
          // one group: the whole search, reading the context included; several: this group's share
          elapsedMs: groups.length === 1 ? elapsed() : elapsed() - groupStart, remapLimitMs: limitMs,
          remapsCutShort: remaps.stats.cutShort,
        },
      });
    }
    await report('finishing', true);
    return out;
  } finally {
    await remapper.close();
  }
}

const baseComponentsOf = new WeakMap<Inventory, number>();

const downRows = (g: SlotElements): ElementRow[] => [
  ...g.sites.map((id): ElementRow => ({ kind: 'site', id, effect: 'down', fraction: null })),
  ...g.spans.map((id): ElementRow => ({ kind: 'span', id, effect: 'down', fraction: null })),
];

/**
 * Why two groups must not be out at the same time (a shared element, a split of the network only both together
 * cause, a slice only both together cut off), in words a person reads with `names`; [] when they may.
 */
export function elementsClash(inv: Inventory, a: SlotElements, b: SlotElements, names: SlotNames): string[] {
  let base = baseComponentsOf.get(inv);
  if (base === undefined) baseComponentsOf.set(inv, (base = countComponents(inv.network)));
  const [ra, rb] = [downRows(a), downRows(b)];
  const reasons = pairConflictReasons(inv, { elements: ra, outage: outageOf(inv.network, ra) },
    { elements: rb, outage: outageOf(inv.network, rb) }, base);
  return reasons.map((r) => {
    const words = conflictReasonWords(r, names);
    return `${words.charAt(0).toUpperCase()}${words.slice(1)}.`;
  });
}
