// The network map inside the inventory screens: whole (Network screen) or compact with one element's
// or one slice's placement highlighted (details). Taps on sites and spans open their details.
import { useRouter } from 'expo-router';
import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import { useNetworkMapQuery } from '@/hooks/queries/network-map';
import { NetworkMap } from '@/components/map/network-map';
import type { MapHighlight } from '@/components/map/map-highlight';
import type { MapSelection } from '@/components/map/map-types';
import { colors, space, type } from '@/constants/theme';

type Props = { highlight?: MapHighlight; selected?: MapSelection | null; compact?: boolean };

export function InventoryMap({ highlight, selected = null, compact = false }: Props) {
  const map = useNetworkMapQuery();
  const router = useRouter();
  const open = (selection: MapSelection) =>
    router.push(
      selection.kind === 'site'
        ? { pathname: '/network/sites/[id]', params: { id: selection.id } }
        : { pathname: '/network/spans/[id]', params: { id: selection.id } },
    );
  if (map.isError) {
    return (
      <Text style={styles.note} testID="inventory-map-error">
        The map could not be loaded: {map.error.message}
      </Text>
    );
  }
  if (!map.data) {
    return (
      <View style={[styles.waiting, compact && styles.waitingCompact]} testID="inventory-map-loading">
        <ActivityIndicator color={colors.primary} aria-label="Loading the map" />
      </View>
    );
  }
  if (map.data.sites.length === 0) return <Text style={styles.note}>No sites to draw yet.</Text>;
  return <NetworkMap data={map.data} highlight={highlight} selected={selected} onSelect={open} compact={compact} />;
}

const styles = StyleSheet.create({
  waiting: { flex: 1, alignItems: 'center', justifyContent: 'center', minHeight: 260 },
  waitingCompact: { flex: 0 },
  note: { ...type.body, color: colors.inkMuted, padding: space.md },
});
