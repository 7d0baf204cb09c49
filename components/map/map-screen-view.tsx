// The Map area's layout: the page's heading, the whole network with its legend, the selection panel and the list
// of sites and spans beside the map (wide) or under it (phone).
import { useState } from 'react';
import { ScrollView, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { NetworkMap } from '@/components/map/network-map';
import { MapElementList } from '@/components/map/map-element-list';
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
      <Text style={styles.hint}>Tap a site or a span, or pick one from the list, to see its load and the slices that use it.</Text>
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
  const list = <MapElementList data={data} selected={selection} onSelect={setSelection} initiallyOpen={wide} />;

  if (wide) {
    return (
      <View style={styles.wide}>
        <View style={styles.mapWide}>{map}</View>
        <ScrollView style={styles.side} contentContainerStyle={styles.sideContent}>
          <Text style={styles.pageTitle} role="heading" aria-level={1} testID="map-heading">Network map</Text>
          {panel ?? <Summary data={data} />}
          <View style={styles.rule} />
          {list}
        </ScrollView>
      </View>
    );
  }
  return (
    <View style={styles.narrow}>
      <View style={styles.narrowHead}>
        <Text style={styles.narrowTitle} role="heading" aria-level={1} testID="map-heading">Network map</Text>
        <Text style={styles.narrowName} numberOfLines={1}>{data.name ?? 'Network'}</Text>
      </View>
      <View style={styles.mapNarrow}>{map}</View>
      <ScrollView style={[styles.sheet, panel ? styles.sheetWithPanel : null]}>
        {panel}
        {list}
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  wide: { flex: 1, flexDirection: 'row' },
  mapWide: { flex: 1, padding: space.lg },
  side: { width: SIDE_PANEL_WIDTH_PX, flexGrow: 0, backgroundColor: colors.surface, borderLeftWidth: 1, borderLeftColor: colors.border },
  sideContent: { paddingTop: space.md },
  pageTitle: { ...type.title, color: colors.ink, paddingHorizontal: space.lg },
  rule: { height: 1, backgroundColor: colors.border },
  narrow: { flex: 1 },
  narrowHead: { flexDirection: 'row', alignItems: 'baseline', gap: space.sm, paddingHorizontal: space.md, paddingTop: space.sm },
  narrowTitle: { ...type.heading, color: colors.ink, flexShrink: 0 },
  narrowName: { ...type.label, color: colors.inkMuted, flexShrink: 1 },
  mapNarrow: { flex: 1, padding: space.sm },
  // Under the map, at most a bit under half the screen, so the map stays in view while reading.
  sheet: { maxHeight: '45%', flexGrow: 0, borderTopWidth: 1, borderTopColor: colors.border, backgroundColor: colors.surface },
  sheetWithPanel: { minHeight: 160 },
  summary: { padding: space.lg, gap: space.sm },
  name: { ...type.heading, color: colors.ink },
  muted: { ...type.body, color: colors.inkMuted },
  hint: { ...type.caption, color: colors.inkMuted },
});
