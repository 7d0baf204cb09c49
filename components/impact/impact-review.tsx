// Impact review of one window: cautions first, then the affected slices, network effects and the map.
import { ScrollView, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import type { Me } from '@/shared/api';
import type { WindowImpact } from '@/shared/window-impact';
import type { Window } from '@/shared/windows';
import { isNoImpactYet, useWindowAssessMutation, useWindowImpactQuery } from '@/hooks/queries/windows';
import { Button } from '@/components/button';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { formatInstant, formatWindowRange } from '@/components/time';
import { AffectedSlicesTable } from '@/components/impact/affected-slices-table';
import { CriticalCaution } from '@/components/critical-caution';
import { ImpactMap } from '@/components/impact/impact-map';
import { OverloadedSpans, SplitsBanner } from '@/components/impact/network-effects';
import { TouchCountsView } from '@/components/impact/touch-counts';
import { touchCounts, touchedFromImpact } from '@/shared/touch-counts';
import { windowActions } from '@/components/windows/lifecycle';
import { WindowNextStep } from '@/components/windows/window-next-step';
import { Section } from '@/components/windows/section';
import { StatusBadge } from '@/components/windows/status-badge';
import { colors, CONTENT_MAX_WIDTH_PX, space, type, WIDE_LAYOUT_MIN_WIDTH_PX } from '@/constants/theme';

type Props = { window: Window; me: Me; timeZone: string; onOpenWindow: () => void };

/** Re-assessing is a side action; the first assessment is the next-step bar's. */
function AssessAction({ window: w, me }: Pick<Props, 'window' | 'me'>) {
  const assess = useWindowAssessMutation(w.id);
  if (!windowActions(me.roles, w.status).assess || !w.impactStored) return null;
  return (
    <View style={styles.row}>
      <Button label="Assess again" variant="quiet" onPress={() => assess.mutate(w.version)} busy={assess.isPending} testID="impact-assess" />
      {assess.isError ? <Text style={styles.error} role="alert">{assess.error.message}</Text> : null}
    </View>
  );
}

export function ImpactBody({ impact, wide }: { impact: WindowImpact; wide: boolean }) {
  const critical = impact.affected.filter((s) => s.critical).map((s) => s.name);
  const slices = (
    <Section title="Touched slices" aside={<Text style={styles.muted}>{impact.affected.length}</Text>}>
      <TouchCountsView counts={touchCounts(touchedFromImpact(impact.affected), null)} showDefinitions />
      <AffectedSlicesTable slices={impact.affected} />
    </Section>
  );
  const sideColumn = (
    <>
      <Section title="Map"><ImpactMap impact={impact} /></Section>
      <Section title="Spans that would overload"><OverloadedSpans overloaded={impact.overloaded} /></Section>
    </>
  );
  return (
    <View style={styles.body}>
      {critical.length > 0 ? (
        <CriticalCaution
          testID="impact-critical-caution"
          title="Caution: this work touches an emergency, health or utility service"
          lead={`Critical slices affected: ${critical.join(', ')}.`}
        />
      ) : null}
      <SplitsBanner impact={impact} />
      {wide ? (
        <View style={styles.columns}>
          <View style={styles.main}>{slices}</View>
          <View style={styles.side}>{sideColumn}</View>
        </View>
      ) : (
        <>{slices}{sideColumn}</>
      )}
    </View>
  );
}

export function ImpactReview({ window: w, me, timeZone, onOpenWindow }: Props) {
  const impact = useWindowImpactQuery(w.id);
  const { width } = useWindowDimensions();
  const wide = width >= WIDE_LAYOUT_MIN_WIDTH_PX + 300;
  let content;
  if (impact.isError && isNoImpactYet(impact.error)) {
    content = <Text style={styles.bodyText} testID="impact-none">The impact of this window has not been assessed yet.</Text>;
  } else if (impact.isError) {
    content = <ErrorState message={impact.error.message} onRetry={() => void impact.refetch()} />;
  } else if (!impact.data) {
    content = <LoadingState label="Loading the impact…" />;
  } else {
    content = (
      <>
        <Text style={styles.muted} testID="impact-computed">Worked out {formatInstant(impact.data.computedAt, timeZone)}.</Text>
        <ImpactBody impact={impact.data} wide={wide} />
      </>
    );
  }
  return (
    <ScrollView contentContainerStyle={styles.page}>
      <View style={styles.column}>
        <View style={styles.back}>
          <Button label="‹ Back to the window" variant="quiet" onPress={onOpenWindow} testID="impact-back" />
        </View>
        <Text style={styles.title} role="heading" aria-level={1}>Impact: {w.title}</Text>
        <View style={styles.row}>
          <StatusBadge status={w.status} testID="impact-window-status" />
          <Text style={styles.muted}>{formatWindowRange(w.startsAt, w.endsAt, timeZone)}</Text>
        </View>
        <WindowNextStep window={w} me={me} here={{ screen: 'impact' }} />
        <AssessAction window={w} me={me} />
        {content}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  page: { padding: space.lg, alignItems: 'center' },
  column: { width: '100%', maxWidth: CONTENT_MAX_WIDTH_PX, gap: space.md },
  title: { ...type.title, color: colors.abyss },
  back: { alignSelf: 'flex-start' },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  body: { gap: space.md },
  columns: { flexDirection: 'row', gap: space.md, alignItems: 'flex-start' },
  main: { flex: 3, minWidth: 0 },
  side: { flex: 2, minWidth: 0, gap: space.md },
  bodyText: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  error: { ...type.caption, color: colors.danger },
});
