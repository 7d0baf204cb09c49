// Risk to each affected slice during the window, where the plan leaves it: chance of an unplanned failure, lost backup.
import { StyleSheet, Text, View } from 'react-native';
import type { PlanReview } from '@/shared/plans';
import { formatRiskPercent, SEVERITY_RANK } from '@/components/impact/impact-format';
import { SeverityPill } from '@/components/impact/severity-pill';
import { SeverityScale } from '@/components/impact/severity-scale';
import { colors, space, type } from '@/constants/theme';

export function PlanRisk({ risk, sliceName }: { risk: PlanReview['risk']; sliceName: (id: string) => string }) {
  if (risk.length === 0) return <Text style={styles.muted}>No affected slice carries a risk figure.</Text>;
  const sorted = [...risk].sort((a, b) => SEVERITY_RANK[a.severity] - SEVERITY_RANK[b.severity] || b.failureProbability - a.failureProbability);
  return (
    <View style={styles.list} testID="plan-risk">
      <SeverityScale testID="plan-risk-scale" />
      {sorted.map((r) => (
        <View key={r.slice} style={styles.row} testID={`plan-risk-${r.slice}`}>
          <Text style={styles.name}>{sliceName(r.slice)}</Text>
          <SeverityPill severity={r.severity} />
          <Text style={styles.body}>{formatRiskPercent(r.failureProbability)} risk of failure</Text>
          {r.unprotected ? <Text style={styles.flag} testID={`plan-risk-unprotected-${r.slice}`}>No backup path</Text> : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  name: { ...type.bodyStrong, color: colors.ink, flexBasis: 160, flexGrow: 1 },
  body: { ...type.body, color: colors.ink },
  flag: { ...type.label, color: colors.danger },
  muted: { ...type.caption, color: colors.inkMuted },
});
