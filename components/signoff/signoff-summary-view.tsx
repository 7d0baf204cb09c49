// One window's sign-off on one phone screen: what and when, who moves, what stays unresolved, risk, cautions, the MOP
// and the full plan one tap away, then the decision and the decisions so far.
import { Linking, StyleSheet, Text, View } from 'react-native';
import type { SignoffDecisionBody, SignoffSummary } from '@/shared/signoff';
import type { WindowStatus } from '@/shared/windows';
import { Button } from '@/components/button';
import { CriticalCaution } from '@/components/critical-caution';
import { PageColumn } from '@/components/page-column';
import { formatWindowRange } from '@/components/time';
import { Section } from '@/components/windows/section';
import { StatusBadge } from '@/components/windows/status-badge';
import { effectText } from '@/components/windows/window-elements-list';
import { DecisionForm } from '@/components/signoff/decision-form';
import { DecisionList } from '@/components/signoff/decision-list';
import { blockedSentence } from '@/components/signoff/signoff-words';
import { KnockOnFacts, MovesFacts, RiskFacts, UnresolvedFacts } from '@/components/signoff/summary-facts';
import { colors, space, type } from '@/constants/theme';

type Props = {
  summary: SignoffSummary;
  timeZone: string;
  codeEnrolled: boolean;
  deciding: boolean;
  decisionError: unknown;
  onDecide: (body: SignoffDecisionBody) => void;
  onOpenPlan: (href: string) => void;
  onEnrol: () => void;
  /** the printable change-board pack of this window */
  onOpenPack?: () => void;
};

function What({ summary: s, timeZone }: Pick<Props, 'summary' | 'timeZone'>) {
  const elements = s.window.elements.map((e) => (e.effect === 'reduced' ? `${e.name} (${effectText(e).toLowerCase()})` : e.name));
  return (
    <View style={styles.what}>
      <Text style={styles.title} role="heading" aria-level={1} testID="signoff-title">{s.window.title}</Text>
      <StatusBadge status={s.window.status as WindowStatus} testID="signoff-status" />
      <Text style={styles.when} testID="signoff-when">{formatWindowRange(s.window.startsAt, s.window.endsAt, timeZone)}</Text>
      <Text style={styles.muted}>
        {s.window.workType ?? 'Work'} on {elements.join(', ') || 'nothing listed'} · booked by {s.window.owner?.name ?? 'someone no longer listed'}
        {s.plan.acceptedBy ? ` · plan accepted by ${s.plan.acceptedBy.name}` : ''}
      </Text>
    </View>
  );
}

export function SignoffSummaryView(props: Props) {
  const { summary: s, timeZone } = props;
  const blocked = blockedSentence(s.me.blocked);
  return (
    <PageColumn narrow>
      <What summary={s} timeZone={timeZone} />
      {s.criticalSlices > 0 ? (
        <CriticalCaution
          testID="signoff-critical-caution" title="Critical services are moved"
          lead={`${s.criticalSlices} affected slice${s.criticalSlices === 1 ? ' carries' : 's carry'} public-safety, health or utility services.`}
        />
      ) : null}
      <MovesFacts summary={s} />
      <KnockOnFacts summary={s} />
      <UnresolvedFacts summary={s} />
      <RiskFacts summary={s} />
      <View style={styles.row}>
        <Button label="Full plan" variant="quiet" onPress={() => props.onOpenPlan(s.plan.href)} testID="signoff-open-plan" />
        {props.onOpenPack ? <Button label="Change-board pack" variant="quiet" onPress={props.onOpenPack} testID="signoff-open-pack" /> : null}
        {s.mop ? <Button label={`MOP: ${s.mop.fileName}`} variant="quiet" onPress={() => void Linking.openURL(s.mop!.href)} testID="signoff-mop" /> : (
          <Text style={styles.muted} testID="signoff-no-mop">No MOP attached.</Text>
        )}
      </View>
      <Section title={`Your decision · round ${s.window.round}`} testID="signoff-decide">
        {blocked ? <Text style={styles.body} testID="signoff-blocked">{blocked}</Text> : (
          <DecisionForm
            requireCode={s.requireCode} codeEnrolled={props.codeEnrolled} busy={props.deciding} error={props.decisionError}
            onDecide={props.onDecide} onEnrol={props.onEnrol}
          />
        )}
      </Section>
      <Section title="Decisions so far" testID="signoff-decisions">
        <DecisionList decisions={s.decisions} round={s.window.round} timeZone={timeZone} />
      </Section>
    </PageColumn>
  );
}

const styles = StyleSheet.create({
  what: { gap: space.xs },
  title: { ...type.title, color: colors.abyss },
  when: { ...type.bodyStrong, color: colors.ink },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
});
