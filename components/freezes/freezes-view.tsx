// The freezes screen: the list, and for admins a form to add or change one — beside the list on wide screens,
// in its place on phones. Other staff read only.
import { ScrollView, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import type { Freeze } from '@/shared/freezes';
import { Button } from '@/components/button';
import { timesInLabel } from '@/components/time';
import { colors, space, type, WIDE_LAYOUT_MIN_WIDTH_PX } from '@/constants/theme';
import { FreezeForm } from './freeze-form';
import { draftFromFreeze, EMPTY_FREEZE_DRAFT } from './freeze-form-state';
import { FreezeList } from './freeze-list';
import type { FreezeEditor } from './use-freeze-editor';

type Props = { freezes: readonly Freeze[]; timeZone: string; canEdit: boolean; editor: FreezeEditor; nowMs?: number };

export function FreezesView({ freezes, timeZone, canEdit, editor, nowMs = Date.now() }: Props) {
  const wide = useWindowDimensions().width >= WIDE_LAYOUT_MIN_WIDTH_PX;
  const { editing } = editor;
  const editedFreeze = editing?.mode === 'edit' ? freezes.find((f) => f.id === editing.id) : undefined;
  const form =
    canEdit && editing ? (
      <FreezeForm
        key={editing.mode === 'edit' ? editing.id : 'new'}
        heading={editedFreeze ? `Edit “${editedFreeze.title}”` : 'New freeze'}
        initial={editedFreeze ? draftFromFreeze(editedFreeze, timeZone) : EMPTY_FREEZE_DRAFT}
        timeZone={timeZone}
        busy={editor.saving}
        serverError={editor.saveError}
        onSubmit={editor.save}
        onCancel={editor.cancel}
      />
    ) : null;
  const list = (
    <FreezeList
      freezes={freezes}
      timeZone={timeZone}
      nowMs={nowMs}
      canEdit={canEdit}
      deletingId={editor.deletingId}
      onEdit={editor.startEdit}
      onDelete={editor.remove}
    />
  );
  return (
    <ScrollView contentContainerStyle={[styles.content, wide && styles.contentWide]}>
      <View style={styles.toolbar}>
        <View style={styles.titleBox}>
          <Text style={styles.title} role="heading" aria-level={1}>
            Freezes
          </Text>
          <Text style={styles.subtitle}>
            Periods in which no window may be booked{canEdit ? '' : ' (set by admins)'}. {timesInLabel(timeZone)}.
          </Text>
        </View>
        {canEdit && !editing ? <Button label="New freeze" onPress={editor.startNew} testID="freeze-new" /> : null}
      </View>
      {editor.deleteError ? (
        <Text style={styles.error} role="alert">
          {editor.deleteError}
        </Text>
      ) : null}
      {wide ? (
        <View style={styles.columns}>
          <View style={styles.listColumn}>{list}</View>
          {form ? <View style={styles.formColumn}>{form}</View> : null}
        </View>
      ) : (
        (form ?? list)
      )}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  content: { padding: space.md, gap: space.md, paddingBottom: space.xxxl },
  contentWide: { padding: space.xl, gap: space.lg },
  toolbar: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', flexWrap: 'wrap', gap: space.md },
  titleBox: { gap: space.xxs, flexShrink: 1 },
  title: { ...type.title, color: colors.ink },
  subtitle: { ...type.caption, color: colors.inkMuted },
  error: { ...type.body, color: colors.danger },
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: space.lg },
  listColumn: { flex: 3, minWidth: 0 },
  formColumn: { flex: 2, minWidth: 0 },
});
