// The Imports screen: upload and the current preview in the main column, past imports beside it (wide) or below (phone).
import { ActivityIndicator, ScrollView, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import type { ImportSummary } from '@/shared/imports';
import { DemoDataNotice } from '@/components/demo-data/demo-data-notice';
import { AppliedLinks } from './applied-links';
import { ImportHistory } from './import-history';
import { ImportPreviewView } from './import-preview-view';
import { MappingStep } from './mapping-step';
import { UploadPanel } from './upload-panel';
import { useImportFlow } from './use-import-flow';
import { colors, radii, space, type, WIDE_LAYOUT_MIN_WIDTH_PX } from '@/constants/theme';

export function ImportsView({ history }: { history: readonly ImportSummary[] }) {
  const flow = useImportFlow();
  const wide = useWindowDimensions().width >= WIDE_LAYOUT_MIN_WIDTH_PX;
  const main = (
    <View style={styles.column}>
      <UploadPanel kind={flow.kind} onKindChange={flow.setKind} onPick={flow.pick} uploading={flow.uploading} uploadError={flow.uploadError}
        defaults={flow.defaults} onCheckAgain={flow.previewAgain} keptFileName={flow.keptFileName} />
      {flow.record ? (
        <View style={styles.card}>
          <ImportPreviewView
            record={flow.record}
            onApply={flow.applyCurrent}
            applying={flow.applying}
            applyError={flow.applyError}
            applied={flow.applied}
            appliedActions={<AppliedLinks />}
            mappingStep={flow.record.kind === 'graphml' && flow.record.preview.sources && flow.previewAgain && !flow.applied ? (
              <MappingStep sources={flow.record.preview.sources} picks={flow.picks} onPicksChange={flow.setPicks}
                onPreviewAgain={flow.previewAgain} busy={flow.uploading}
                initiallyOpen={flow.record.preview.errors.length > 0} />
            ) : null}
          />
        </View>
      ) : null}
      {flow.detailLoading ? <ActivityIndicator color={colors.primary} testID="import-detail-loading" aria-label="Loading the import" /> : null}
      {flow.detailError ? <Text style={styles.error} role="alert">{flow.detailError}</Text> : null}
    </View>
  );
  const side = (
    <View style={styles.column}>
      <Text style={styles.heading} role="heading" aria-level={2}>Past imports</Text>
      <ImportHistory imports={history} selectedId={flow.currentId} onOpen={flow.open} />
    </View>
  );
  return (
    <ScrollView contentContainerStyle={styles.page} testID="imports-screen">
      <Text style={styles.title} role="heading" aria-level={1}>Imports</Text>
      <DemoDataNotice />
      <View style={wide ? styles.row : styles.stack}>
        <View style={wide ? styles.mainWide : undefined}>{main}</View>
        <View style={wide ? styles.sideWide : undefined}>{side}</View>
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  page: { padding: space.lg, gap: space.lg, paddingBottom: space.xxxl },
  title: { ...type.display, color: colors.abyss },
  heading: { ...type.heading, color: colors.ink },
  row: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  stack: { gap: space.xl },
  mainWide: { flex: 3, minWidth: 0 },
  sideWide: { flex: 2, minWidth: 0 },
  column: { gap: space.md },
  card: { backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border, padding: space.lg },
  error: { ...type.body, color: colors.danger },
});
