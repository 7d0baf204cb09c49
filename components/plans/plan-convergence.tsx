// How the run converged: the best plan's move cost and unresolved weight over the rounds of the search.
import { useState } from 'react';
import { StyleSheet, Text, View, type LayoutChangeEvent } from 'react-native';
import { LineChart } from 'react-native-gifted-charts';
import type { PlanReview } from '@/shared/plans';
import { convergenceSeries } from '@/components/plans/plan-review-data';
import { colors, mapColors, space, type } from '@/constants/theme';

const CHART_HEIGHT_PX = 160;
/** Room the chart's own axes take beside the plotted area. */
const AXES_WIDTH_PX = 90;
const MOVE_COST_COLOUR = mapColors.tonePlacement;
const UNRESOLVED_COLOUR = colors.danger;

export function PlanConvergence({ trace }: { trace: PlanReview['trace'] }) {
  const [widthPx, setWidthPx] = useState(300);
  const series = convergenceSeries(trace);
  const onLayout = (e: LayoutChangeEvent) => setWidthPx(Math.max(160, e.nativeEvent.layout.width));
  if (series.moveCost.length < 2) {
    return <Text style={styles.muted} testID="plan-convergence-empty">The search stopped after its first round; there is no curve to draw.</Text>;
  }
  const plotWidth = widthPx - AXES_WIDTH_PX;
  const spacing = Math.max(2, plotWidth / (series.moveCost.length - 1));
  const last = trace[trace.length - 1];
  return (
    <View style={styles.box} onLayout={onLayout} testID="plan-convergence" accessibilityLabel={`Convergence over ${last.generation} rounds`}>
      <LineChart
        data={series.moveCost}
        secondaryData={series.unresolved}
        secondaryYAxis={{ yAxisColor: UNRESOLVED_COLOUR, yAxisTextStyle: styles.axisText, noOfSections: 4 }}
        secondaryLineConfig={{ color: UNRESOLVED_COLOUR, thickness: 2 }}
        color={MOVE_COST_COLOUR}
        thickness={2}
        height={CHART_HEIGHT_PX}
        width={plotWidth}
        spacing={spacing}
        initialSpacing={0}
        noOfSections={4}
        hideDataPoints
        disableScroll
        yAxisTextStyle={styles.axisText}
        rulesColor={colors.border}
        xAxisColor={colors.border}
        yAxisColor={MOVE_COST_COLOUR}
      />
      <View style={styles.legend}>
        <Key colour={MOVE_COST_COLOUR} label="Move cost (left axis)" />
        <Key colour={UNRESOLVED_COLOUR} label="Unresolved weight (right axis)" />
      </View>
      <Text style={styles.muted} testID="plan-convergence-caption">
        Rounds {trace[0].generation} to {last.generation} of the search along the bottom; {last.evaluations} plans tried in all.
      </Text>
    </View>
  );
}

function Key({ colour, label }: { colour: string; label: string }) {
  return (
    <View style={styles.key}>
      <View style={[styles.swatch, { backgroundColor: colour }]} />
      <Text style={styles.muted}>{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, overflow: 'hidden' },
  axisText: { ...type.caption, color: colors.inkMuted },
  legend: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  key: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  swatch: { width: 16, height: 4, borderRadius: 2 },
  muted: { ...type.caption, color: colors.inkMuted },
});
