// "Fill what the file lacks": while open, the next check of a file fills its missing site kinds, compute and span
// capacities from these values, and derives missing span lengths from the ends' coordinates.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { Segmented } from '@/components/inventory/segmented';
import { TextField } from '@/components/text-field';
import { DEFAULT_ROUTE_FACTOR } from '@/shared/imports';
import {
  CPU_KINDS, SITE_KIND_CHOICES, type DefaultsErrors, type DefaultsForm, type SiteKindChoice,
} from './defaults-form';
import { colors, radii, space, type } from '@/constants/theme';

type Props = {
  open: boolean;
  onToggle: () => void;
  form: DefaultsForm;
  onChange: (form: DefaultsForm) => void;
  errors: DefaultsErrors;
};

const SITE_KIND_HINTS: Record<SiteKindChoice, string> = {
  none: 'A site without a kind stays an error.',
  'by-degree': 'Sites are ranked by how many spans of the file end at them: the top 10 % become core, the next 30 % aggregation, the rest edge.',
  core: 'Every site without a kind becomes a core site.',
  aggregation: 'Every site without a kind becomes an aggregation site.',
  edge: 'Every site without a kind becomes an edge site.',
};

const DECIMAL = { keyboardType: 'decimal-pad', inputMode: 'decimal' } as const;

export function DefaultsSection({ open, onToggle, form, onChange, errors }: Props) {
  return (
    <View style={styles.section} testID="import-defaults">
      <Pressable role="button" aria-expanded={open} onPress={onToggle} testID="import-defaults-toggle" style={styles.toggle}>
        <Text style={styles.toggleText}>
          <Text aria-hidden>{open ? '▾ ' : '▸ '}</Text>
          Fill what the file lacks
        </Text>
        <Text style={styles.state}>{open ? 'On for the next check' : 'Off: missing values stay errors'}</Text>
      </Pressable>
      {open ? (
        <View style={styles.body} testID="import-defaults-body">
          <Text style={styles.text}>
            While this section is open, the file is checked with these values in its gaps, and the preview marks each
            value as from the file, a default or derived. Close it to check the file as it is.
          </Text>
          <Text style={styles.label} nativeID="import-default-site-kind-label">Kind of a site without one</Text>
          <Segmented choices={SITE_KIND_CHOICES} value={form.siteKind} onChange={(siteKind) => onChange({ ...form, siteKind })}
            testID="import-default-site-kind" label="Kind of a site without one" />
          <Text style={styles.hint} testID="import-default-site-kind-hint">{SITE_KIND_HINTS[form.siteKind]}</Text>
          <Text style={styles.label}>Compute of a site without it, by the site&apos;s kind</Text>
          <View style={styles.grid}>
            {CPU_KINDS.map(({ kind, label }) => (
              <View key={kind} style={styles.cell}>
                <TextField label={label} testID={`import-default-cpu-${kind}`} value={form.cpu[kind]} placeholder="leave empty: stays an error"
                  onChangeText={(text) => onChange({ ...form, cpu: { ...form.cpu, [kind]: text } })}
                  error={errors[`cpu-${kind}`]} {...DECIMAL} />
              </View>
            ))}
          </View>
          <View style={styles.grid}>
            <View style={styles.cell}>
              <TextField label="Capacity of a span without it (Gbit/s)" testID="import-default-span-capacity" value={form.spanCapacityGbps}
                placeholder="leave empty: stays an error" onChangeText={(spanCapacityGbps) => onChange({ ...form, spanCapacityGbps })}
                error={errors.spanCapacityGbps} {...DECIMAL} />
            </View>
            <View style={styles.cell}>
              <TextField label="Route factor for span lengths (× straight line)" testID="import-default-route-factor" value={form.routeFactor}
                onChangeText={(routeFactor) => onChange({ ...form, routeFactor })} error={errors.routeFactor} {...DECIMAL} />
            </View>
          </View>
          <Text style={styles.hint} testID="import-default-route-factor-hint">
            {`A span without a length gets the great-circle distance between its ends (km) × this factor; its latency then follows at 5 µs per km. Common practice: fibre routes run about a third longer than the straight line, so ${DEFAULT_ROUTE_FACTOR} unless you know your routes.`}
          </Text>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { borderWidth: 1, borderColor: colors.border, borderRadius: radii.md, backgroundColor: colors.surface },
  toggle: { padding: space.md, gap: space.xxs, borderRadius: radii.md },
  toggleText: { ...type.bodyStrong, color: colors.primary },
  state: { ...type.caption, color: colors.inkMuted },
  body: { paddingHorizontal: space.md, paddingBottom: space.md, gap: space.sm },
  text: { ...type.body, color: colors.inkMuted },
  label: { ...type.label, color: colors.ink, marginTop: space.xs },
  hint: { ...type.caption, color: colors.inkMuted },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexBasis: 220 },
});
