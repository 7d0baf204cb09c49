// One site: its compute and load, where it is, the slices hosted on it or passing through, and its spans.
import { Link } from 'expo-router';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { SiteDetail } from '@/shared/inventory';
import { UtilisationBar } from '@/components/table/utilisation-bar';
import { DetailFrame, Facts, Section } from '@/components/inventory/detail-frame';
import { InventoryMap } from '@/components/inventory/inventory-map';
import { SliceUseList } from '@/components/inventory/slice-use-list';
import { Badge } from '@/components/inventory/badges';
import { formatCpu, formatGbps, formatHours, siteKindLabel } from '@/components/inventory/format';
import { latencyLabel } from '@/components/inventory/spans-table';
import { colors, radii, space, type } from '@/constants/theme';

function SpanLinks({ detail }: { detail: SiteDetail }) {
  if (detail.spans.length === 0) return <Text style={styles.muted}>No span ends here.</Text>;
  return (
    <View style={styles.list} testID="site-spans">
      {detail.spans.map((span) => {
        const other = span.a === detail.site.id ? span.bName : span.aName;
        return (
          <Link key={span.id} href={{ pathname: '/network/spans/[id]', params: { id: span.id } }} asChild>
            <Pressable role="link" style={styles.row} testID={`site-span-${span.id}`}>
              <View style={styles.rowMain}>
                <Text style={styles.link}>{`to ${other}`}</Text>
                <Text style={styles.muted}>{`${span.id} · ${formatGbps(span.capacityGbps)} · ${latencyLabel(span)}`}</Text>
              </View>
              <View style={styles.bar}>
                <UtilisationBar share={span.utilisation} />
              </View>
            </Pressable>
          </Link>
        );
      })}
    </View>
  );
}

export function SiteDetailView({ detail }: { detail: SiteDetail }) {
  const { site } = detail;
  return (
    <DetailFrame
      testID="site-detail"
      kicker={`${siteKindLabel(site.kind)} site`}
      title={site.name}
      backHref="/network"
      backLabel="Network"
      badges={<Badge label={`${site.lat.toFixed(4)}, ${site.lon.toFixed(4)}`} />}
    >
      <Facts
        items={[
          { label: 'Compute', value: formatCpu(site.cpu) },
          { label: 'In use', value: formatCpu(site.cpuUsed) },
          { label: 'Utilisation', value: <UtilisationBar share={site.utilisation} testID="site-utilisation" /> },
          { label: 'MTBF', value: formatHours(site.mtbfHours) },
          { label: 'MTTR', value: formatHours(site.mttrHours) },
        ]}
      />
      <InventoryMap compact highlight={{ sites: [site.id], spans: detail.spans.map((s) => s.id) }} selected={{ kind: 'site', id: site.id }} />
      <Section title={`Hosted here (${detail.hosted.length})`}>
        <SliceUseList uses={detail.hosted} emptyText="No slice has a function on this site." testID="site-hosted" />
      </Section>
      <Section title={`Passing through (${detail.transit.length})`}>
        <SliceUseList uses={detail.transit} emptyText="No slice's ties pass through this site." testID="site-transit" />
      </Section>
      <Section title={`Spans (${detail.spans.length})`}>
        <SpanLinks detail={detail} />
      </Section>
    </DetailFrame>
  );
}

const styles = StyleSheet.create({
  list: { borderWidth: 1, borderColor: colors.border, borderRadius: radii.lg, overflow: 'hidden' },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, padding: space.md, borderBottomWidth: 1, borderBottomColor: colors.surfaceSunken },
  rowMain: { flex: 1, gap: space.xxs },
  bar: { width: 140 },
  link: { ...type.bodyStrong, color: colors.primary },
  muted: { ...type.caption, color: colors.inkMuted },
});
