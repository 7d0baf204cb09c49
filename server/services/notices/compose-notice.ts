// The content of one tenant's notice for a window: its slices in tenant-facing words, the expected effect,
// the times in the tenant's zone and UTC, the lead time owed, and whom to contact.
import type { NoticeContent, NoticeEffect, NoticeSlice } from '../../../shared/notices';
import type { PlanSlice } from '../../../shared/plans';
import { formatRangeIn, formatRangeUtc } from './notice-times';
import { describeSlice, type NoticeLookups } from './slice-wording';

export type ComposeInput = {
  window: { id: string; startsAt: Date; endsAt: Date; workType: string | null };
  tenant: { id: string; name: string };
  slices: PlanSlice[];
  lookups: NoticeLookups;
  outageAccepted: Set<string>;
  afterWindow: 'return' | 'keep';
  timeZone: string;
  leadDays: number;
  contact: { name: string; email: string };
};

const EFFECT_RANK: Record<NoticeEffect, number> = { none: 0, hitless: 1, interruption: 2 };

function overallEffect(slices: NoticeSlice[]): { effect: NoticeEffect; effectText: string } {
  const effect = slices.reduce<NoticeEffect>((worst, s) => (EFFECT_RANK[s.effect] > EFFECT_RANK[worst] ? s.effect : worst), 'none');
  const interrupted = slices.filter((s) => s.effect === 'interruption').length;
  const text: Record<NoticeEffect, string> = {
    none: 'No interruption expected: none of your slices moves.',
    hitless: 'No interruption expected: every move is made before the old placement is released (make-before-break).',
    interruption: `${interrupted} of your slices will be interrupted for the duration of the work; the others keep running without interruption.`,
  };
  return { effect, effectText: text[effect] };
}

export function summaryOf(workType: string | null): string {
  return workType ? `Planned network maintenance (${workType})` : 'Planned network maintenance';
}

export function composeNotice(input: ComposeInput): NoticeContent {
  const { window: w, tenant } = input;
  const whenLocal = formatRangeIn(w.startsAt, w.endsAt, input.timeZone);
  const own = new Set(input.slices.map((s) => s.slice));
  const slices = [...input.slices]
    .sort((a, b) => a.name.localeCompare(b.name) || a.slice.localeCompare(b.slice))
    .map((s) => describeSlice(s, input.lookups, input.outageAccepted, whenLocal, own));
  const moves = slices.some((s) => s.effect === 'hitless');
  const afterWork = !moves ? 'Nothing needs to move back after the work.'
    : input.afterWindow === 'return'
      ? 'After the work, everything that moved returns to where it is now, again make-before-break.'
      : 'After the work, everything that moved stays on its new placement.';
  return {
    windowId: w.id, tenantId: tenant.id, tenantName: tenant.name,
    summary: summaryOf(w.workType),
    startsAt: w.startsAt.toISOString(), endsAt: w.endsAt.toISOString(),
    timeZone: input.timeZone, whenLocal, whenUtc: formatRangeUtc(w.startsAt, w.endsAt),
    slices, ...overallEffect(slices), afterWork,
    contact: input.contact, leadDays: input.leadDays, leadOverrideReason: null, cancelled: false,
  };
}
