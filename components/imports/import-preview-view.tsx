// One import's preview: file and kind, the counts, errors and warnings, the mapping step (GraphML), where the values
// came from, the add/change/remove lists, then Apply.
import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { ImportApplied, ImportKind, ImportPreview, ImportStatus } from '@/shared/imports';
import { ApplyBar } from './apply-bar';
import { ChangeLists } from './change-lists';
import { KIND_LABELS } from './import-kinds';
import { IssueList } from './issue-list';
import { SourcesView } from './sources-view';
import { colors, radii, space, type } from '@/constants/theme';

export type ImportRecordView = { id: string; kind: ImportKind; fileName: string; status: ImportStatus; preview: ImportPreview };

type Props = {
  record: ImportRecordView;
  onApply: () => void;
  applying: boolean;
  applyError: string | null;
  applied: ImportApplied | null;
  /** Where to go once applied (links into the app; passed in so this view stays free of the router). */
  appliedActions?: ReactNode;
  /** The mapping step, when the file is at hand to be checked again (passed in: it belongs to the screen's flow). */
  mappingStep?: ReactNode;
  /** Tests force a table layout; the screen lets the width decide. */
  tableLayout?: 'columns' | 'cards';
};

function Counts({ preview }: { preview: ImportPreview }) {
  const { counts } = preview;
  const items = [
    ['Add', counts.adds], ['Change', counts.changes], ['Remove', counts.removes], ['Errors', counts.errors], ['Warnings', counts.warnings],
  ] as const;
  return (
    <View style={styles.counts} testID="import-counts">
      {items.map(([label, n]) => (
        <View key={label} style={styles.count}>
          <Text style={[styles.countFigure, label === 'Errors' && n > 0 && { color: colors.danger }]}>{n}</Text>
          <Text style={styles.countLabel}>{label}</Text>
        </View>
      ))}
    </View>
  );
}

function AppliedNote({ applied, actions }: { applied: ImportApplied; actions?: ReactNode }) {
  const { counts } = applied;
  return (
    <View style={styles.applied} testID="import-result" role="status">
      <Text style={styles.appliedTitle}>Applied</Text>
      <Text style={styles.text}>{`${counts.adds} added, ${counts.changes} changed, ${counts.removes} removed.`}</Text>
      {actions}
    </View>
  );
}

export function ImportPreviewView({ record, onApply, applying, applyError, applied, appliedActions, mappingStep, tableLayout }: Props) {
  const { preview } = record;
  return (
    <View style={styles.panel} testID="import-preview">
      <View style={styles.head}>
        <Text style={styles.title} testID="import-file-name">{record.fileName}</Text>
        <Text style={styles.kind} testID="import-kind">{`${KIND_LABELS[record.kind]} · ${record.status}`}</Text>
      </View>
      <Counts preview={preview} />
      <IssueList issues={preview.errors} tone="error" testID="import-errors" />
      <IssueList issues={preview.warnings} tone="warning" testID="import-warnings" />
      {mappingStep}
      {preview.sources ? <SourcesView sources={preview.sources} layout={tableLayout} /> : null}
      {/* With errors, the server may still list what the good part would change; an empty list would only mislead. */}
      {preview.errors.length === 0 || preview.counts.adds + preview.counts.changes + preview.counts.removes > 0 ? (
        <ChangeLists preview={preview} />
      ) : null}
      {applied ? (
        <AppliedNote applied={applied} actions={appliedActions} />
      ) : (
        <ApplyBar counts={preview.counts} status={record.status} onApply={onApply} applying={applying} applyError={applyError} />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: space.md },
  head: { gap: space.xxs },
  title: { ...type.title, color: colors.abyss },
  kind: { ...type.label, color: colors.inkMuted },
  counts: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  count: { minWidth: 72, backgroundColor: colors.tide, borderRadius: radii.md, paddingVertical: space.sm, paddingHorizontal: space.md },
  countFigure: { ...type.title, color: colors.ink },
  countLabel: { ...type.caption, color: colors.inkMuted },
  applied: { backgroundColor: colors.primarySoft, borderRadius: radii.lg, padding: space.md, gap: space.xs },
  appliedTitle: { ...type.heading, color: colors.primary },
  text: { ...type.body, color: colors.ink },
});
