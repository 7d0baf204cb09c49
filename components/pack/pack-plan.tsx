// The pack's plan sections: the accepted plan's slices and outcomes, its make-before-break steps in order, the run
// beside the greedy and exact references (as the plan screen shows them), and the risk during the window.
import { StyleSheet, Text, View } from 'react-native';
import type { ChangePack } from '@/shared/change-pack';
import { formatRiskPercent, SEVERITY_RANK } from '@/components/impact/impact-format';
import { SeverityPill } from '@/components/impact/severity-pill';
import { SeverityScale } from '@/components/impact/severity-scale';
import { PlanReferences } from '@/components/plans/plan-references';
import { formatInstant } from '@/components/time';
import { Section } from '@/components/windows/section';
import { colors, space, type } from '@/constants/theme';
import { PackTable } from './pack-table';
import { AFTER_WINDOW_WORDS, outcomeWord, sliceNote, stepFlags, stepWhere } from './pack-words';

type Plan = NonNullable<ChangePack['plan']>;

function plural(n: number, one: string, many: string) {
  return `${n} ${n === 1 ? one : many}`;
}

export function PackMoves({ plan, timeZone }: { plan: Plan; timeZone: string }) {
  const accepted = plan.acceptedAt ? ` on ${formatInstant(plan.acceptedAt, timeZone)}` : '';
  return (
    <Section title="Move plan" testID="pack-moves">
      <Text style={styles.body} testID="pack-plan-accepted">
        Accepted by {plan.acceptedByName ?? 'someone no longer listed'}{accepted}. {AFTER_WINDOW_WORDS[plan.afterWindow]}
      </Text>
      <PackTable
        label="Slices in the plan" testID="pack-moves-table"
        columns={[{ label: 'Slice', flex: 2 }, { label: 'Tenant', flex: 2 }, { label: 'Outcome' }, { label: 'Note', flex: 3 }]}
        rows={plan.slices.map((s, i) => ({ key: `${i}`, testID: `pack-move-${i}`, cells: [s.name, s.tenantName, outcomeWord(s), sliceNote(s)] }))}
      />
    </Section>
  );
}

export function PackSteps({ plan }: { plan: Plan }) {
  return (
    <Section title="Make-before-break steps" testID="pack-steps">
      <Text style={styles.muted}>
        Each step sets up the new position before the old one is released; all are done before the window starts.{' '}
        {plan.needsSpare > 0 ? `${plural(plan.needsSpare, 'step needs', 'steps need')} temporary spare capacity.` : 'Every step fits with the old and new positions held at once.'}
      </Text>
      {plan.steps.length === 0 ? <Text style={styles.body} testID="pack-steps-empty">Nothing has to move.</Text> : (
        <PackTable
          label="Steps in order" testID="pack-steps-table"
          columns={[{ label: 'Step', flex: 0.6 }, { label: 'Slice (tenant)', flex: 2 }, { label: 'What', flex: 2 }, { label: 'From → to', flex: 3 }, { label: 'Notes', flex: 2 }]}
          rows={plan.steps.map((s) => ({
            key: String(s.order), testID: `pack-step-${s.order}`,
            cells: [`${s.order}.`, `${s.sliceName} (${s.tenantName})`, `${s.kind === 'move-function' ? 'Move' : 'Reroute'} ${s.what}`, stepWhere(s), stepFlags(s)],
          }))}
        />
      )}
    </Section>
  );
}

export function PackReferences({ plan }: { plan: Plan }) {
  return (
    <Section title="References: greedy and exact" testID="pack-references">
      <PlanReferences review={plan.references} />
    </Section>
  );
}

export function PackRisk({ plan }: { plan: Plan }) {
  const sorted = [...plan.risk].sort((a, b) => SEVERITY_RANK[a.severity] - SEVERITY_RANK[b.severity] || b.failureProbability - a.failureProbability);
  return (
    <Section title="Risk during the window" testID="pack-risk">
      <SeverityScale testID="pack-risk-scale" />
      {sorted.length === 0 ? <Text style={styles.muted}>No affected slice carries a risk figure.</Text> : sorted.map((r, i) => (
        <View key={`${r.sliceName}-${i}`} style={styles.risk} testID={`pack-risk-${i}`}>
          <Text style={styles.name}>{r.sliceName}</Text>
          <SeverityPill severity={r.severity} />
          <Text style={styles.body}>{formatRiskPercent(r.failureProbability)} risk of failure</Text>
          {r.unprotected ? <Text style={styles.flag}>No backup path</Text> : null}
        </View>
      ))}
    </Section>
  );
}

const styles = StyleSheet.create({
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  risk: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  name: { ...type.bodyStrong, color: colors.ink, flexBasis: 160, flexGrow: 1 },
  flag: { ...type.label, color: colors.danger },
});
