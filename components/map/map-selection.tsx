// The panel beside (wide) or under (phone) the map: the selected site or span, its load, and the slices that use it.
import type { ReactNode } from 'react';
import { ActivityIndicator, Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';
import { useSiteQuery } from '@/hooks/queries/sites';
import { useSpanQuery } from '@/hooks/queries/spans';
import { linkKeyProps } from '@/components/key-props';
import { formatUtilisation } from '@/components/map/colour-scale';
import { MapSliceUses } from '@/components/map/map-slice-uses';
import type { MapSelection } from '@/components/map/map-types';
import { KIND_LABELS } from '@/components/map/site-glyphs';
import { colors, space, type } from '@/constants/theme';

type Props = {
  selection: MapSelection;
  onClose: () => void;
  onOpenSlice?: (sliceId: string) => void;
  /** Opens the element's own page (site or span detail), when the app has one. */
  onOpenElement?: (selection: MapSelection) => void;
};

function Fact({ label, value }: { label: string; value: string }) {
  return (
    <View style={styles.fact}>
      <Text style={styles.factLabel}>{label}</Text>
      <Text style={styles.factValue}>{value}</Text>
    </View>
  );
}

type FrameProps = { title: string; subtitle: string; onClose: () => void; onOpen?: () => void; children: ReactNode };

function Frame({ title, subtitle, onClose, onOpen, children }: FrameProps) {
  return (
    <View style={styles.panel} testID="map-selection">
      <View style={styles.head}>
        <View style={styles.headText}>
          <Text style={styles.subtitle}>{subtitle}</Text>
          <Text style={styles.title} numberOfLines={2} role="heading" aria-level={2} testID="map-selection-title">{title}</Text>
          {onOpen ? (
            <Pressable onPress={onOpen} role="link" {...linkKeyProps(onOpen)} testID="map-selection-open" style={styles.open}>
              <Text style={styles.openText}>Open full details →</Text>
            </Pressable>
          ) : null}
        </View>
        <Pressable onPress={onClose} role="button" accessibilityLabel="Close" testID="map-selection-close" style={styles.close}>
          <Text style={styles.closeText}>×</Text>
        </Pressable>
      </View>
      <ScrollView contentContainerStyle={styles.body}>{children}</ScrollView>
    </View>
  );
}

function Waiting({ error, onRetry }: { error: Error | null; onRetry: () => void }) {
  if (!error) return <ActivityIndicator color={colors.primary} style={styles.waiting} aria-label="Loading the details" />;
  return (
    <Pressable onPress={onRetry} role="button" style={styles.waiting}>
      <Text style={styles.error}>{error.message} Tap to try again.</Text>
    </Pressable>
  );
}

type Part = { id: string; onClose: () => void; onOpenSlice?: (sliceId: string) => void; onOpen?: () => void };

function SiteSelection({ id, onClose, onOpenSlice, onOpen }: Part) {
  const query = useSiteQuery(id);
  const d = query.data;
  return (
    <Frame title={d?.site.name ?? 'Site'} subtitle={d ? `${KIND_LABELS[d.site.kind]}${d.site.kind === 'cell-site' ? '' : ' site'}` : 'Loading…'} onClose={onClose} onOpen={onOpen}>
      {!d ? <Waiting error={query.error} onRetry={() => void query.refetch()} /> : (
        <>
          <View style={styles.facts}>
            <Fact label="Compute used" value={`${formatUtilisation(d.site.utilisation)} of ${d.site.cpu} vCPU`} />
            <Fact label="Spans" value={String(d.spans.length)} />
          </View>
          <MapSliceUses title="Hosted here" uses={d.hosted} emptyText="No slice has a function here." onOpenSlice={onOpenSlice} />
          <MapSliceUses title="Passing through" uses={d.transit} emptyText="No slice's traffic passes through." onOpenSlice={onOpenSlice} />
        </>
      )}
    </Frame>
  );
}

function SpanSelection({ id, onClose, onOpenSlice, onOpen }: Part) {
  const query = useSpanQuery(id);
  const d = query.data;
  return (
    <Frame title={d ? `${d.span.aName} — ${d.span.bName}` : 'Span'} subtitle={d ? 'Span' : 'Loading…'} onClose={onClose} onOpen={onOpen}>
      {!d ? <Waiting error={query.error} onRetry={() => void query.refetch()} /> : (
        <>
          <View style={styles.facts}>
            <Fact label="Bandwidth used" value={`${formatUtilisation(d.span.utilisation)} of ${d.span.capacityGbps} Gbit/s`} />
            <Fact label="Length" value={`${d.span.lengthKm} km · ${d.span.latencyMs.toFixed(2)} ms`} />
          </View>
          <MapSliceUses title="Slices over this span" uses={d.slices} emptyText="No slice's traffic uses this span." onOpenSlice={onOpenSlice} />
        </>
      )}
    </Frame>
  );
}

export function MapSelectionPanel({ selection, onClose, onOpenSlice, onOpenElement }: Props) {
  const part: Part = { id: selection.id, onClose, onOpenSlice, onOpen: onOpenElement ? () => onOpenElement(selection) : undefined };
  return selection.kind === 'site' ? <SiteSelection key={selection.id} {...part} /> : <SpanSelection key={selection.id} {...part} />;
}

const styles = StyleSheet.create({
  panel: { flex: 1, backgroundColor: colors.surface },
  head: { flexDirection: 'row', alignItems: 'flex-start', gap: space.sm, padding: space.md, borderBottomWidth: 1, borderBottomColor: colors.border },
  headText: { flex: 1, gap: space.xxs },
  subtitle: { ...type.caption, color: colors.inkMuted },
  title: { ...type.heading, color: colors.ink },
  open: { alignSelf: 'flex-start', minHeight: 44, justifyContent: 'center' },
  openText: { ...type.label, color: colors.primary },
  close: { width: 44, height: 44, alignItems: 'center', justifyContent: 'center', marginTop: -space.sm, marginRight: -space.sm },
  closeText: { ...type.title, color: colors.inkMuted },
  body: { padding: space.md, gap: space.lg },
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  fact: { gap: space.xxs },
  factLabel: { ...type.caption, color: colors.inkMuted },
  factValue: { ...type.bodyStrong, color: colors.ink },
  waiting: { padding: space.lg },
  error: { ...type.body, color: colors.danger },
});
