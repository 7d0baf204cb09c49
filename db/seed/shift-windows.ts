// Moves the demo's windows by whole weeks so the calendar always starts just ahead of today.
import type { ScenarioWindow } from '../../shared/scenario';

const DAY_MS = 24 * 60 * 60 * 1000;
const WEEK_MS = 7 * DAY_MS;

/**
 * Whole weeks (in ms) to add so the earliest window starts 1–8 days after the start of `now`'s UTC
 * day. Whole weeks keep each window's weekday and time of day; anchoring on the day (not the instant)
 * makes the shift the same all day long, so two starts on one day seed the same times.
 */
export function windowShiftMs(windows: readonly Pick<ScenarioWindow, 'start'>[], now: Date): number {
  if (windows.length === 0) return 0;
  const earliestMs = Math.min(...windows.map((w) => Date.parse(w.start)));
  const dayStartMs = Math.floor(now.getTime() / DAY_MS) * DAY_MS;
  const weeks = Math.ceil((dayStartMs + DAY_MS - earliestMs) / WEEK_MS);
  return (weeks === 0 ? 0 : weeks) * WEEK_MS; // avoid -0 when no shift is needed
}

export function shiftedWindowTimes(w: Pick<ScenarioWindow, 'start' | 'end'>, shiftMs: number): { startsAt: Date; endsAt: Date } {
  return { startsAt: new Date(Date.parse(w.start) + shiftMs), endsAt: new Date(Date.parse(w.end) + shiftMs) };
}
