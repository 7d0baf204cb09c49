// One element group over its candidate slots: what each slot costs and why, or why it is excluded. The slices the
// work touches are its own impact (as the impact screen and the notices count them); conflicts are worked out once
// per other window; the quick re-map and the risk after it once per network state (the group's elements plus the
// other windows out at the same time, whose elements and accepted plans it must leave alone), and the re-map's
// answer is shared across searches. Only slices the work touches count as unresolved: a slice another window
// strands on its own is that window's outage, not this slot's.
import { assessImpact } from '../../../planner/impact/assess-impact';
import type { Severity } from '../../../planner/impact/severity';
import { compileWindow } from '../../../planner/model/build-inventory';
import type { Inventory, SlicePlacement, WindowSpec } from '../../../planner/model/types';
import { overlapReservations } from '../../../planner/plan/overlap-reservations';
import { fromSlicePlans } from '../../../planner/plan/slice-plans';
import { sliceRisk } from '../../../planner/risk/slice-risk';
import { planSettingsSchema } from '../../../shared/plans';
import type { SlotCandidate, SlotExclusionCode } from '../../../shared/slots';
import type { SlotTime } from '../../../shared/slot-times';
import { NETWORK_TIME_ZONE } from '../../../shared/time-zone';
import { mustMove, touchCounts, type PlannedSlice, type TouchedSlice } from '../../../shared/touch-counts';
import type { ElementRow } from '../../queries/windows/window-rows';
import { outageOf, pairConflictReasons, type Outage } from '../windows/pair-conflicts';
import type { QuickRemapper, RemapWindow } from './quick-remap';
import { remapKey, type RemapAnswer, type RemapCache } from './remap-cache';
import type { ContextWindow, SlotContext } from './slot-context';
import {
  conflictReason, conflictReasonWords, explain, freezeReason, leadTimeReason, strandedReason,
} from './slot-words';

/**
 * The ranking's weights, in points (lower cost ranks first). A slice the quick re-map cannot keep is an outage a
 * tenant feels, so it outweighs everything else: one such slice costs as much as 20 touched slices that move
 * and keep running. A critical slice touched adds on top of being touched (it moves even when it is kept: more at stake).
 * Risk counts per percent of failure chance: a slot where equipment the slices still use is 1 % likely to fail
 * weighs like two more touched slices. Every other window out at the same time leaves less room to recover and is
 * a small penalty; notice days to spare give a small bonus (at most 1.4 points), capped at a week: more notice than
 * that helps no tenant, so beyond it an earlier night is as good as a later one and wins the tie.
 */
export const SLOT_COST_WEIGHTS = {
  /** per slice the quick re-map finds no place for */
  unresolved: 100,
  /** per critical slice the work touches (on top of `touched`) */
  criticalTouched: 20,
  /** per slice the work touches */
  touched: 5,
  /** per percent of the highest failure chance among slices kept in service */
  riskPercent: 10,
  /** per other active window out at the same time */
  overlapping: 3,
  /** taken off per day of notice to spare, up to NOTICE_SPARE_CAP_DAYS */
  noticeSpareDay: 0.2,
} as const;
export const NOTICE_SPARE_CAP_DAYS = 7;

/**
 * The quick re-map's work, in counts, so that the same search ranks the same whatever the machine's speed and
 * load: DE evolves at most QUICK_REMAP_GENERATIONS generations (or stops earlier on the plan defaults' stall
 * limit), and each local search around it (the greedy seed's, the final one; half that per kick) makes at most
 * QUICK_REMAP_POLISH_EVALUATIONS decodes. Sized on `npm run bench:slots` (docs/benchmarks.md): on the generated
 * 200-site / 2,000-slice network (313 slices touched by one site's outage) such a run took about 3 s on two shared
 * cores at a load average of 9 and about 1 s when quieter; on the demo network about 0.3 s. Doubling the local
 * searches' decodes kept 5 more slices there but took twice as long, too close to the cap under load.
 */
export const QUICK_REMAP_GENERATIONS = 10;
export const QUICK_REMAP_POLISH_EVALUATIONS = 50;

/**
 * The wall-clock limit per run is only a safety cap: it bounds a hostile or huge request, and a run it stops is
 * counted in the search's summary (its answer depends on the machine). When the caller sets none: 900 ms, or for a
 * one-group search 30 ms per slice the work must move, at most 6 s — three times the earlier limits, which
 * stopped every re-map of the bench by the clock (docs/slots.md gives the worst case of a whole search).
 * Campaigns keep the flat default: they run many groups.
 */
export const DEFAULT_REMAP_LIMIT_MS = 900;
export const REMAP_MS_PER_SLICE = 30;
export const REMAP_LIMIT_CAP_MS = 6_000;

export function scaledRemapLimitMs(mustMove: number): number {
  return Math.min(REMAP_LIMIT_CAP_MS, Math.max(DEFAULT_REMAP_LIMIT_MS, REMAP_MS_PER_SLICE * mustMove));
}

const DAY_MS = 86_400_000;
const GROUP_WINDOW_ID = 'slot-candidate';

export type SlotGroup = { sites: readonly string[]; spans: readonly string[] };

export type EvaluatedSlot = {
  candidate: Omit<SlotCandidate, 'rank'>;
  startMs: number;
  /** slice ids the work touches in this slot */
  touchedIds: readonly string[];
};

export type RemapStats = {
  runs: number; reused: number;
  /** network states whose answer (run now or reused) the time limit cut short */
  cutShort: number;
};

/** Shared by every group of one search: the remap answers computed or reused so far, and the counts. */
export type SearchRemaps = {
  memo: Map<string, RemapAnswer>; cache: RemapCache; stats: RemapStats; limitMs: number;
  /** runs the re-maps neither the memo nor the cache answers */
  remapper: QuickRemapper;
  /** called while a re-map runs (each generation), so the search can report progress during a long run */
  onBusy?: () => void;
};

type StateFacts = {
  key: string;
  overlapping: ContextWindow[];
  /** the group's work as a window (what the remapper gets) and compiled */
  window: RemapWindow;
  spec: WindowSpec;
  touched: TouchedSlice[];
  touchedIds: string[];
  touchedSet: ReadonlySet<string>;
  criticalTouched: number;
  tenants: string[];
  reservations: ReturnType<typeof overlapReservations>;
  remap: { answer: RemapAnswer; risk: RiskFacts } | null;
  riskWithoutPlan: RiskFacts | null;
};

type RiskFacts = { riskPercent: number; riskLevel: SlotCandidate['riskLevel'] };

const LEVEL_OF: Record<Severity, SlotCandidate['riskLevel']> = { low: 'Low', medium: 'Medium', high: 'High', critical: 'High' };
const LEVEL_ORDER: SlotCandidate['riskLevel'][] = ['Low', 'Medium', 'High'];

/** Highest failure chance (percent) among the shown slices, and their highest severity on the plan review's scale. */
function riskFacts(inv: Inventory, spec: WindowSpec, next: Map<number, SlicePlacement | null>, shown: ReadonlySet<string>): RiskFacts {
  let worst = 0;
  let level = 0;
  for (const r of sliceRisk(inv, spec, next)) {
    if (!shown.has(r.slice)) continue;
    worst = Math.max(worst, r.failureProbability);
    level = Math.max(level, LEVEL_ORDER.indexOf(LEVEL_OF[r.severity]));
  }
  return { riskPercent: Math.min(100, worst * 100), riskLevel: LEVEL_ORDER[level] };
}

const overlapsMs = (a: { startMs: number; endMs: number }, b: { startMs: number; endMs: number }) =>
  a.startMs < b.endMs && b.startMs < a.endMs;

export function slotCost(f: {
  unresolved: number | null; criticalTouched: number; touched: number; riskPercent: number; overlapping: number;
  noticeSpareDays: number | null;
}): number {
  const w = SLOT_COST_WEIGHTS;
  const spare = Math.min(NOTICE_SPARE_CAP_DAYS, Math.max(0, f.noticeSpareDays ?? 0));
  const cost = w.unresolved * (f.unresolved ?? 0) + w.criticalTouched * f.criticalTouched + w.touched * f.touched
    + w.riskPercent * f.riskPercent + w.overlapping * f.overlapping - w.noticeSpareDay * spare;
  return Math.round(cost * 100) / 100;
}

export class GroupEvaluator {
  private readonly rows: ElementRow[];
  private readonly outage: Outage;
  private readonly states = new Map<string, StateFacts>();
  private readonly conflicts = new Map<string, string[]>();

  constructor(
    private readonly ctx: SlotContext, readonly group: SlotGroup, private readonly durationHours: number,
    private readonly remaps: SearchRemaps,
  ) {
    this.rows = [
      ...group.sites.map((id): ElementRow => ({ kind: 'site', id, effect: 'down', fraction: null })),
      ...group.spans.map((id): ElementRow => ({ kind: 'span', id, effect: 'down', fraction: null })),
    ];
    this.outage = outageOf(ctx.inventory.network, this.rows);
  }

  /** Reasons (in words) the group and window `w` must not be out together; [] when they may. */
  private conflictWith(w: ContextWindow): string[] {
    let words = this.conflicts.get(w.id);
    if (!words) {
      const reasons = pairConflictReasons(this.ctx.inventory, { elements: this.rows, outage: this.outage },
        { elements: w.elements, outage: w.outage }, this.ctx.baseComponents);
      words = reasons.map((r) => conflictReasonWords(r, this.ctx.names));
      this.conflicts.set(w.id, words);
    }
    return words;
  }

  /** Slices the work itself must move (hosted, transit or squeezed), for sizing the quick re-map's limit. */
  mustMoveCount(): number {
    const spec = compileWindow({
      id: GROUP_WINDOW_ID, start: new Date(0).toISOString(), end: new Date(this.durationHours * 3_600_000).toISOString(),
      down: { sites: [...this.group.sites], spans: [...this.group.spans] }, reduced: [],
    });
    return this.own(spec).touched.filter(mustMove).length;
  }

  private ownFacts: Pick<StateFacts, 'touched' | 'touchedIds' | 'touchedSet' | 'criticalTouched' | 'tenants'> | null = null;

  /**
   * The slices the work itself touches: its impact without the other windows, as the impact screen and the
   * tenants' notices count it. Slices another window at the same time squeezes are that window's to announce.
   */
  private own(spec: WindowSpec): NonNullable<GroupEvaluator['ownFacts']> {
    if (this.ownFacts) return this.ownFacts;
    const inv = this.ctx.inventory;
    const impact = assessImpact(inv, spec);
    const touched = impact.affected.map((a) => ({ slice: a.slice, reasons: a.reasons, tenantId: inv.slices[a.sliceIndex].tenant }));
    this.ownFacts = {
      touched, touchedIds: touched.map((t) => t.slice), touchedSet: new Set(touched.map((t) => t.slice)),
      criticalTouched: impact.affected.filter((a) => inv.slices[a.sliceIndex].critical).length,
      tenants: [...new Set(touched.map((t) => t.tenantId))].sort(),
    };
    return this.ownFacts;
  }

  private state(overlapping: ContextWindow[]): StateFacts {
    const key = remapKey({
      revision: this.ctx.revision, sites: this.group.sites, spans: this.group.spans,
      windows: overlapping.map((w) => ({ id: w.id, version: w.version, acceptedPlanId: w.acceptedPlanId })),
      limitMs: this.remaps.limitMs,
    });
    let facts = this.states.get(key);
    if (facts) return facts;
    const inv = this.ctx.inventory;
    const window: RemapWindow = {
      id: GROUP_WINDOW_ID, start: new Date(0).toISOString(), end: new Date(this.durationHours * 3_600_000).toISOString(),
      down: { sites: [...this.group.sites], spans: [...this.group.spans] }, reduced: [],
    };
    const spec = compileWindow(window);
    const reservations = overlapping.length === 0 ? {}
      : overlapReservations(inv, overlapping.map((w) => ({ window: w.spec, slices: w.slices })));
    facts = { key, overlapping, window, spec, ...this.own(spec), reservations, remap: null, riskWithoutPlan: null };
    this.states.set(key, facts);
    return facts;
  }

  /** The quick re-map of a state: this search's earlier run, the process cache, or a new run. */
  private async remap(facts: StateFacts): Promise<{ answer: RemapAnswer; risk: RiskFacts; reused: boolean }> {
    const { memo, cache, stats, limitMs } = this.remaps;
    const inv = this.ctx.inventory;
    if (facts.remap) {
      stats.reused += 1;
      return { ...facts.remap, reused: true };
    }
    let answer = memo.get(facts.key) ?? cache.get(facts.key, inv);
    const reused = answer !== null && answer !== undefined;
    if (!answer) {
      const defaults = planSettingsSchema.parse({});
      answer = await this.remaps.remapper.remap({
        window: facts.window, reservations: facts.reservations,
        plan: {
          mode: defaults.mode, seed: defaults.seed, population: defaults.population, knockOn: defaults.knockOn,
          maxKnockOnMoves: defaults.maxKnockOnMoves, timeLimitMs: limitMs,
          generations: QUICK_REMAP_GENERATIONS, polishEvaluations: QUICK_REMAP_POLISH_EVALUATIONS,
        },
      }, this.remaps.onBusy);
      cache.set(facts.key, inv, answer);
      stats.runs += 1;
    } else {
      stats.reused += 1;
    }
    memo.set(facts.key, answer);
    if (answer.stoppedBy === 'time') stats.cutShort += 1;
    // Risk of the slices the work touches and of those the plan moves to make room for them.
    const shown = new Set([...facts.touchedIds, ...answer.slices.filter((s) => (s.madeRoomFor?.length ?? 0) > 0).map((s) => s.slice)]);
    const risk = riskFacts(inv, facts.spec, fromSlicePlans(inv, answer.slices), shown);
    facts.remap = { answer, risk };
    return { answer, risk, reused };
  }

  private riskWithoutPlan(facts: StateFacts): RiskFacts {
    facts.riskWithoutPlan ??= riskFacts(this.ctx.inventory, facts.spec, new Map(), new Set(facts.touchedIds));
    return facts.riskWithoutPlan;
  }

  async evaluate(slot: SlotTime, now: Date): Promise<EvaluatedSlot> {
    const { ctx } = this;
    const inv = ctx.inventory;
    const overlapping = ctx.windows.filter((w) => overlapsMs(w, slot));
    const facts = this.state(overlapping);
    const conflicts = overlapping.map((w) => ({ id: w.id, title: w.title, reasons: this.conflictWith(w) }))
      .filter((c) => c.reasons.length > 0);

    let excluded: { code: SlotExclusionCode; reason: string } | null = null;
    const freeze = ctx.freezes.find((f) => overlapsMs(f, slot));
    if (freeze) excluded = { code: 'FREEZE', reason: freezeReason(freeze, NETWORK_TIME_ZONE) };
    else if (conflicts.length > 0) excluded = { code: 'CONFLICT', reason: conflictReason(conflicts[0], conflicts[0].reasons) };

    // Notice: each touched tenant must be told its lead days before the start, counted from now.
    const daysLeft = (slot.startMs - now.getTime()) / DAY_MS;
    let noticeSpareDays: number | null = null;
    let lateTenant: { id: string; lead: number; spare: number } | null = null;
    for (const tenant of facts.tenants) {
      const lead = ctx.leadDays.get(tenant) ?? ctx.policies.noticeLeadDays;
      const spare = daysLeft - lead;
      noticeSpareDays = noticeSpareDays === null ? spare : Math.min(noticeSpareDays, spare);
      if (spare < 0 && (!lateTenant || spare < lateTenant.spare)) lateTenant = { id: tenant, lead, spare };
    }
    if (!excluded && lateTenant) {
      excluded = { code: 'LEAD_TIME', reason: leadTimeReason(ctx.names.tenant(lateTenant.id), lateTenant.lead, daysLeft) };
    }

    let planned: PlannedSlice[] | null = null;
    let unresolvedIds: string[] | null = null;
    let criticalUnresolved: string[] | null = null;
    let risk: RiskFacts;
    let reused = false;
    if (!excluded) {
      const run = await this.remap(facts);
      reused = run.reused;
      risk = run.risk;
      // The plan also re-places slices only the other windows squeeze; those are theirs, not this work's.
      const ours = run.answer.slices.filter((s) => facts.touchedSet.has(s.slice) || (s.madeRoomFor?.length ?? 0) > 0);
      planned = ours.map((s) => ({
        slice: s.slice, outcome: s.outcome, madeRoomFor: s.madeRoomFor ?? [],
        tenantId: inv.slices[inv.sliceIndex.get(s.slice) ?? -1]?.tenant ?? '',
      }));
      unresolvedIds = ours.filter((s) => s.outcome === 'unresolved' && facts.touchedSet.has(s.slice))
        .map((s) => s.slice);
      criticalUnresolved = unresolvedIds.filter((id) => inv.slices[inv.sliceIndex.get(id) ?? -1]?.critical);
      if (criticalUnresolved.length > 0) {
        excluded = { code: 'CRITICAL_STRANDED', reason: strandedReason(criticalUnresolved.map((id) => ctx.names.slice(id))) };
      }
    } else {
      risk = this.riskWithoutPlan(facts);
    }
    const counts = touchCounts(facts.touched, planned);
    const figures = {
      touched: facts.touched.length, unresolved: unresolvedIds?.length ?? null, criticalTouched: facts.criticalTouched,
      riskPercent: risk.riskPercent, overlapping: overlapping.length, noticeSpareDays,
    };
    const explanation = excluded ? excluded.reason : explain({
      ...figures, unresolved: figures.unresolved ?? 0, riskLevel: risk.riskLevel,
      overlapping: overlapping.map((w) => w.title), reused,
    });
    return {
      startMs: slot.startMs,
      touchedIds: facts.touchedIds,
      candidate: {
        start: new Date(slot.startMs).toISOString(), end: new Date(slot.endMs).toISOString(), night: slot.night, excluded,
        touched: figures.touched, unresolved: figures.unresolved, criticalTouched: figures.criticalTouched,
        criticalUnresolved: criticalUnresolved?.length ?? null, counts,
        riskPercent: risk.riskPercent, riskLevel: risk.riskLevel,
        overlapping: overlapping.map((w) => ({ id: w.id, title: w.title })), conflicts,
        // Tenths, never rounded up: the explanation line and the screen show the same figure.
        noticeSpareDays: noticeSpareDays === null ? null : Math.floor(noticeSpareDays * 10) / 10,
        cost: slotCost(figures), reused, explanation,
      },
    };
  }
}
