// What the slot-search worker and the campaign routes ask of the slot finder (server/services/slots/) and the
// campaign scheduler (planner/campaign/), as a plain port: the worker is given the real ones
// (server/services/campaigns/slot-engine.ts, with the slot jobs' threads: server/jobs/slot-remap-thread.ts and
// campaign-thread.ts), and tests may wrap them. Shapes as those modules export them.
import type { Queryable } from '../../../db/client';
import type { Inventory } from '../../../planner/model/types';
import type { SlotTiming } from '../../../shared/slot-times';
import type { QuickRemapperFactory } from '../slots/quick-remap';
import type { SlotNames } from '../slots/slot-words';
import type { SearchProgress, SlotCandidate, SlotSearchRequest, SlotSearchSummary } from '../../../shared/slots';

export interface SlotElements { sites: string[]; spans: string[] }

export interface FindSlotsOptions {
  now: Date;
  onProgress?: (p: SearchProgress) => void | Promise<void>;
  signal?: { readonly aborted: boolean };
  remapLimitMs?: number;
  /** runs the search's quick re-maps (default: on the calling thread; the slot jobs pass a worker thread's) */
  remapper?: QuickRemapperFactory;
}

/** One element group evaluated over every candidate time. */
export interface GroupSlots {
  /** usable by rank, then excluded by start */
  candidates: SlotCandidate[];
  /** slice ids the group's work touches, over its usable slots */
  touchedSlices: string[];
  summary: SlotSearchSummary;
}

export interface CampaignSlotOption { startMs: number; endMs: number; night: string; cost: number }
export interface CampaignGroupInput { slots: CampaignSlotOption[]; touched: readonly string[]; label?: string }
export interface CampaignRules { maxPerNight: number; minDaysBetweenTouches: number }
export interface CampaignProblem { groups: CampaignGroupInput[]; rules: CampaignRules; clashes: Array<[number, number]> }
export interface CampaignSchedule {
  assignment: (number | null)[];
  unscheduledReasons: (string | null)[];
  /** the objective (points), unscheduled groups' penalty included; the same for the constructive start */
  totalCost: number;
  startCost: number;
  /** the constructive start's windows alone (no penalty) and the groups it left unscheduled */
  startWindowsCost: number;
  startUnscheduled: number;
  moves: number;
  iterations: number;
}

export interface ScheduleCampaignOptions {
  seed?: number;
  maxIterations?: number;
  /** candidates the search evaluated, of its budget; the last call has done == total */
  onProgress?: (done: number, total: number) => void;
  /** polled: once aborted, a scheduling still running stops and its promise rejects */
  signal?: { readonly aborted: boolean };
}

export interface SlotEngine {
  /** throws a 400 (SLOT_REQUEST_INVALID) for unknown elements or timing without usable slots */
  checkSlotRequest(db: Queryable, request: SlotSearchRequest): Promise<unknown>;
  /** the same for a campaign's groups over one timing; labels name the groups in the messages */
  checkSlotGroups(db: Queryable, timing: SlotTiming, groups: (SlotElements & { label?: string })[]): Promise<unknown>;
  findSlots(db: Queryable, request: SlotSearchRequest, opts: FindSlotsOptions): Promise<GroupSlots>;
  findSlotsForGroups(db: Queryable, timing: SlotTiming, groups: SlotElements[], opts: FindSlotsOptions): Promise<GroupSlots[]>;
  /** reasons two groups must not be out at the same time; [] if none */
  elementsClash(inv: Inventory, a: SlotElements, b: SlotElements, names: SlotNames): string[];
  /** the same seed gives the same schedule */
  scheduleCampaign(p: CampaignProblem, opts?: ScheduleCampaignOptions): Promise<CampaignSchedule>;
  /** every broken rule of an assignment, in words */
  campaignIssues(p: CampaignProblem, assignment: (number | null)[]): string[];
}
