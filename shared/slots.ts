// API contract for the slot finder (one window: when does it hurt least?) and the campaign scheduler (many windows:
// which nights, in what order). Requests, ranked candidates, searches and draft campaigns.
import { z } from 'zod';
import { touchCountsSchema } from './touch-counts';

const isoInstant = z.iso.datetime({ offset: true, message: 'must be an ISO 8601 date-time with a time-zone offset' });
const timeOfDay = z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'must be a time of day as HH:MM (00:00 to 23:59)');
const elementIds = z.array(z.string().min(1).max(200)).max(500);

/** The longest date range one search covers: a quarter is as far ahead as maintenance is planned night by night. */
export const SLOT_MAX_RANGE_DAYS = 92;
/** Slot starts are tried on this grid (minutes past the allowed start). */
export const SLOT_STEP_MINUTES = [15, 30, 60] as const;

/**
 * Allowed hours in the network's zone. An end at or before the start runs past midnight into the next day
 * ("22:00"–"05:00"); equal start and end allow the whole day.
 */
export const slotHoursSchema = z.object({ start: timeOfDay, end: timeOfDay });
export type SlotHours = z.infer<typeof slotHoursSchema>;

/** What a slot search or a campaign is asked about, besides its elements. */
const timingFields = {
  durationHours: z.number().positive('must be more than 0 hours').max(24 * 14),
  from: isoInstant,
  to: isoInstant,
  hours: slotHoursSchema,
  /** ISO weekdays (1 Monday … 7 Sunday) in the network's zone on which an allowed period may begin; all when absent */
  weekdays: z.array(z.number().int().min(1).max(7)).min(1).max(7).optional(),
  stepMinutes: z.union([z.literal(15), z.literal(30), z.literal(60)]).default(60),
};

function checkRange(v: { from: string; to: string }, ctx: z.RefinementCtx): void {
  const days = (Date.parse(v.to) - Date.parse(v.from)) / 86_400_000;
  if (!(days > 0)) ctx.addIssue({ code: 'custom', path: ['to'], message: 'The range must end after it starts.' });
  else if (days > SLOT_MAX_RANGE_DAYS) {
    ctx.addIssue({ code: 'custom', path: ['to'], message: `The range may cover at most ${SLOT_MAX_RANGE_DAYS} days.` });
  }
}

export const slotSearchCreateSchema = z.object({
  sites: elementIds.default([]),
  spans: elementIds.default([]),
  ...timingFields,
}).superRefine((v, ctx) => {
  if (v.sites.length + v.spans.length === 0) {
    ctx.addIssue({ code: 'custom', path: ['sites'], message: 'Pick at least one site or span the work takes out.' });
  }
  checkRange(v, ctx);
});
export type SlotSearchCreate = z.infer<typeof slotSearchCreateSchema>;
export type SlotSearchRequest = SlotSearchCreate;

export const SLOT_EXCLUSION_CODES = ['FREEZE', 'CONFLICT', 'LEAD_TIME', 'CRITICAL_STRANDED'] as const;
export type SlotExclusionCode = (typeof SLOT_EXCLUSION_CODES)[number];

export const slotRiskLevelSchema = z.enum(['Low', 'Medium', 'High']);

export const slotCandidateSchema = z.object({
  /** UTC instants */
  start: z.string(),
  end: z.string(),
  /** the local day (YYYY-MM-DD, network zone) the slot's allowed period begins on: its night */
  night: z.string(),
  /** 1, 2, … over the usable candidates, best first; null for an excluded one */
  rank: z.number().int().min(1).nullable(),
  excluded: z.object({ code: z.enum(SLOT_EXCLUSION_CODES), reason: z.string() }).nullable(),
  /**
   * slices the work itself reaches (its own impact, as the window's impact screen and notices count them); other
   * windows out at the same time count through conflicts, the re-map's room and the overlap penalty instead
   */
  touched: z.number().int(),
  /** of those, the quick re-map found no place for (null when it was not run: excluded before it) */
  unresolved: z.number().int().nullable(),
  criticalTouched: z.number().int(),
  criticalUnresolved: z.number().int().nullable(),
  /** the shared count vocabulary (shared/touch-counts.ts), so the list reads like the impact screen */
  counts: touchCountsSchema,
  /** chance that a slice kept in service fails during the slot, in percent, and its level on the plan review's scale */
  riskPercent: z.number().min(0).max(100),
  riskLevel: slotRiskLevelSchema,
  /** other active windows out at the same time, and those of them that conflict with this slot */
  overlapping: z.array(z.object({ id: z.string(), title: z.string() })),
  conflicts: z.array(z.object({ id: z.string(), title: z.string(), reasons: z.array(z.string()) })),
  /**
   * Days to spare before the latest day each touched tenant's notice must go out (the smallest over them);
   * negative when some tenant can no longer be told in time; null when no tenant is touched.
   */
  noticeSpareDays: z.number().nullable(),
  /** the ranking's figure: lower is better (points; docs/slots.md gives the weights) */
  cost: z.number(),
  /** the quick re-map's answer came from an earlier run on the same network state */
  reused: z.boolean(),
  /** one line a person reads: why this slot ranks where it does, or why it is excluded */
  explanation: z.string(),
});
export type SlotCandidate = z.infer<typeof slotCandidateSchema>;

export const SEARCH_STATUSES = ['queued', 'running', 'done', 'failed'] as const;
export const searchStatusSchema = z.enum(SEARCH_STATUSES);
export type SearchStatus = z.infer<typeof searchStatusSchema>;

export const searchProgressSchema = z.object({
  phase: z.enum(['preparing', 'evaluating', 'scheduling', 'finishing']),
  /** candidates (or, for a campaign, element groups) evaluated so far, of all */
  done: z.number().int().min(0),
  total: z.number().int().min(0),
  elapsedMs: z.number().min(0),
});
export type SearchProgress = z.infer<typeof searchProgressSchema>;

export const slotSearchSummarySchema = z.object({
  usable: z.number().int(),
  excluded: z.number().int(),
  /** quick re-map runs made, and the candidates that reused one of them */
  remapRuns: z.number().int(),
  reusedRuns: z.number().int(),
  elapsedMs: z.number(),
  /** the re-map limit per run, in milliseconds */
  remapLimitMs: z.number(),
  /**
   * network states whose re-map the time limit cut short (its slots may rank differently on another run or
   * machine); 0 in summaries stored before it was counted
   */
  remapsCutShort: z.number().int().default(0),
});
export type SlotSearchSummary = z.infer<typeof slotSearchSummarySchema>;

export const namedElementSchema = z.object({ kind: z.enum(['site', 'span']), id: z.string(), name: z.string() });

export const slotSearchSchema = z.object({
  id: z.string(),
  status: searchStatusSchema,
  progress: searchProgressSchema.nullable(),
  request: z.object({
    sites: z.array(z.string()), spans: z.array(z.string()), durationHours: z.number(), from: z.string(), to: z.string(),
    hours: slotHoursSchema, weekdays: z.array(z.number()).optional(), stepMinutes: z.number(),
  }),
  /** the request's sites and spans with their names, for the screen's heading */
  elements: z.array(namedElementSchema),
  /** usable ones by rank first, then the excluded ones by start */
  candidates: z.array(slotCandidateSchema),
  summary: slotSearchSummarySchema.nullable(),
  error: z.string().nullable(),
  createdAt: z.string(),
  finishedAt: z.string().nullable(),
});
export type SlotSearch = z.infer<typeof slotSearchSchema>;

// ---- Campaigns ----

export const campaignGroupSchema = z.object({
  label: z.string().trim().min(1, 'Give each group a name').max(200),
  sites: elementIds.default([]),
  spans: elementIds.default([]),
});
export type CampaignGroupInput = z.infer<typeof campaignGroupSchema>;

export const campaignCreateSchema = z.object({
  title: z.string().trim().min(1, 'Give the campaign a title').max(200),
  groups: z.array(campaignGroupSchema).min(1, 'Add at least one group of sites or spans').max(100),
  ...timingFields,
  /** at most this many of the campaign's windows begin their allowed period on one night */
  maxPerNight: z.number().int().min(1).max(50),
  /** a slice touched by one of the campaign's windows is touched by no other within this many days (0: no limit) */
  minDaysBetweenTouches: z.number().int().min(0).max(60),
}).superRefine((v, ctx) => {
  v.groups.forEach((g, i) => {
    if (g.sites.length + g.spans.length === 0) {
      ctx.addIssue({ code: 'custom', path: ['groups', i, 'sites'], message: `Group "${g.label}" needs at least one site or span.` });
    }
  });
  checkRange(v, ctx);
});
export type CampaignCreate = z.infer<typeof campaignCreateSchema>;

export const CAMPAIGN_STATUSES = ['queued', 'running', 'draft', 'booked', 'failed', 'discarded'] as const;
export const campaignStatusSchema = z.enum(CAMPAIGN_STATUSES);
export type CampaignStatus = z.infer<typeof campaignStatusSchema>;

/** One window of a draft campaign: its group, its slot and what the slot costs. */
export const campaignWindowSchema = z.object({
  group: z.number().int().min(0),
  label: z.string(),
  elements: z.array(namedElementSchema),
  start: z.string(),
  end: z.string(),
  /** local date (YYYY-MM-DD, network zone) of the night the slot belongs to */
  night: z.string(),
  cost: z.number(),
  touched: z.number().int(),
  unresolved: z.number().int().nullable(),
  /** critical slices the window touches: the draft shows the caution for them */
  criticalTouched: z.number().int(),
  explanation: z.string(),
  /** the other usable starts of this group, so the planner can move it (UTC instants, by cost) */
  alternatives: z.array(z.object({ start: z.string(), end: z.string(), night: z.string(), cost: z.number() })),
});
export type CampaignWindow = z.infer<typeof campaignWindowSchema>;

export const campaignSchema = z.object({
  id: z.string(),
  title: z.string(),
  status: campaignStatusSchema,
  version: z.number().int(),
  progress: searchProgressSchema.nullable(),
  request: z.object({
    groups: z.array(z.object({ label: z.string(), sites: z.array(z.string()), spans: z.array(z.string()) })),
    durationHours: z.number(), from: z.string(), to: z.string(), hours: slotHoursSchema,
    weekdays: z.array(z.number()).optional(), stepMinutes: z.number(), maxPerNight: z.number(), minDaysBetweenTouches: z.number(),
  }),
  windows: z.array(campaignWindowSchema),
  /** groups with no slot that keeps the rules, and why */
  unscheduled: z.array(z.object({ group: z.number().int(), label: z.string(), reason: z.string() })),
  /** sum of the windows' costs (points); the constructive start's total beside it shows what the local search gained */
  totalCost: z.number().nullable(),
  startCost: z.number().nullable(),
  /** groups the constructive start placed (the local search may fit in more) */
  startScheduled: z.number().int().nullable(),
  /** booked windows, in group order, once the campaign is booked */
  bookedWindowIds: z.array(z.string()),
  error: z.string().nullable(),
  createdBy: z.object({ id: z.string(), name: z.string() }).nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Campaign = z.infer<typeof campaignSchema>;

export const campaignListSchema = z.object({
  campaigns: z.array(campaignSchema.pick({
    id: true, title: true, status: true, version: true, windows: true, unscheduled: true, totalCost: true, createdAt: true,
  })),
});

/** The planner moves windows of a draft to other starts among their group's usable ones. */
export const campaignPatchSchema = z.object({
  version: z.number().int().min(1),
  title: z.string().trim().min(1).max(200).optional(),
  windows: z.array(z.object({ group: z.number().int().min(0), start: isoInstant })).max(100).optional(),
});
export type CampaignPatch = z.infer<typeof campaignPatchSchema>;

export const campaignBookSchema = z.object({ version: z.number().int().min(1) });

export const campaignBookedSchema = z.object({ campaign: campaignSchema, windowIds: z.array(z.string()) });

export const createdIdSchema = z.object({ id: z.string() });
