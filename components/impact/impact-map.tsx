// The network with the window's equipment in the window tone and the affected slices' current paths beside it.
import { useMemo } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { WindowImpact } from '@/shared/window-impact';
import { useNetworkMapQuery } from '@/hooks/queries/network-map';
import { NetworkMap } from '@/components/map/network-map';
import { affectedPathElements, windowElementIds } from '@/components/impact/impact-format';
import { colors, space, type } from '@/constants/theme';

/** Tall enough for the coast and the legend on a phone, short enough to scroll past. */
const MAP_HEIGHT_PX = 420;

export function ImpactMap({ impact }: { impact: WindowImpact }) {
  const map = useNetworkMapQuery();
  const windowHighlight = useMemo(() => ({ ...windowElementIds(impact), tone: 'window' as const }), [impact]);
  const pathHighlight = useMemo(() => ({ ...affectedPathElements(impact), tone: 'placement' as const }), [impact]);
  if (map.isError) return <Text style={styles.muted}>The map could not be loaded: {map.error.message}</Text>;
  if (!map.data) return <Text style={styles.muted}>Loading the map…</Text>;
  return (
    <View style={styles.box} testID="impact-map">
      {/* A fixed-height box the map fills: the map's compact frame collapses to its border inside a sized column. */}
      <View style={styles.frame}>
        <NetworkMap data={map.data} highlight={windowHighlight} secondaryHighlight={pathHighlight} />
      </View>
      <Text style={styles.muted}>Equipment taken out is drawn in the window tone; the affected slices’ current paths beside it.</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs },
  frame: { height: MAP_HEIGHT_PX },
  muted: { ...type.caption, color: colors.inkMuted },
});
