// How the run converged: the best plan's move cost and the priority points it leaves without a place, over the rounds.
// Drawn by hand in SVG so the three axes carry round ticks (chart-ticks.ts) and titles with their units.
import { useState } from 'react';
import { StyleSheet, Text, View, type LayoutChangeEvent } from 'react-native';
import Svg, { G, Line, Polyline, Text as SvgText } from 'react-native-svg';
import type { PlanReview } from '@/shared/plans';
import { niceTicks, type AxisTicks } from '@/components/plans/chart-ticks';
import { colors, fonts, mapColors, space, type } from '@/constants/theme';

const CHART_HEIGHT_PX = 180;
/** Room for tick labels: left and right for the two value axes, below for the rounds. */
const PAD = { left: 44, right: 40, top: 10, bottom: 22 } as const;
const MOVE_COST_COLOUR = mapColors.tonePlacement;
const UNRESOLVED_COLOUR = colors.danger;
/** Ticks per axis at most; fewer on a narrow phone so the round labels do not run together. */
const MAX_TICKS = { value: 5, roundsNarrow: 4, roundsWide: 6 } as const;

type Trace = PlanReview['trace'];

/** "1.5k" for big values so a tick label stays within its margin. */
function tickText(value: number): string {
  if (Math.abs(value) >= 10_000) return `${Number((value / 1000).toPrecision(3))}k`;
  return String(Number(value.toPrecision(6)));
}

function scale(ticks: AxisTicks, fromPx: number, toPx: number) {
  const span = ticks.max - ticks.min || 1;
  return (value: number) => fromPx + ((value - ticks.min) / span) * (toPx - fromPx);
}

export function PlanConvergence({ trace }: { trace: Trace }) {
  const [widthPx, setWidthPx] = useState(320);
  const onLayout = (e: LayoutChangeEvent) => setWidthPx(Math.max(200, e.nativeEvent.layout.width));
  if (trace.length < 2) {
    return <Text style={styles.muted} testID="plan-convergence-empty">The search stopped after its first round; there is no curve to draw.</Text>;
  }
  const first = trace[0];
  const last = trace[trace.length - 1];
  const rounds = niceTicks(first.generation, last.generation, widthPx < 400 ? MAX_TICKS.roundsNarrow : MAX_TICKS.roundsWide, true);
  const cost = niceTicks(0, Math.max(...trace.map((p) => p.best.moveCost)), MAX_TICKS.value);
  const left = niceTicks(0, Math.max(...trace.map((p) => p.best.unresolvedWeight)), MAX_TICKS.value);
  const x = scale(rounds, PAD.left, widthPx - PAD.right);
  const yCost = scale(cost, CHART_HEIGHT_PX - PAD.bottom, PAD.top);
  const yLeft = scale(left, CHART_HEIGHT_PX - PAD.bottom, PAD.top);
  const line = (y: (v: number) => number, pick: (p: Trace[number]) => number) =>
    trace.map((p) => `${x(p.generation).toFixed(1)},${y(pick(p)).toFixed(1)}`).join(' ');
  const label = { fontSize: 11, fontFamily: fonts.regular, fill: colors.inkMuted };
  return (
    <View style={styles.box} onLayout={onLayout} testID="plan-convergence" accessibilityLabel={`Convergence over ${last.generation} rounds`}>
      <View style={styles.titles}>
        <Text style={[styles.axisTitle, { color: MOVE_COST_COLOUR }]} testID="plan-convergence-left-title">Move cost (points)</Text>
        <Text style={[styles.axisTitle, styles.right, { color: UNRESOLVED_COLOUR }]} testID="plan-convergence-right-title">
          Left without a place (priority points)
        </Text>
      </View>
      <Svg width={widthPx} height={CHART_HEIGHT_PX}>
        {cost.ticks.map((v) => (
          <G key={`c${v}`} testID={`plan-convergence-tick-left-${v}`}>
            <Line x1={PAD.left} x2={widthPx - PAD.right} y1={yCost(v)} y2={yCost(v)} stroke={colors.border} strokeWidth={1} />
            <SvgText {...label} x={PAD.left - 6} y={yCost(v) + 4} textAnchor="end">{tickText(v)}</SvgText>
          </G>
        ))}
        {left.ticks.map((v) => (
          <SvgText key={`u${v}`} testID={`plan-convergence-tick-right-${v}`} {...label} x={widthPx - PAD.right + 6} y={yLeft(v) + 4} textAnchor="start">
            {tickText(v)}
          </SvgText>
        ))}
        {rounds.ticks.map((v) => (
          <G key={`r${v}`} testID={`plan-convergence-tick-round-${v}`}>
            <Line x1={x(v)} x2={x(v)} y1={CHART_HEIGHT_PX - PAD.bottom} y2={CHART_HEIGHT_PX - PAD.bottom + 4} stroke={colors.inkMuted} strokeWidth={1} />
            <SvgText {...label} x={x(v)} y={CHART_HEIGHT_PX - 4} textAnchor="middle">{tickText(v)}</SvgText>
          </G>
        ))}
        <Line x1={PAD.left} x2={widthPx - PAD.right} y1={CHART_HEIGHT_PX - PAD.bottom} y2={CHART_HEIGHT_PX - PAD.bottom} stroke={colors.inkMuted} strokeWidth={1} />
        <Polyline points={line(yLeft, (p) => p.best.unresolvedWeight)} fill="none" stroke={UNRESOLVED_COLOUR} strokeWidth={2} strokeLinejoin="round" />
        <Polyline points={line(yCost, (p) => p.best.moveCost)} fill="none" stroke={MOVE_COST_COLOUR} strokeWidth={2} strokeLinejoin="round" />
      </Svg>
      <Text style={[styles.axisTitle, styles.centre]} testID="plan-convergence-bottom-title">Round of the search (generation)</Text>
      <View style={styles.legend}>
        <Key colour={MOVE_COST_COLOUR} label="Move cost in points (left axis)" />
        <Key colour={UNRESOLVED_COLOUR} label="Priority points left without a place (right axis)" />
      </View>
      <Text style={styles.muted} testID="plan-convergence-caption">
        Rounds {first.generation} to {last.generation} of the search; {last.evaluations} plans tried in all.
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
  box: { gap: space.xs, overflow: 'hidden' },
  titles: { flexDirection: 'row', justifyContent: 'space-between', gap: space.sm },
  axisTitle: { ...type.caption, color: colors.inkMuted, flexShrink: 1 },
  right: { textAlign: 'right' },
  centre: { textAlign: 'center' },
  legend: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  key: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  swatch: { width: 16, height: 4, borderRadius: 2 },
  muted: { ...type.caption, color: colors.inkMuted },
});
