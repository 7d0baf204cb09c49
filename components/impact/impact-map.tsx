// The network with the window's equipment in the window tone and the affected slices' current paths beside it.
import { useMemo, useState } from 'react';
import { StyleSheet, Text, useWindowDimensions, View, type LayoutChangeEvent } from 'react-native';
import type { WindowImpact } from '@/shared/window-impact';
import { useNetworkMapQuery } from '@/hooks/queries/network-map';
import { pageMapHeightPx } from '@/components/map/map-height';
import { NetworkMap } from '@/components/map/network-map';
import { affectedPathElements, windowElementIds } from '@/components/impact/impact-format';
import { colors, space, type } from '@/constants/theme';

export function ImpactMap({ impact }: { impact: WindowImpact }) {
  const map = useNetworkMapQuery();
  const windowHighlight = useMemo(() => ({ ...windowElementIds(impact), tone: 'window' as const }), [impact]);
  const pathHighlight = useMemo(() => ({ ...affectedPathElements(impact), tone: 'placement' as const }), [impact]);
  const [columnWidthPx, setColumnWidthPx] = useState<number | null>(null);
  const screen = useWindowDimensions();
  const onLayout = (e: LayoutChangeEvent) => setColumnWidthPx(e.nativeEvent.layout.width);
  if (map.isError) return <Text style={styles.muted}>The map could not be loaded: {map.error.message}</Text>;
  if (!map.data) return <Text style={styles.muted}>Loading the map…</Text>;
  return (
    <View style={styles.box} testID="impact-map" onLayout={onLayout}>
      {/* Opens on the window's equipment and its neighbours; "Show the whole network" zooms out. */}
      <NetworkMap
        data={map.data}
        highlight={windowHighlight}
        secondaryHighlight={pathHighlight}
        focus={windowHighlight}
        heightPx={pageMapHeightPx(columnWidthPx ?? screen.width, screen.height)}
      />
      <Text style={styles.muted}>
        Opens on the equipment taken out (window tone) and the sites next to it; the affected slices’ current paths beside it.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs, width: '100%' },
  muted: { ...type.caption, color: colors.inkMuted },
});
