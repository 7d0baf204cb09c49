// One span: its ends, capacity, length and latency, its load, shared-risk groups and the slices whose ties use it.
import { Link } from 'expo-router';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { SpanDetail } from '@/shared/inventory';
import { UtilisationBar } from '@/components/table/utilisation-bar';
import { DetailFrame, Facts, Note, Section } from '@/components/inventory/detail-frame';
import { InventoryMap } from '@/components/inventory/inventory-map';
import { SliceUseList } from '@/components/inventory/slice-use-list';
import { Badge } from '@/components/inventory/badges';
import { formatGbps, formatHours, formatKm } from '@/components/inventory/format';
import { latencyLabel } from '@/components/inventory/spans-table';
import { colors, space, type } from '@/constants/theme';

function SiteLink({ id, name }: { id: string; name: string }) {
  return (
    <Link href={{ pathname: '/network/sites/[id]', params: { id } }} asChild>
      <Pressable role="link" testID={`span-end-${id}`}>
        <Text style={styles.link}>{name}</Text>
      </Pressable>
    </Link>
  );
}

export function SpanDetailView({ detail }: { detail: SpanDetail }) {
  const { span } = detail;
  return (
    <DetailFrame
      testID="span-detail"
      kicker={`Span · ${span.lengthKm} km`}
      title={`${span.aName} – ${span.bName}`}
      backHref="/network"
      backLabel="Network"
      badges={span.srlg.map((group) => <Badge key={group} label={`SRLG ${group}`} />)}
    >
      <View style={styles.ends}>
        <SiteLink id={span.a} name={span.aName} />
        <Text style={styles.dash}>–</Text>
        <SiteLink id={span.b} name={span.bName} />
      </View>
      <Facts
        items={[
          { label: 'Capacity', value: formatGbps(span.capacityGbps) },
          { label: 'In use', value: formatGbps(span.usedGbps) },
          { label: 'Utilisation', value: <UtilisationBar share={span.utilisation} testID="span-utilisation" /> },
          { label: 'Length', value: formatKm(span.lengthKm) },
          { label: 'Latency', value: latencyLabel(span) },
          { label: 'MTBF', value: formatHours(span.mtbfHours) },
          { label: 'MTTR', value: formatHours(span.mttrHours) },
        ]}
      />
      {span.latencyDerived ? (
        <Note>Latency derived from length at the fibre planning value of 5 µs/km one way; no measured figure was imported.</Note>
      ) : null}
      <InventoryMap compact highlight={{ sites: [span.a, span.b], spans: [span.id] }} selected={{ kind: 'span', id: span.id }} />
      <Section title={`Slices over this span (${detail.slices.length})`}>
        <SliceUseList uses={detail.slices} emptyText="No slice's ties are routed over this span." testID="span-slices" />
      </Section>
    </DetailFrame>
  );
}

const styles = StyleSheet.create({
  ends: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  dash: { ...type.body, color: colors.inkMuted },
  link: { ...type.bodyStrong, color: colors.primary },
});
