// The affected slices: a row per slice on wide panes, a card per slice on phones; critical ones first and marked.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { AffectedSlice } from '@/shared/window-impact';
import { formatRiskPercent, sortAffected } from '@/components/impact/impact-format';
import { sstName } from '@/shared/slice-service-type';
import { ReasonChips } from '@/components/impact/reason-chips';
import { SeverityPill } from '@/components/impact/severity-pill';
import { SeverityScale } from '@/components/impact/severity-scale';
import { calendarColors, colors, radii, space, type } from '@/constants/theme';

/** Below this pane width the columns would truncate every value, so each slice becomes a card. */
const COLUMNS_MIN_WIDTH_PX = 640;

const HEADERS = ['Slice', 'Why', 'Service', 'Priority', 'Severity', 'Risk of failure'] as const;
const FLEX = [3, 2.4, 1.1, 0.9, 1.1, 1] as const;

function SliceName({ slice }: { slice: AffectedSlice }) {
  return (
    <View style={styles.nameBox}>
      <Text style={styles.name}>{slice.name}</Text>
      <Text style={styles.muted}>{slice.tenant.name}</Text>
      {slice.critical ? <Text style={styles.critical} testID={`impact-critical-${slice.slice}`}>Critical service</Text> : null}
    </View>
  );
}

function WideRow({ slice }: { slice: AffectedSlice }) {
  const cells = [
    <SliceName key="n" slice={slice} />,
    <ReasonChips key="r" reasons={slice.reasons} />,
    <Text key="s" style={styles.body}>{sstName(slice.sst)}</Text>,
    <Text key="p" style={styles.body}>{slice.priority}</Text>,
    <SeverityPill key="v" severity={slice.severity} />,
    <Text key="k" style={[styles.body, styles.figure]}>{formatRiskPercent(slice.failureProbability)}</Text>,
  ];
  return (
    <View style={[styles.row, slice.critical && styles.criticalRow]} testID={`impact-slice-${slice.slice}`}>
      {cells.map((cell, i) => <View key={i} style={{ flex: FLEX[i] }}>{cell}</View>)}
    </View>
  );
}

function Card({ slice }: { slice: AffectedSlice }) {
  return (
    <View style={[styles.card, slice.critical && styles.criticalRow]} testID={`impact-slice-${slice.slice}`}>
      <View style={styles.cardHead}>
        <SliceName slice={slice} />
        <SeverityPill severity={slice.severity} />
      </View>
      <ReasonChips reasons={slice.reasons} />
      <Text style={styles.muted}>
        {sstName(slice.sst)} · priority {slice.priority} · {formatRiskPercent(slice.failureProbability)} risk of failure
      </Text>
    </View>
  );
}

export function AffectedSlicesTable({ slices }: { slices: readonly AffectedSlice[] }) {
  const [widthPx, setWidthPx] = useState(0);
  const wide = widthPx >= COLUMNS_MIN_WIDTH_PX;
  const sorted = sortAffected(slices);
  if (slices.length === 0) return <Text style={styles.body} testID="impact-no-slices">No slice is affected by this window.</Text>;
  return (
    <View testID="impact-affected" onLayout={(e) => setWidthPx(e.nativeEvent.layout.width)} style={styles.frame}>
      {wide ? (
        <View style={[styles.row, styles.headRow]}>
          {HEADERS.map((h, i) => <Text key={h} style={[styles.head, { flex: FLEX[i] }]}>{h}</Text>)}
        </View>
      ) : null}
      {sorted.map((slice) => (wide ? <WideRow key={slice.slice} slice={slice} /> : <Card key={slice.slice} slice={slice} />))}
      <SeverityScale testID="impact-severity-scale" />
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { gap: space.xs },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingVertical: space.sm, paddingHorizontal: space.sm, borderRadius: radii.sm },
  headRow: { borderBottomWidth: 1, borderBottomColor: colors.border },
  head: { ...type.label, color: colors.inkMuted },
  card: { gap: space.xs, padding: space.md, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border },
  cardHead: { flexDirection: 'row', alignItems: 'flex-start', gap: space.sm },
  criticalRow: { borderLeftWidth: 4, borderLeftColor: calendarColors.critical, backgroundColor: calendarColors.criticalSoft },
  nameBox: { flex: 1, gap: space.xxs },
  name: { ...type.bodyStrong, color: colors.ink },
  critical: { ...type.label, color: calendarColors.critical },
  body: { ...type.body, color: colors.ink },
  figure: { textAlign: 'right' },
  muted: { ...type.caption, color: colors.inkMuted },
});
