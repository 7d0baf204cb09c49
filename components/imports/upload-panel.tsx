// Choose what kind of file (or let the server tell), what fills its gaps, pick it, and it goes up for a preview;
// the file last picked can be checked again; templates for the CSV kinds.
import { Linking, Pressable, StyleSheet, Text, View } from 'react-native';
import type { ImportKind } from '@/shared/imports';
import { importTemplateUrl } from '@/hooks/queries/imports';
import { Button } from '@/components/button';
import { Segmented } from '@/components/inventory/segmented';
import { DefaultsSection } from './defaults-section';
import type { useDefaultsForm } from './use-defaults-form';
import { KIND_LABELS, TEMPLATES } from './import-kinds';
import { colors, radii, space, type } from '@/constants/theme';
import { linkKeyProps } from '@/components/key-props';

export type KindChoice = ImportKind | 'auto';

const KIND_CHOICES = [
  { value: 'auto', label: 'Detect' },
  ...(Object.keys(KIND_LABELS) as ImportKind[]).map((kind) => ({ value: kind, label: KIND_LABELS[kind] })),
] as { value: KindChoice; label: string }[];

type Props = {
  kind: KindChoice;
  onKindChange: (kind: KindChoice) => void;
  onPick: () => void;
  uploading: boolean;
  uploadError: string | null;
  defaults: ReturnType<typeof useDefaultsForm>;
  /** Check the file last picked again (with the values above); null when there is none. */
  onCheckAgain: (() => void) | null;
  keptFileName: string | null;
};

export function UploadPanel({ kind, onKindChange, onPick, uploading, uploadError, defaults, onCheckAgain, keptFileName }: Props) {
  return (
    <View style={styles.panel} testID="import-upload">
      <Text style={styles.title} role="heading" aria-level={2}>Upload a file</Text>
      <Text style={styles.text}>
        A scenario file, a GraphML topology, or a CSV of sites, spans or slices. Nothing is written until you apply the preview.
      </Text>
      <Text style={styles.label}>Kind of file</Text>
      <Segmented choices={KIND_CHOICES} value={kind} onChange={onKindChange} testID="import-kind" label="Kind of file" />
      <DefaultsSection open={defaults.open} onToggle={defaults.toggle} form={defaults.form} onChange={defaults.change} errors={defaults.errors} />
      <View style={styles.actions}>
        <Button label={uploading ? 'Checking the file…' : 'Choose a file'} testID="import-pick" busy={uploading} onPress={onPick} />
        {onCheckAgain && keptFileName ? (
          <Button label={`Check ${keptFileName} again`} variant="quiet" testID="import-check-again" disabled={uploading} onPress={onCheckAgain} />
        ) : null}
      </View>
      {uploadError ? (
        <Text style={styles.error} role="alert" testID="import-upload-error">{uploadError}</Text>
      ) : null}
      <View style={styles.templates}>
        <Text style={styles.label}>CSV templates</Text>
        {TEMPLATES.map((t) => (
          // Opening a link is fire-and-forget: it only rejects when no app can open an http URL, and a browser always can.
          <Pressable key={t.kind} role="link" testID={`import-template-${t.kind}`} onPress={() => void Linking.openURL(importTemplateUrl(t.kind))}
            {...linkKeyProps(() => void Linking.openURL(importTemplateUrl(t.kind)))}>
            <Text style={styles.link}>{t.label}</Text>
          </Pressable>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: space.sm, backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border, padding: space.lg },
  title: { ...type.heading, color: colors.ink },
  text: { ...type.body, color: colors.inkMuted },
  label: { ...type.label, color: colors.ink, marginTop: space.xs },
  error: { ...type.body, color: colors.danger },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  templates: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md, marginTop: space.xs },
  link: { ...type.bodyStrong, color: colors.primary },
});
