// After a GraphML preview: the file's attribute names, which of our fields each feeds, a picker per field, and
// "Preview again" to check the same file with the picks (and the defaults) without choosing it again.
import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { Button } from '@/components/button';
import { Segmented } from '@/components/inventory/segmented';
import type { ImportSources } from '@/shared/imports';
import { MAPPING_FIELDS, setPick, type MappingEntity, type MappingPicks } from './mapping-fields';
import { colors, radii, space, type } from '@/constants/theme';

type Props = {
  sources: Pick<ImportSources, 'attributes' | 'recognised'>;
  picks: MappingPicks;
  onPicksChange: (picks: MappingPicks) => void;
  /** Null when the file is no longer at hand (an import opened from the list): it must be chosen again. */
  onPreviewAgain: (() => void) | null;
  busy: boolean;
  /** Open at first (a preview with errors); otherwise the step waits behind its title. */
  initiallyOpen: boolean;
};

const NONE = 'none';
const ENTITY_TITLES: Record<MappingEntity, string> = { site: 'Sites (GraphML nodes)', span: 'Spans (GraphML edges)' };

function choiceValue(attribute: string | undefined): string {
  return attribute === undefined ? NONE : `a:${attribute}`;
}

function EntityPickers({ entity, attributes, picks, onPicksChange }: {
  entity: MappingEntity; attributes: readonly string[]; picks: MappingPicks; onPicksChange: (picks: MappingPicks) => void;
}) {
  const choices = [{ value: NONE, label: 'None' }, ...attributes.map((a) => ({ value: `a:${a}`, label: a }))];
  return (
    <View style={styles.entity} testID={`import-mapping-${entity}`}>
      <Text style={styles.entityTitle} role="heading" aria-level={4}>{ENTITY_TITLES[entity]}</Text>
      <Text style={styles.hint} testID={`import-mapping-${entity}-attributes`}>
        {attributes.length === 0 ? 'The file declares no attributes here.' : `Attributes in the file: ${attributes.join(', ')}`}
      </Text>
      {MAPPING_FIELDS[entity].map(({ field, label }) => (
        <View key={field} style={styles.field}>
          <Text style={styles.label}>{label}</Text>
          <Segmented choices={choices} value={choiceValue(picks[entity][field])} label={`${label}: read from`}
            testID={`import-map-${entity}-${field}`}
            onChange={(value) => onPicksChange(setPick(picks, entity, field, value === NONE ? null : value.slice(2)))} />
        </View>
      ))}
    </View>
  );
}

export function MappingStep({ sources, picks, onPicksChange, onPreviewAgain, busy, initiallyOpen }: Props) {
  const [open, setOpen] = useState(initiallyOpen);
  return (
    <View style={styles.box} testID="import-mapping">
      {/* Disclosure pattern: the heading holds the button that opens the step. */}
      <View role="heading" aria-level={3}>
        <Pressable role="button" aria-expanded={open} onPress={() => setOpen((was) => !was)} testID="import-mapping-toggle">
          <Text style={styles.title}>
            <Text aria-hidden>{open ? '▾ ' : '▸ '}</Text>
            Which attribute is which field
          </Text>
        </Pressable>
      </View>
      {open ? <MappingBody sources={sources} picks={picks} onPicksChange={onPicksChange} onPreviewAgain={onPreviewAgain} busy={busy} /> : null}
    </View>
  );
}

function MappingBody({ sources, picks, onPicksChange, onPreviewAgain, busy }: Omit<Props, 'initiallyOpen'>) {
  return (
    <View style={styles.body}>
      <Text style={styles.text}>
        Each field shows the attribute it was read from. Where the file names a field differently, pick its attribute and
        preview again. None: the field is read from our usual names (such as Latitude or lat), if the file has one.
      </Text>
      <EntityPickers entity="site" attributes={sources.attributes.site} picks={picks} onPicksChange={onPicksChange} />
      <EntityPickers entity="span" attributes={sources.attributes.span} picks={picks} onPicksChange={onPicksChange} />
      {onPreviewAgain ? (
        <Button label="Preview again" testID="import-preview-again" busy={busy} onPress={onPreviewAgain} />
      ) : (
        <Text style={styles.hint} testID="import-mapping-file-gone">Choose the file again above to preview it with other picks.</Text>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, borderWidth: 1, borderColor: colors.border, borderRadius: radii.lg, padding: space.md },
  title: { ...type.heading, color: colors.primary },
  body: { gap: space.sm },
  text: { ...type.body, color: colors.inkMuted },
  entity: { gap: space.sm, marginTop: space.xs },
  entityTitle: { ...type.bodyStrong, color: colors.ink },
  field: { gap: space.xxs },
  label: { ...type.label, color: colors.ink },
  hint: { ...type.caption, color: colors.inkMuted },
});
