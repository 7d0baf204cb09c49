// Searchable list of sites or spans to add to a window; already-picked ones are marked, not offered twice. The search
// matches ids as well as names (typing an id still finds the element), but results show names only.
import { useState } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, Text, View } from 'react-native';
import { useSitesQuery } from '@/hooks/queries/sites';
import { useSpansQuery } from '@/hooks/queries/spans';
import { SearchField } from '@/components/table/search-field';
import { ChoiceChips } from '@/components/windows/choice-chips';
import { siteWords, spanWords } from '@/components/windows/element-words';
import { useDebouncedValue } from '@/components/windows/use-debounced-value';
import { colors, radii, space, type } from '@/constants/theme';

/** One search result: `id` is what the window stores; people read `label` (the name) and `detail`, never the id. */
export type ElementOption = { kind: 'site' | 'span'; id: string; label: string; detail: string };

/** Few enough to scan on a phone; people narrow the search rather than scroll. */
const SEARCH_PAGE_SIZE = 12;

const KIND_CHOICES = [
  { value: 'site', label: 'Sites' },
  { value: 'span', label: 'Spans' },
] as const;

type ResultsProps = { q: string; pickedKeys: ReadonlySet<string>; onPick: (option: ElementOption) => void; disabled: boolean };

function SiteResults(props: ResultsProps) {
  const sites = useSitesQuery({ q: props.q || undefined, pageSize: SEARCH_PAGE_SIZE, sort: 'name' });
  const options = sites.data?.items.map((s): ElementOption => {
    const words = siteWords(s);
    return { kind: 'site', id: s.id, label: words.name, detail: words.detail };
  });
  return <Results {...props} options={options} loading={sites.isFetching} error={sites.error?.message} />;
}

function SpanResults(props: ResultsProps) {
  const spans = useSpansQuery({ q: props.q || undefined, pageSize: SEARCH_PAGE_SIZE });
  const options = spans.data?.items.map((s): ElementOption => {
    const words = spanWords(s);
    return { kind: 'span', id: s.id, label: words.name, detail: words.detail };
  });
  return <Results {...props} options={options} loading={spans.isFetching} error={spans.error?.message} />;
}

function Results({ q, pickedKeys, onPick, disabled, options, loading, error }: ResultsProps & { options?: ElementOption[]; loading: boolean; error?: string }) {
  if (error) return <Text style={styles.error}>Could not search: {error}</Text>;
  if (!options) return loading ? <ActivityIndicator color={colors.primary} aria-label="Searching the network" /> : null;
  if (options.length === 0) return <Text style={styles.muted}>Nothing matches “{q}”.</Text>;
  return options.map((option) => {
    const picked = pickedKeys.has(`${option.kind}:${option.id}`);
    return (
      <Pressable
        key={option.id}
        role="button"
        testID={`window-element-option-${option.id}`}
        disabled={disabled || picked}
        onPress={() => onPick(option)}
        style={({ pressed }) => [styles.option, pressed && styles.pressed, picked && styles.picked]}
      >
        <View style={styles.optionText}>
          <Text style={styles.name}>{option.label}</Text>
          <Text style={styles.muted} testID={`window-element-option-${option.id}-detail`}>{option.detail}</Text>
        </View>
        <Text style={styles.action}>{picked ? 'Added' : 'Add'}</Text>
      </Pressable>
    );
  });
}

type Props = { pickedKeys: ReadonlySet<string>; onPick: (option: ElementOption) => void; disabled?: boolean };

export function ElementSearch({ pickedKeys, onPick, disabled = false }: Props) {
  const [kind, setKind] = useState<'site' | 'span'>('site');
  const [text, setText] = useState('');
  const q = useDebouncedValue(text.trim());
  const resultsProps = { q, pickedKeys, onPick, disabled };
  return (
    <View style={styles.box}>
      <ChoiceChips
        label="Search in"
        choices={KIND_CHOICES}
        value={kind}
        onChange={(value) => value && setKind(value as 'site' | 'span')}
        testID="window-element-kind"
        disabled={disabled}
      />
      <SearchField value={text} onChange={setText} label={kind === 'site' ? 'Search sites by name' : 'Search spans by the name of either end'} testID="window-element-search" />
      {kind === 'site' ? <SiteResults {...resultsProps} /> : <SpanResults {...resultsProps} />}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, padding: space.md, borderRadius: radii.md, backgroundColor: colors.surfaceSunken },
  option: {
    flexDirection: 'row', alignItems: 'center', gap: space.md, padding: space.sm, minHeight: 44,
    borderRadius: radii.sm, backgroundColor: colors.surface,
  },
  pressed: { backgroundColor: colors.primarySoft },
  picked: { opacity: 0.6 },
  optionText: { flex: 1 },
  name: { ...type.bodyStrong, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  action: { ...type.label, color: colors.primary },
  error: { ...type.caption, color: colors.danger },
});
