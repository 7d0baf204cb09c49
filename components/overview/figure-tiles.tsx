// The overview's headline counts as tiles; each number carries testID `overview-<key>` for the end-to-end test.
import { StyleSheet, Text, View } from 'react-native';
import type { Overview } from '@/shared/api';
import { colors, radii, space, type } from '@/constants/theme';

type FigureKey = 'sites' | 'spans' | 'tenants' | 'slices' | 'criticalSlices' | 'windowsNext30Days';

const FIGURES: readonly { key: FigureKey; label: string; hint: string }[] = [
  { key: 'sites', label: 'Sites', hint: 'core to cell site' },
  { key: 'spans', label: 'Spans', hint: 'physical links' },
  { key: 'tenants', label: 'Tenants', hint: 'slice owners' },
  { key: 'slices', label: 'Slices', hint: 'in service' },
  { key: 'criticalSlices', label: 'Critical slices', hint: 'public safety, health, utilities' },
  { key: 'windowsNext30Days', label: 'Windows', hint: 'starting in the next 30 days' },
];

export function FigureTiles({ overview, columns }: { overview: Pick<Overview, FigureKey>; columns: number }) {
  const basis = `${100 / columns}%` as const;
  return (
    <View style={styles.grid}>
      {FIGURES.map(({ key, label, hint }) => (
        <View key={key} style={[styles.cell, { flexBasis: basis, maxWidth: basis }]}>
          <View style={[styles.tile, key === 'criticalSlices' && overview[key] > 0 && styles.tileCritical]}>
            <Text style={styles.label}>{label}</Text>
            <Text style={styles.figure} testID={`overview-${key}`} aria-label={`${label}: ${overview[key]}`}>
              {String(overview[key])}
            </Text>
            <Text style={styles.hint}>{hint}</Text>
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', marginHorizontal: -space.xs },
  cell: { padding: space.xs },
  tile: {
    backgroundColor: colors.surface,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
    padding: space.lg,
    gap: space.xxs,
  },
  tileCritical: { borderColor: colors.danger, borderLeftWidth: 4 },
  label: { ...type.label, color: colors.inkMuted },
  figure: { ...type.figure, color: colors.abyss },
  hint: { ...type.caption, color: colors.inkFaint },
});
