// Filters over the calendar: my windows, status (whose chips are also the colour legend), site or span, tenant.
import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { WINDOW_STATUSES } from '@/shared/windows';
import { ChipRow } from '@/components/chip-row';
import { STATUS_LABELS } from '@/components/windows/lifecycle';
import { SearchField } from '@/components/table/search-field';
import { colors, radii, space, type } from '@/constants/theme';
import { statusColor } from './calendar-marks';
import { FilterChip } from './filter-chip';
import { countActiveFilters, NO_FILTERS, toggleStatus, type WindowFilters } from './window-filters';

type Props = {
  filters: WindowFilters;
  onChange: (filters: WindowFilters) => void;
  /** empty for tenant users, who see only windows touching their own slices anyway */
  tenants: readonly { id: string; name: string }[];
  initiallyOpen: boolean;
};

export function CalendarFilters({ filters, onChange, tenants, initiallyOpen }: Props) {
  const [open, setOpen] = useState(initiallyOpen);
  const active = countActiveFilters(filters);
  return (
    <View style={styles.panel} testID="calendar-filters">
      <View style={styles.header}>
        <Pressable role="button" aria-expanded={open} testID="calendar-filters-toggle" onPress={() => setOpen(!open)} style={styles.toggle}>
          <Text style={styles.heading}>{open ? '▾' : '▸'} Filters</Text>
          {active > 0 ? <Text style={styles.count}>{active} on</Text> : null}
        </Pressable>
        {active > 0 ? (
          <Pressable role="button" testID="calendar-filters-clear" onPress={() => onChange(NO_FILTERS)}>
            <Text style={styles.clear}>Clear all</Text>
          </Pressable>
        ) : null}
      </View>
      {open ? (
        <View style={styles.body}>
          <View style={styles.chips}>
            <FilterChip label="My windows" selected={filters.mine} onPress={() => onChange({ ...filters, mine: !filters.mine })} testID="filter-mine" />
          </View>
          <SearchField
            value={filters.elementText}
            onChange={(elementText) => onChange({ ...filters, elementText })}
            label="Site, span or title"
            testID="filter-element"
          />
          <Text style={styles.label}>Status (chip colours are the bar colours)</Text>
          <ChipRow testID="filter-status-strip" role="group" label="Status">
            {WINDOW_STATUSES.map((status) => (
              <FilterChip
                key={status}
                label={STATUS_LABELS[status]}
                tone={statusColor(status)}
                selected={filters.statuses.includes(status)}
                onPress={() => onChange(toggleStatus(filters, status))}
                testID={`filter-status-${status}`}
              />
            ))}
          </ChipRow>
          {tenants.length > 0 ? (
            <>
              <Text style={styles.label}>Tenant affected</Text>
              <ChipRow testID="filter-tenant-strip" role="group" label="Tenant affected">
                {tenants.map((tenant) => (
                  <FilterChip
                    key={tenant.id}
                    label={tenant.name}
                    selected={filters.tenantId === tenant.id}
                    onPress={() => onChange({ ...filters, tenantId: filters.tenantId === tenant.id ? null : tenant.id })}
                    testID={`filter-tenant-${tenant.id}`}
                  />
                ))}
              </ChipRow>
            </>
          ) : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border, paddingHorizontal: space.lg, paddingVertical: space.sm },
  header: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', minHeight: 36 },
  toggle: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingVertical: space.xs },
  heading: { ...type.heading, color: colors.ink },
  count: { ...type.caption, color: colors.onPrimary, backgroundColor: colors.primary, paddingHorizontal: space.sm, borderRadius: radii.pill, overflow: 'hidden' },
  clear: { ...type.label, color: colors.primary },
  body: { gap: space.sm, paddingTop: space.xs, paddingBottom: space.sm },
  label: { ...type.label, color: colors.inkMuted, marginTop: space.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
