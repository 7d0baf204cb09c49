// Old and new positions on the network map: today's paths in one tone, the plan's in another, with a legend.
// Every slice of the plan is drawn, knock-on moves of untouched slices included.
import { useMemo, useState } from 'react';
import { StyleSheet, Text, useWindowDimensions, View, type LayoutChangeEvent } from 'react-native';
import type { PlanSlice } from '@/shared/plans';
import { useNetworkMapQuery } from '@/hooks/queries/network-map';
import { pageMapHeightPx } from '@/components/map/map-height';
import { NetworkMap } from '@/components/map/network-map';
import { planMapElements } from '@/components/plans/plan-review-data';
import { colors, space, type } from '@/constants/theme';

const TONE_WORDS = { placement: 'Before (today)', alternative: 'After (planned)' } as const;

/** The caption without a chosen slice; knock-on moves are named so the extra paths are not a surprise. */
function everyChange(knockOn: number): string {
  const extra = knockOn === 0 ? '' : `, the ${knockOn} ${knockOn === 1 ? 'slice' : 'slices'} moved to make room included`;
  return `Every change in the plan${extra}: sites and paths left, and where they go.`;
}

type Props = { slices: readonly PlanSlice[]; selectedSlice: string | null };

export function PlanMap({ slices, selectedSlice }: Props) {
  const map = useNetworkMapQuery();
  const elements = useMemo(() => planMapElements(slices, selectedSlice), [slices, selectedSlice]);
  // The plan's new positions are drawn on top: where old and new share a span, it reads as kept.
  const after = useMemo(() => ({ ...elements.after, tone: 'alternative' as const }), [elements]);
  const before = useMemo(() => ({ ...elements.before, tone: 'placement' as const }), [elements]);
  // The area to open on: everything the plan leaves and everything it goes to.
  const focus = useMemo(
    () => ({ sites: [...elements.before.sites, ...elements.after.sites], spans: [...elements.before.spans, ...elements.after.spans] }),
    [elements],
  );
  const [columnWidthPx, setColumnWidthPx] = useState<number | null>(null);
  const screen = useWindowDimensions();
  const onLayout = (e: LayoutChangeEvent) => setColumnWidthPx(e.nativeEvent.layout.width);
  if (map.isError) return <Text style={styles.muted}>The map could not be loaded: {map.error.message}</Text>;
  if (!map.data) return <Text style={styles.muted}>Loading the map…</Text>;
  const knockOn = slices.filter((s) => s.madeRoomFor.length > 0).length;
  const chosen = selectedSlice ? slices.find((s) => s.slice === selectedSlice)?.name ?? selectedSlice : null;
  return (
    <View style={styles.box} testID="plan-map" onLayout={onLayout}>
      <NetworkMap
        data={map.data}
        highlight={after}
        secondaryHighlight={before}
        toneLabels={TONE_WORDS}
        focus={focus}
        heightPx={pageMapHeightPx(columnWidthPx ?? screen.width, screen.height)}
      />
      <Text style={styles.muted} testID="plan-map-caption">
        {chosen ? `${chosen}: its whole placement before and after the move.` : everyChange(knockOn)}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs, width: '100%' },
  muted: { ...type.caption, color: colors.inkMuted },
});
