// The line above the overview's list of next windows: how many rows it shows and how they relate to the
// "Windows in the next 30 days" tile, so the two never seem to disagree.
import type { Overview } from '@/shared/api';

/** The tile's horizon (server/queries/overview/overview-figures.ts HORIZON_DAYS). */
export const HORIZON_DAYS = 30;
const DAY_MS = 86_400_000;

const windowsWord = (n: number) => `${n} ${n === 1 ? 'window' : 'windows'}`;

/**
 * "5 shown, soonest first: 1 under way, 3 starting in the next 30 days, 1 later"; when more start within the 30 days
 * than the list holds: "… (7 start in the next 30 days in all; the calendar shows every one)".
 */
export function nextWindowsCaption(windows: Overview['nextWindows'], inHorizon: number, now: Date): string {
  const t = now.getTime();
  const underWay = windows.filter((w) => Date.parse(w.startsAt) < t).length;
  const soon = windows.filter((w) => Date.parse(w.startsAt) >= t && Date.parse(w.startsAt) < t + HORIZON_DAYS * DAY_MS).length;
  const later = windows.length - underWay - soon;
  const parts = [
    underWay ? `${underWay} under way` : null,
    soon ? `${soon} starting in the next ${HORIZON_DAYS} days` : null,
    later ? `${later} later` : null,
  ].filter(Boolean);
  const head = `${windowsWord(windows.length)} shown, soonest first: ${parts.join(', ')}`;
  return inHorizon > soon ? `${head} (${inHorizon} start in the next ${HORIZON_DAYS} days in all; the calendar shows every one)` : head;
}
