// The calendar screen's body: month view and the selected day's agenda, stacked on phones and side by side
// from WIDE_LAYOUT_MIN_WIDTH_PX; filters and the "Book a window" action above the agenda.
import type { Href } from 'expo-router';
import { useMemo, useRef } from 'react';
import { ScrollView, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { Button } from '@/components/button';
import { timesInLabel } from '@/components/time';
import { colors, space, type, WIDE_LAYOUT_MIN_WIDTH_PX } from '@/constants/theme';
import { AgendaList } from './agenda-list';
import { buildMarkedDays, freezesOnDay, windowsOnDay } from './calendar-marks';
import { CalendarFilters } from './calendar-filters';
import type { CalendarFreeze, CalendarWindow } from './calendar-types';
import { MonthCalendar } from './month-calendar';
import type { CalendarState } from './use-calendar-state';
import { countActiveFilters, matchesText } from './window-filters';
import type { ElementNamer } from './agenda-row';

export type CalendarViewProps = {
  state: CalendarState;
  timeZone: string;
  windows: readonly CalendarWindow[];
  freezes: readonly CalendarFreeze[];
  tenants: readonly { id: string; name: string }[];
  /** a new month is loading while the last one stays on screen */
  refreshing: boolean;
  /** a later load failed; the data shown may be stale */
  refreshError?: string;
  canBook: boolean;
  /** false for a tenant user: its list is its notified work, which the staff filters do not apply to */
  showFilters?: boolean;
  onBook: () => void;
  /** opens the slot finder; shown beside "Book a window" when set */
  onFindSlot?: () => void;
  /** what a press on a window's agenda row does when there is no `windowHref` */
  onOpenWindow?: (id: string) => void;
  /** where a window's agenda row leads, making it a real link (null: nothing to open) */
  windowHref?: (id: string) => Href | null;
  /** names the windows' sites and spans in the agenda */
  elementName?: ElementNamer;
};

function emptyHint(filtered: boolean, windowCount: number): string {
  if (filtered) return 'Filters are on; clear them to see every window.';
  return windowCount === 0 ? 'Nothing is booked this month.' : 'Pick a day with a bar to see its windows.';
}

export function CalendarView(props: CalendarViewProps) {
  const { state, timeZone, freezes, refreshing, refreshError, canBook, onBook, onOpenWindow, windowHref, elementName } = props;
  const { width } = useWindowDimensions();
  const wide = width >= WIDE_LAYOUT_MIN_WIDTH_PX;
  const windows = useMemo(
    () => props.windows.filter((w) => matchesText(w, state.filters.elementText)),
    [props.windows, state.filters.elementText],
  );
  const marks = useMemo(
    () => buildMarkedDays({ windows, freezes, timeZone, selectedDay: state.selectedDay, today: state.today }),
    [windows, freezes, timeZone, state.selectedDay, state.today],
  );
  const filtered = countActiveFilters(state.filters) > 0;
  const scroller = useRef<ScrollView>(null);
  // Offsets inside the scroll content: the phone stack's top, and the agenda's top within the stack.
  const stackY = useRef(0);
  const agendaY = useRef(0);
  // On phones the agenda sits below the month; bring it into view when a day is picked.
  const selectDay = (day: string) => {
    state.selectDay(day);
    if (!wide) scroller.current?.scrollTo({ y: Math.max(0, stackY.current + agendaY.current - space.sm), animated: true });
  };

  const calendar = (
    <MonthCalendar
      month={state.month}
      today={state.today}
      selectedDay={state.selectedDay}
      marks={marks}
      onDayPress={selectDay}
      onMonthChange={state.setMonth}
      loading={refreshing}
    />
  );
  const side = (
    <>
      {props.showFilters === false ? null : (
        <CalendarFilters filters={state.filters} onChange={state.setFilters} tenants={props.tenants} initiallyOpen={false} />
      )}
      {refreshError ? (
        <Text style={styles.stale} role="alert" testID="calendar-refresh-error">
          Could not load this month: {refreshError}
        </Text>
      ) : null}
      <View onLayout={(event) => (agendaY.current = event.nativeEvent.layout.y)}>
        <AgendaList
          day={state.selectedDay}
          timeZone={timeZone}
          windows={windowsOnDay(windows, state.selectedDay, timeZone)}
          freezes={freezesOnDay(freezes, state.selectedDay, timeZone)}
          onOpenWindow={onOpenWindow}
          windowHref={windowHref}
          elementName={elementName}
          emptyHint={emptyHint(filtered, windows.length)}
        />
      </View>
    </>
  );
  return (
    <ScrollView ref={scroller} style={styles.screen} contentContainerStyle={[styles.content, wide && styles.contentWide]}>
      <View style={styles.toolbar}>
        <View style={styles.titleBox}>
          <Text style={styles.title} role="heading">
            {wide ? 'Maintenance calendar' : 'Calendar'}
          </Text>
          <Text style={styles.subtitle} testID="calendar-zone">{timesInLabel(timeZone)}</Text>
        </View>
        {canBook ? (
          <View style={styles.actions}>
            {props.onFindSlot ? <Button label="Find a slot" variant="quiet" onPress={props.onFindSlot} testID="calendar-find-slot" /> : null}
            <Button label="Book a window" onPress={onBook} testID="calendar-book" />
          </View>
        ) : null}
      </View>
      {wide ? (
        <View style={styles.columns}>
          <View style={styles.calendarColumn}>{calendar}</View>
          <View style={styles.sideColumn}>{side}</View>
        </View>
      ) : (
        <View style={styles.stack} onLayout={(event) => (stackY.current = event.nativeEvent.layout.y)}>
          {calendar}
          {side}
        </View>
      )}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  screen: { flex: 1 },
  content: { padding: space.md, gap: space.md, paddingBottom: space.xxxl },
  contentWide: { padding: space.xl, gap: space.lg },
  toolbar: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.md, flexWrap: 'wrap' },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  titleBox: { gap: space.xxs, flexShrink: 1 },
  title: { ...type.title, color: colors.ink },
  subtitle: { ...type.caption, color: colors.inkMuted },
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: space.lg },
  calendarColumn: { flex: 3, minWidth: 0 },
  sideColumn: { flex: 2, minWidth: 0, gap: space.md },
  stack: { gap: space.md },
  stale: { ...type.caption, color: colors.danger },
});
