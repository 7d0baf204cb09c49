// How the slot finder's figures read: exclusion reasons in words, risk with its scale, notice days to spare,
// and the excluded slots grouped by reason. Pure, so the list and its tests read the same words.
import { SLOT_EXCLUSION_CODES, type SearchProgress, type SlotCandidate, type SlotExclusionCode, type SlotSearchSummary } from '@/shared/slots';
import { formatRiskPercent } from '@/components/impact/impact-format';

export const EXCLUSION_LABELS: Record<SlotExclusionCode, string> = {
  FREEZE: 'Freeze',
  CONFLICT: 'Conflicts with another window',
  LEAD_TIME: 'Too late to give notice',
  CRITICAL_STRANDED: 'A critical slice would be cut off',
};

/** What the risk figure is and which scale its Low/Medium/High comes from, said once above the list. */
export const SLOT_RISK_MEANING =
  'Risk of failure = the highest chance that a slice kept in service fails unplanned during the slot, from each site’s and span’s mean time between failures. Low, Medium and High give the severity of the most important slice at stake, on the slice severity scale below (Critical counts as High), not the size of the chance.';

/** "0.40 % (slices up to Low severity, on the slice severity scale)" */
export function riskText(c: Pick<SlotCandidate, 'riskPercent' | 'riskLevel'>): string {
  return `${formatRiskPercent(c.riskPercent / 100)} (slices up to ${c.riskLevel} severity, on the slice severity scale)`;
}

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** Days to spare before the last day notices can go out; negative means some tenant can no longer be told in time. */
export function noticeText(spareDays: number | null): string {
  if (spareDays === null) return 'No tenant to notify';
  if (spareDays < 0) return `${daysWords(-spareDays)} too late for a tenant’s notice`;
  if (spareDays < 1) return 'Notices must go out today';
  return `${daysWords(spareDays)} to spare for notices`;
}

/** Days as the slot's explanation line words them: tenths below ten days, whole days above, never rounded up. */
function daysWords(days: number): string {
  const shown = days < 10 ? Math.floor(days * 10) / 10 : Math.floor(days);
  return plural(shown, 'day', 'days');
}

/** Usable slots in rank order (the server sends them so; sorted again so the list never depends on it). */
export function rankedSlots(candidates: readonly SlotCandidate[]): SlotCandidate[] {
  return candidates
    .filter((c) => c.excluded === null && c.rank !== null)
    .sort((a, b) => (a.rank ?? 0) - (b.rank ?? 0));
}

export type ExcludedGroup = { code: SlotExclusionCode; label: string; slots: SlotCandidate[] };

/** Excluded slots by reason, in the reasons' fixed order, each group by start; groups with none left out. */
export function excludedGroups(candidates: readonly SlotCandidate[]): ExcludedGroup[] {
  return SLOT_EXCLUSION_CODES.map((code) => ({
    code,
    label: EXCLUSION_LABELS[code],
    slots: candidates.filter((c) => c.excluded?.code === code).sort((a, b) => Date.parse(a.start) - Date.parse(b.start)),
  })).filter((group) => group.slots.length > 0);
}

/** Why no slot is usable, in words: the reasons that excluded every one, with how many each. */
export function noSlotReason(candidates: readonly SlotCandidate[]): string {
  if (candidates.length === 0) return 'No start in the range falls inside the allowed hours and days.';
  const parts = excludedGroups(candidates).map((g) => `${g.label.toLowerCase()} (${plural(g.slots.length, 'slot', 'slots')})`);
  return `Every possible slot is excluded: ${parts.join('; ')}.`;
}

/** "12 of 105 slots checked" (groups for a campaign), "Choosing nights: 40 % …", or what happens before counting starts. */
export function progressText(progress: SearchProgress | null, unit: 'slots' | 'groups' = 'slots'): string {
  if (!progress || progress.total === 0) return 'Getting ready…';
  // The scheduler's own step count (search moves tried) means nothing to a planner; its share of the budget does.
  if (progress.phase === 'scheduling') return `Choosing nights: ${Math.floor((100 * progress.done) / progress.total)} % of the search done`;
  return `${progress.done} of ${progress.total} ${unit} checked`;
}

/** Whole seconds since the search started, "0 s" upwards. */
export function elapsedText(progress: SearchProgress | null): string {
  return `${Math.floor((progress?.elapsedMs ?? 0) / 1000)} s`;
}

/**
 * How the search went: slots checked, seconds taken, how often the quick re-map ran or was reused, and — only when
 * it happened — how many re-maps the time cap cut short: their slots may rank differently on another run.
 */
export function summaryText(s: SlotSearchSummary): string {
  const checked = `${plural(s.usable + s.excluded, 'slot', 'slots')} checked in ${(s.elapsedMs / 1000).toFixed(1)} s.`;
  const ran = s.remapRuns > 0 ? `ran ${plural(s.remapRuns, 'time', 'times')} (at most ${s.remapLimitMs} ms each)` : null;
  const reused = s.reusedRuns > 0 ? `reused an earlier run for ${plural(s.reusedRuns, 'slot', 'slots')} on the same network state` : null;
  const remap = [ran, reused].filter(Boolean).join(' and ');
  const cut = s.remapsCutShort > 0
    ? ` ${s.remapsCutShort === 1 ? '1 re-map' : `${s.remapsCutShort} re-maps`} hit the time cap of ${s.remapLimitMs} ms; `
      + `${s.remapsCutShort === 1 ? 'its' : 'their'} slots may rank differently on another run.`
    : '';
  return `${remap ? `${checked} The quick re-map ${remap}.` : checked}${cut}`;
}
