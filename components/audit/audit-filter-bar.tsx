// The audit trail's filters: window, person, action and a range of days in the viewer's zone, with a way to clear
// them all and to download the filtered rows as CSV.
import { StyleSheet, Text, View } from 'react-native';
import type { AuditChoices } from '@/shared/audit';
import { Button } from '@/components/button';
import { dayKeyAt } from '@/components/time';
import { FilterPicker } from './filter-picker';
import { DayField } from './day-field';
import { hasFilters, NO_FILTERS, rangeProblem, type AuditFilters } from './audit-filters';
import { colors, space, type } from '@/constants/theme';

type Props = {
  filters: AuditFilters;
  onChange: (filters: AuditFilters) => void;
  choices: AuditChoices | undefined;
  timeZone: string;
  onDownload: () => void;
  /** nothing to download when no row matches */
  canDownload: boolean;
};

export function AuditFilterBar({ filters, onChange, choices, timeZone, onDownload, canDownload }: Props) {
  const set = (patch: Partial<AuditFilters>) => onChange({ ...filters, ...patch });
  const today = dayKeyAt(Date.now(), timeZone);
  const problem = rangeProblem(filters);
  return (
    <View style={styles.bar} testID="audit-filters" role="group" aria-label="Filters">
      <View style={styles.row}>
        <FilterPicker
          label="Window" anyLabel="Any window" testID="audit-filter-window" value={filters.window} onChange={(window) => set({ window })}
          options={(choices?.windows ?? []).map((w) => ({ value: w.id, label: w.title }))}
        />
        <FilterPicker
          label="Person" anyLabel="Anyone" testID="audit-filter-person" value={filters.person} onChange={(person) => set({ person })}
          options={(choices?.people ?? []).map((p) => ({ value: p.id, label: p.name }))}
        />
        <FilterPicker
          label="Action" anyLabel="Any action" testID="audit-filter-action" value={filters.action} onChange={(action) => set({ action })}
          options={(choices?.actions ?? []).map((a) => ({ value: a.code, label: a.words }))}
        />
      </View>
      <View style={styles.row}>
        <DayField label="From day" value={filters.fromDay} fallbackDay={today} onChange={(fromDay) => set({ fromDay })} testID="audit-filter-from" />
        <DayField label="To day (included)" value={filters.toDay} fallbackDay={filters.fromDay ?? today} onChange={(toDay) => set({ toDay })} testID="audit-filter-to" />
      </View>
      {problem ? <Text style={styles.error} role="alert" testID="audit-range-error">{problem}</Text> : null}
      <View style={styles.actions}>
        {hasFilters(filters) ? <Button label="Clear filters" variant="quiet" onPress={() => onChange(NO_FILTERS)} testID="audit-filters-clear" /> : null}
        <Button label="Download these rows (CSV)" variant="quiet" onPress={onDownload} disabled={!canDownload || problem !== null} testID="audit-download-csv" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'flex-start' },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  error: { ...type.bodyStrong, color: colors.danger },
});
