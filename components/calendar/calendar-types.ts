// The slices of the API's window and freeze records the calendar needs, and the marking a day cell receives.
import type { MarkingProps } from 'react-native-calendars/src/calendar/day/marking';
import type { Freeze } from '@/shared/freezes';
import type { Window } from '@/shared/windows';

export type CalendarWindow = Pick<
  Window,
  'id' | 'title' | 'startsAt' | 'endsAt' | 'status' | 'conflictCount' | 'touchesCritical' | 'elements' | 'workType'
> & {
  owner?: Window['owner'];
  /** a tenant's view: the line shown instead of the elements, and the stage shown instead of the state */
  detail?: string;
  statusLabel?: string;
};

export type CalendarFreeze = Pick<Freeze, 'id' | 'title' | 'startsAt' | 'endsAt'>;

/**
 * One bar in a day cell; `color: 'transparent'` keeps a lane free so a window's bar lines up across days.
 * `title` is printed on the bar where the window starts and at the start of each week row it runs into.
 */
export type CalendarPeriod = {
  color: string;
  startingDay?: boolean;
  endingDay?: boolean;
  windowId?: string;
  status?: CalendarWindow['status'];
  title?: string;
  showTitle?: boolean;
  /** what a screen reader says for the bar: title and status */
  label?: string;
};

/** react-native-calendars' multi-period marking, plus what our day cell draws beside the bars. */
export type CalendarDayMark = Omit<MarkingProps, 'periods'> & {
  periods: CalendarPeriod[];
  /** windows on this day beyond the lanes drawn */
  overflowCount: number;
  windowCount: number;
  hasConflict: boolean;
  freezeTitles: string[];
};

export type MarkedDays = Record<string, CalendarDayMark>;
