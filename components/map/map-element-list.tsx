// The map in words: every site and span it draws, grouped by kind, each a button that selects it on the map
// and reads its load as text. Keyboard and screen-reader users reach the network through this list.
import { useMemo, useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { mapElementGroups, siteDetail, spanDetail, spanName } from '@/components/map/map-element-labels';
import type { MapSelection, NetworkMapData } from '@/components/map/map-types';
import { colors, radii, space, type } from '@/constants/theme';

type Props = {
  data: NetworkMapData;
  selected: MapSelection | null;
  onSelect: (selection: MapSelection) => void;
  /** open at first (wide screens, where there is room); phones start with just the toggle */
  initiallyOpen: boolean;
};

function Item({ name, detail, selected, onPress, testID }: {
  name: string; detail: string; selected: boolean; onPress: () => void; testID: string;
}) {
  return (
    <Pressable role="button" aria-pressed={selected} onPress={onPress} testID={testID}
      style={({ pressed }) => [styles.item, selected && styles.itemSelected, pressed && styles.pressed]}>
      <Text style={styles.itemText}>
        <Text style={styles.itemName}>{name}</Text>
        <Text style={styles.itemDetail}>{`, ${detail}`}</Text>
      </Text>
    </Pressable>
  );
}

export function MapElementList({ data, selected, onSelect, initiallyOpen }: Props) {
  const [open, setOpen] = useState(initiallyOpen);
  const groups = useMemo(() => mapElementGroups(data), [data]);
  const names = useMemo(() => new Map(data.sites.map((s) => [s.id, s.name])), [data.sites]);
  const count = data.sites.length + data.spans.length;
  const isSelected = (kind: MapSelection['kind'], id: string) => selected?.kind === kind && selected.id === id;
  return (
    <View style={styles.box} testID="map-list">
      <View style={styles.head}>
        <Text style={styles.heading} role="heading" aria-level={2}>Sites and spans on the map</Text>
        <Pressable role="button" aria-expanded={open} onPress={() => setOpen((o) => !o)} testID="map-list-toggle"
          style={({ pressed }) => [styles.toggle, pressed && styles.pressed]}>
          <Text style={styles.toggleText}>{open ? 'Hide the list' : `Show the list (${count})`}</Text>
        </Pressable>
      </View>
      {open ? groups.map((group) => (
        <View key={group.title} style={styles.group} testID={`map-list-group-${group.kind === 'sites' ? group.siteKind : 'spans'}`}>
          <Text style={styles.groupTitle} role="heading" aria-level={3}>
            {`${group.title} (${group.kind === 'sites' ? group.sites.length : group.spans.length})`}
          </Text>
          {group.kind === 'sites'
            ? group.sites.map((site) => (
              <Item key={site.id} name={site.name} testID={`map-list-site-${site.id}`}
                detail={siteDetail(site)}
                selected={isSelected('site', site.id)} onPress={() => onSelect({ kind: 'site', id: site.id })} />
            ))
            : group.spans.map((span) => (
              <Item key={span.id} name={spanName(span, names)} testID={`map-list-span-${span.id}`}
                detail={spanDetail(span)}
                selected={isSelected('span', span.id)} onPress={() => onSelect({ kind: 'span', id: span.id })} />
            ))}
        </View>
      )) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { padding: space.md, gap: space.sm },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: space.sm },
  heading: { ...type.heading, color: colors.ink },
  toggle: { minHeight: 44, justifyContent: 'center', paddingHorizontal: space.sm, borderRadius: radii.md },
  toggleText: { ...type.label, color: colors.primary },
  group: { gap: space.xxs },
  groupTitle: { ...type.label, color: colors.ink, marginTop: space.sm },
  item: { minHeight: 44, justifyContent: 'center', paddingHorizontal: space.sm, borderRadius: radii.md },
  itemSelected: { backgroundColor: colors.primarySoft, borderLeftWidth: 3, borderLeftColor: colors.primary },
  pressed: { backgroundColor: colors.primarySoft },
  itemText: { ...type.body, color: colors.ink },
  itemName: { fontFamily: type.bodyStrong.fontFamily },
  itemDetail: { color: colors.inkMuted },
});
