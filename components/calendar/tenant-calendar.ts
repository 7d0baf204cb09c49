// A tenant's calendar entries from its tenant views: the notice's summary, its own effect in its words, and the
// stage of the work; no elements, conflicts or internal states (a tenant never reads them).
import type { TenantWindowView, TenantWorkStage } from '@/shared/tenant-windows';
import type { WindowStatus } from '@/shared/windows';
import type { CalendarWindow } from './calendar-types';

/** The calendar's colour for each stage, borrowed from the state that stage stands for. */
const STAGE_TONE: Record<TenantWorkStage, WindowStatus> = {
  planned: 'notified', underway: 'underway', finished: 'done', cancelled: 'withdrawn',
};

export function tenantCalendarWindows(views: readonly TenantWindowView[]): CalendarWindow[] {
  return views.map((v) => ({
    id: v.windowId, title: v.summary, startsAt: v.startsAt, endsAt: v.endsAt,
    status: STAGE_TONE[v.stage], statusLabel: v.stage, detail: v.effectText,
    conflictCount: 0, touchesCritical: v.critical, elements: [], workType: null,
  }));
}

/** The notice to open for a window id on the tenant's calendar. */
export function noticeIdOf(views: readonly TenantWindowView[], windowId: string): string | null {
  return views.find((v) => v.windowId === windowId)?.noticeId ?? null;
}
