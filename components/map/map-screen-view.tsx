// The Map area's layout: the whole network with its legend, and the selection panel beside it (wide) or under it (phone).
import { useState } from 'react';
import { StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { NetworkMap } from '@/components/map/network-map';
import { MapSelectionPanel } from '@/components/map/map-selection';
import type { MapSelection, NetworkMapData } from '@/components/map/map-types';
import { colors, space, type, WIDE_LAYOUT_MIN_WIDTH_PX } from '@/constants/theme';

type Props = {
  data: NetworkMapData;
  onOpenSlice?: (sliceId: string) => void;
  onOpenElement?: (selection: MapSelection) => void;
};

const SIDE_PANEL_WIDTH_PX = 340;

function Summary({ data }: { data: NetworkMapData }) {
  return (
    <View style={styles.summary} testID="map-summary">
      <Text style={styles.name}>{data.name ?? 'Network'}</Text>
      <Text style={styles.muted}>
        {data.sites.length} sites · {data.spans.length} spans
      </Text>
      <Text style={styles.hint}>Tap a site or a span to see its load and the slices that use it.</Text>
    </View>
  );
}

export function MapScreenView({ data, onOpenSlice, onOpenElement }: Props) {
  const [selection, setSelection] = useState<MapSelection | null>(null);
  const { width } = useWindowDimensions();
  const wide = width >= WIDE_LAYOUT_MIN_WIDTH_PX;
  const panel = selection ? (
    <MapSelectionPanel selection={selection} onClose={() => setSelection(null)} onOpenSlice={onOpenSlice} onOpenElement={onOpenElement} />
  ) : null;
  const map = <NetworkMap data={data} selected={selection} onSelect={setSelection} fillPortrait={!wide} />;

  if (wide) {
    return (
      <View style={styles.wide}>
        <View style={styles.mapWide}>{map}</View>
        <View style={styles.side}>{panel ?? <Summary data={data} />}</View>
      </View>
    );
  }
  return (
    <View style={styles.narrow}>
      <Text style={styles.narrowTitle} numberOfLines={1}>{data.name ?? 'Network'}</Text>
      <View style={styles.mapNarrow}>{map}</View>
      {panel ? <View style={styles.sheet}>{panel}</View> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wide: { flex: 1, flexDirection: 'row' },
  mapWide: { flex: 1, padding: space.lg },
  side: { width: SIDE_PANEL_WIDTH_PX, backgroundColor: colors.surface, borderLeftWidth: 1, borderLeftColor: colors.border },
  narrow: { flex: 1 },
  narrowTitle: { ...type.label, color: colors.inkMuted, paddingHorizontal: space.md, paddingTop: space.sm },
  mapNarrow: { flex: 1, padding: space.sm },
  // Under the map, at most a bit under half the screen, so the map stays in view while reading.
  sheet: { maxHeight: '45%', minHeight: 160, borderTopWidth: 1, borderTopColor: colors.border, backgroundColor: colors.surface },
  summary: { padding: space.lg, gap: space.sm },
  name: { ...type.heading, color: colors.ink },
  muted: { ...type.body, color: colors.inkMuted },
  hint: { ...type.caption, color: colors.inkMuted },
});
