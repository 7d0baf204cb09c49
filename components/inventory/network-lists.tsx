// The Network screen's list side: sites or spans as tables, and (on phones, where no side pane shows it) the map.
import { useState } from 'react';
import { usePathname, useRouter } from 'expo-router';
import { StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { InventoryMap } from '@/components/inventory/inventory-map';
import { Segmented, type Choice } from '@/components/inventory/segmented';
import { selectionFromPath } from '@/components/inventory/selection';
import { SitesTable } from '@/components/inventory/sites-table';
import { SpansTable } from '@/components/inventory/spans-table';
import { useListHeadingLevel } from '@/components/inventory/split-view';
import { colors, space, type, WIDE_LAYOUT_MIN_WIDTH_PX } from '@/constants/theme';

type Tab = 'sites' | 'spans' | 'map';

export function NetworkLists() {
  const headingLevel = useListHeadingLevel();
  const router = useRouter();
  const selection = selectionFromPath(usePathname());
  // Opened straight on a span's page, the list starts on spans so the selected row is in view.
  const [tab, setTab] = useState<Tab>(selection?.kind === 'span' ? 'spans' : 'sites');
  const wide = useWindowDimensions().width >= WIDE_LAYOUT_MIN_WIDTH_PX;
  // Wide screens show the map beside the list whenever nothing is selected, so the tab is for phones.
  const choices: Choice<Tab>[] = [
    { value: 'sites', label: 'Sites' },
    { value: 'spans', label: 'Spans' },
    ...(wide ? [] : [{ value: 'map' as const, label: 'Map' }]),
  ];
  const shown = wide && tab === 'map' ? 'sites' : tab;
  return (
    <View style={styles.pane} testID="network-lists">
      <Text style={styles.title} role="heading" aria-level={headingLevel}>
        Network
      </Text>
      <Segmented choices={choices} value={shown} onChange={setTab} testID="network-tab" label="Network lists" />
      <View style={styles.body}>
        {shown === 'sites' ? (
          <SitesTable
            selectedId={selection?.kind === 'site' ? selection.id : null}
            onOpen={(id) => router.push({ pathname: '/network/sites/[id]', params: { id } })}
          />
        ) : null}
        {shown === 'spans' ? (
          <SpansTable
            selectedId={selection?.kind === 'span' ? selection.id : null}
            onOpen={(id) => router.push({ pathname: '/network/spans/[id]', params: { id } })}
          />
        ) : null}
        {shown === 'map' ? <InventoryMap /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  pane: { flex: 1, gap: space.sm, padding: space.md },
  title: { ...type.display, color: colors.abyss },
  body: { flex: 1 },
});
