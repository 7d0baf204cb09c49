// The facts of a plan an approver weighs: who is moved (and moved to make room), what stays unresolved, and the
// highest risks.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { SignoffSummary } from '@/shared/signoff';
import { Button } from '@/components/button';
import { TouchCountsView } from '@/components/impact/touch-counts';
import { SeverityScale } from '@/components/impact/severity-scale';
import { formatRiskPercent } from '@/components/impact/impact-format';
import { SeverityPill } from '@/components/impact/severity-pill';
import { madeRoomSentence } from '@/components/plans/plan-format';
import { Section } from '@/components/windows/section';
import { RiskPill } from '@/components/signoff/risk-pill';
import { quorumSentence } from '@/components/signoff/signoff-words';
import { colors, space, type } from '@/constants/theme';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** A phone screen shows a handful of risks first; the rest are one tap away. */
export const RISKS_SHOWN_FIRST = 5;

function tenantLine(t: SignoffSummary['tenants'][number]): string {
  const parts = t.affected > 0 ? [`${plural(t.affected, 'touched slice', 'touched slices')}: ${t.moving} move`] : [];
  if (t.protectionLost > 0) parts.push(`${t.protectionLost} lose protection but stay up`);
  // The rest of the tenant's touched slices are the ones the plan cannot keep, so the parts always add up.
  const notKept = t.affected - t.moving - t.protectionLost;
  if (notKept > 0) parts.push(`${notKept} cannot be kept`);
  if (t.knockOn > 0) parts.push(`${t.knockOn} moved to make room`);
  return parts.join(' · ');
}

export function MovesFacts({ summary: s }: { summary: SignoffSummary }) {
  const tenants = s.tenants.length;
  return (
    <Section title="Who is moved" testID="signoff-moves">
      <Text style={styles.lead} testID="signoff-moves-lead">
        {plural(s.totals.affected, 'touched slice', 'touched slices')} of {plural(tenants, 'tenant', 'tenants')}: {s.totals.moving} move
        {s.totals.stays ? ` · ${s.totals.stays} stay put` : ''}
        {s.totals.unresolved ? ` · ${s.totals.unresolved} cannot be kept` : ''}
        {s.totals.knockOn ? ` · ${plural(s.totals.knockOn, 'more slice', 'more slices')} moved to make room` : ''}
      </Text>
      {s.touch ? <TouchCountsView counts={s.touch} /> : null}
      {s.tenants.map((t) => (
        <View key={t.id} style={styles.line} testID={`signoff-tenant-${t.id}`}>
          <Text style={styles.body}>{t.name}</Text>
          <Text style={styles.figure}>{tenantLine(t)}</Text>
        </View>
      ))}
    </Section>
  );
}

/** Slices the work does not touch, moved so that affected ones keep running: each with whom it makes room for. */
export function KnockOnFacts({ summary: s }: { summary: SignoffSummary }) {
  if (s.knockOn.length === 0) return null;
  return (
    <Section title={`Moved to make room (${s.knockOn.length})`} testID="signoff-knock-on">
      <Text style={styles.muted}>The work does not touch these slices; the plan moves them so that affected slices keep running.</Text>
      {s.knockOn.map((k) => (
        <View key={k.slice} style={styles.item} testID={`signoff-knock-on-${k.slice}`}>
          <Text style={styles.strong}>{k.name} · {k.tenantName}</Text>
          <Text style={styles.body}>{madeRoomSentence(k.outcome, k.madeRoomFor)}.</Text>
        </View>
      ))}
    </Section>
  );
}

export function UnresolvedFacts({ summary: s }: { summary: SignoffSummary }) {
  if (s.unresolved.length === 0) return null;
  return (
    <Section title={`Unresolved (${s.unresolved.length})`} testID="signoff-unresolved">
      {s.unresolved.map((u) => (
        <View key={u.slice} style={styles.item}>
          <Text style={styles.strong}>{u.name} · {u.tenantName}</Text>
          {u.reason ? <Text style={styles.muted}>{u.reason}</Text> : null}
          <Text style={u.outageAccepted ? styles.muted : styles.danger}>
            {u.outageAccepted ? 'The planner accepted an outage for this slice.' : 'No decision recorded for this slice.'}
          </Text>
        </View>
      ))}
    </Section>
  );
}

export function RiskFacts({ summary: s }: { summary: SignoffSummary }) {
  const [all, setAll] = useState(false);
  const total = s.highestRisks.length;
  const shown = all ? s.highestRisks : s.highestRisks.slice(0, RISKS_SHOWN_FIRST);
  return (
    <Section title="Risk" aside={<RiskPill risk={s.riskClass} testID="signoff-risk" />} testID="signoff-risk-section">
      <Text style={styles.body} testID="signoff-quorum">{quorumSentence(s.approvals, s.quorum)} ({s.riskClass === 'high' ? 'critical service, high risk or unresolved slices' : 'no critical service or high risk'})</Text>
      <SeverityScale testID="signoff-risk-scale" />
      {total > 0 ? (
        <Text style={styles.muted} testID="signoff-risk-shown">
          {shown.length === total ? `All ${plural(total, 'slice', 'slices')} shown, worst first` : `${shown.length} of ${total} slices shown, worst first`}
        </Text>
      ) : null}
      {shown.map((r) => (
        <View key={r.slice} style={styles.line}>
          <Text style={styles.body}>{r.name}{r.unprotected ? ' (no backup path)' : ''}</Text>
          <View style={styles.figures}>
            <SeverityPill severity={r.severity} />
            <Text style={styles.figure}>{formatRiskPercent(r.failureProbability)} risk of failure</Text>
          </View>
        </View>
      ))}
      {total > RISKS_SHOWN_FIRST ? (
        <Button
          label={all ? `Show the worst ${RISKS_SHOWN_FIRST} only` : `Show all ${total}`} variant="quiet"
          onPress={() => setAll((a) => !a)} testID="signoff-risk-show-all"
        />
      ) : null}
    </Section>
  );
}

const styles = StyleSheet.create({
  lead: { ...type.bodyStrong, color: colors.ink },
  line: { flexDirection: 'row', justifyContent: 'space-between', gap: space.sm, flexWrap: 'wrap' },
  item: { gap: space.xxs },
  body: { ...type.body, color: colors.ink, flexShrink: 1 },
  strong: { ...type.bodyStrong, color: colors.ink },
  figures: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  figure: { ...type.label, color: colors.inkMuted },
  muted: { ...type.caption, color: colors.inkMuted },
  danger: { ...type.caption, color: colors.danger },
});
