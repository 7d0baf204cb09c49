// Booking rules a window's form can check before sending (the server checks them again): each broken rule
// comes back as an issue with a fixed code, so the app and the API speak of the same problems.
import type { Policies } from './policies';
import type { WindowElementInput } from './windows';

export type WindowIssueCode =
  | 'WINDOW_ENDS_BEFORE_START' | 'WINDOW_IN_PAST' | 'WINDOW_TOO_LONG'
  | 'WINDOW_NO_ELEMENTS' | 'WINDOW_BAD_FRACTION' | 'WINDOW_DUPLICATE_ELEMENTS';

export type WindowIssue = { code: WindowIssueCode; path: string; message: string };

const MS_PER_HOUR = 3_600_000;
const MS_PER_MINUTE = 60_000;

/** Real elapsed hours between two instants; wall-clock differences across a DST change would be wrong. */
export function durationHours(startsAt: string | Date, endsAt: string | Date): number {
  return (new Date(endsAt).getTime() - new Date(startsAt).getTime()) / MS_PER_HOUR;
}

export function timeIssues(
  times: { startsAt: string; endsAt: string }, policy: Pick<Policies, 'maxWindowHours' | 'bookingSkewMinutes'>, now: Date,
): WindowIssue[] {
  const issues: WindowIssue[] = [];
  const hours = durationHours(times.startsAt, times.endsAt);
  if (!(hours > 0)) {
    issues.push({ code: 'WINDOW_ENDS_BEFORE_START', path: '$.endsAt', message: 'The window must end after it starts.' });
  } else if (hours > policy.maxWindowHours) {
    issues.push({
      code: 'WINDOW_TOO_LONG', path: '$.endsAt',
      message: `The window lasts ${round(hours)} hours; the policy allows at most ${policy.maxWindowHours}.`,
    });
  }
  if (Date.parse(times.startsAt) < now.getTime() - policy.bookingSkewMinutes * MS_PER_MINUTE) {
    issues.push({ code: 'WINDOW_IN_PAST', path: '$.startsAt', message: 'The window cannot start in the past.' });
  }
  return issues;
}

export function elementIssues(elements: readonly WindowElementInput[]): WindowIssue[] {
  if (elements.length === 0) {
    return [{ code: 'WINDOW_NO_ELEMENTS', path: '$.elements', message: 'Pick at least one site or span the work takes out.' }];
  }
  const issues: WindowIssue[] = [];
  const seen = new Set<string>();
  elements.forEach((e, i) => {
    const f = e.fraction;
    if (e.effect === 'reduced' && !(typeof f === 'number' && f > 0 && f < 1)) {
      issues.push({
        code: 'WINDOW_BAD_FRACTION', path: `$.elements[${i}].fraction`,
        message: `Reduced ${e.kind} ${e.id} needs a remaining capacity fraction between 0 and 1 (exclusive).`,
      });
    }
    const key = `${e.kind}:${e.id}`;
    if (seen.has(key)) {
      issues.push({ code: 'WINDOW_DUPLICATE_ELEMENTS', path: `$.elements[${i}]`, message: `The ${e.kind} ${e.id} is listed twice.` });
    }
    seen.add(key);
  });
  return issues;
}

function round(hours: number): number {
  return Math.round(hours * 100) / 100;
}
