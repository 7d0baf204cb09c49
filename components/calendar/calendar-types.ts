// The slices of the API's window and freeze records the calendar needs, and the marking a day cell receives.
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
  /** a draft campaign's window, not booked yet: drawn outlined with the word "Draft", opening the campaign */
  campaign?: { id: string; title: string };
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
  /** the window in the day's accessible name: "Rectifier swap (Planned)" */
  label?: string;
  /** a draft campaign's window: outlined, hatched and labelled "Draft" rather than filled with a status colour */
  draft?: boolean;
};

/** What a day cell draws and says: its bars (one per lane), today, the selection and what sits beside the bars. */
export type CalendarDayMark = {
  periods: CalendarPeriod[];
  /** every window on the day, lanes drawn or not, as "title (status)", earliest first */
  windowLabels: string[];
  today?: boolean;
  selected?: boolean;
  /** windows on this day beyond the lanes drawn */
  overflowCount: number;
  windowCount: number;
  hasConflict: boolean;
  freezeTitles: string[];
};

export type MarkedDays = Record<string, CalendarDayMark>;
