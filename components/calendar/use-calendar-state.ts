// What the calendar screen remembers while open: the month shown, the selected day and the filters.
import { useCallback, useState } from 'react';
import { monthOf } from '@/components/time';
import { todayIn } from './calendar-marks';
import { NO_FILTERS, type WindowFilters } from './window-filters';

export type CalendarState = {
  month: string;
  selectedDay: string;
  filters: WindowFilters;
  today: string;
  setMonth: (month: string) => void;
  selectDay: (day: string) => void;
  setFilters: (filters: WindowFilters) => void;
};

/** A selected day stays when it is shown in the new month; otherwise today (if in it) or the 1st. */
export function dayForMonth(month: string, selectedDay: string, today: string): string {
  if (monthOf(selectedDay) === month) return selectedDay;
  return monthOf(today) === month ? today : `${month}-01`;
}

export function useCalendarState(timeZone: string, initialDay?: string): CalendarState {
  const today = todayIn(timeZone);
  const startDay = initialDay ?? today;
  const [month, setMonthState] = useState(monthOf(startDay));
  const [selectedDay, setSelectedDay] = useState(startDay);
  const [filters, setFilters] = useState<WindowFilters>(NO_FILTERS);

  const setMonth = useCallback(
    (next: string) => {
      setMonthState(next);
      setSelectedDay((day) => dayForMonth(next, day, today));
    },
    [today],
  );
  const selectDay = useCallback((day: string) => {
    setSelectedDay(day);
    setMonthState(monthOf(day));
  }, []);

  return { month, selectedDay, filters, today, setMonth, selectDay, setFilters };
}
