// What an import would add, change and remove, per entity; changed entities list their fields before → after.
import { StyleSheet, Text, View } from 'react-native';
import { IMPORT_ENTITY_NAMES, type EntityChange, type ImportPreview } from '@/shared/imports';
import { ENTITY_LABELS } from './import-kinds';
import { colors, radii, space, type } from '@/constants/theme';

/** Long lists show this many ids, then a count of the rest, so a 500-site import stays readable. */
const SHOWN_IDS = 40;

function valueText(value: unknown): string {
  if (value === null || value === undefined) return '—';
  if (typeof value === 'string') return value;
  return JSON.stringify(value);
}

function IdList({ ids }: { ids: readonly string[] }) {
  const rest = ids.length - SHOWN_IDS;
  return <Text style={styles.ids}>{ids.slice(0, SHOWN_IDS).join(', ') + (rest > 0 ? ` and ${rest} more` : '')}</Text>;
}

function ChangeItem({ change }: { change: EntityChange }) {
  return (
    <View style={styles.change}>
      <Text style={styles.changeId}>{change.id}</Text>
      {change.fields.map((f) => (
        <Text key={f.field} style={styles.field}>{`${f.field}: ${valueText(f.before)} → ${valueText(f.after)}`}</Text>
      ))}
    </View>
  );
}

export function ChangeLists({ preview }: { preview: ImportPreview }) {
  const entities = IMPORT_ENTITY_NAMES.filter(
    (e) => preview.adds[e].length + preview.changes[e].length + preview.removes[e].length > 0,
  );
  if (entities.length === 0) return <Text style={styles.none} testID="import-no-changes">The file matches what is stored: nothing would change.</Text>;
  return (
    <View style={styles.list} testID="import-changes">
      {entities.map((entity) => (
        <View key={entity} style={styles.entity} testID={`import-changes-${entity}`}>
          <Text style={styles.entityTitle}>{ENTITY_LABELS[entity]}</Text>
          {preview.adds[entity].length > 0 ? (
            <View style={styles.group} testID={`import-adds-${entity}`}>
              <Text style={[styles.groupTitle, { color: colors.primary }]}>{`Add ${preview.adds[entity].length}`}</Text>
              <IdList ids={preview.adds[entity]} />
            </View>
          ) : null}
          {preview.changes[entity].length > 0 ? (
            <View style={styles.group} testID={`import-updates-${entity}`}>
              <Text style={[styles.groupTitle, { color: colors.warning }]}>{`Change ${preview.changes[entity].length}`}</Text>
              {preview.changes[entity].slice(0, SHOWN_IDS).map((c) => <ChangeItem key={c.id} change={c} />)}
            </View>
          ) : null}
          {preview.removes[entity].length > 0 ? (
            <View style={styles.group} testID={`import-removes-${entity}`}>
              <Text style={[styles.groupTitle, { color: colors.danger }]}>{`Remove ${preview.removes[entity].length}`}</Text>
              <IdList ids={preview.removes[entity]} />
            </View>
          ) : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  entity: { borderWidth: 1, borderColor: colors.border, borderRadius: radii.lg, padding: space.md, gap: space.sm, backgroundColor: colors.surface },
  entityTitle: { ...type.heading, color: colors.ink },
  group: { gap: space.xxs },
  groupTitle: { ...type.label },
  ids: { ...type.body, color: colors.ink },
  change: { paddingLeft: space.sm, borderLeftWidth: 2, borderLeftColor: colors.surfaceSunken, gap: 1 },
  changeId: { ...type.bodyStrong, color: colors.ink },
  field: { ...type.caption, color: colors.inkMuted },
  none: { ...type.body, color: colors.inkMuted },
});
