// The list of what still blocks saving, beside the submit button, so an error scrolled out of sight is never
// missed; tapping one brings its field into view and puts the cursor in it.
import { useCallback, useRef } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

export type SummaryError<K extends string> = { key: K; label: string; message: string };

type Props<K extends string> = { errors: readonly SummaryError<K>[]; onSelect: (key: K) => void; testID?: string };

export function FormErrorSummary<K extends string>({ errors, onSelect, testID = 'form-error-summary' }: Props<K>) {
  if (errors.length === 0) return null;
  return (
    <View style={styles.box} role="alert" testID={testID}>
      <Text style={styles.title}>{errors.length === 1 ? 'One thing to fix before saving:' : `${errors.length} things to fix before saving:`}</Text>
      {errors.map((error) => (
        <Pressable key={error.key} role="link" onPress={() => onSelect(error.key)} testID={`${testID}-${error.key}`}
          accessibilityLabel={`${error.label}: ${error.message} Go to the field.`}>
          <Text style={styles.item}><Text style={styles.itemLabel}>{error.label}: </Text>{error.message}</Text>
        </Pressable>
      ))}
    </View>
  );
}

/** On the web a View's ref is its DOM element; elsewhere these calls are absent and nothing happens. */
type WebNode = { scrollIntoView?: (options: object) => void; querySelector?: (selector: string) => { focus?: () => void } | null };

/** Refs for each field's wrapper, and `reveal(key)`: scroll the field into view and focus its first input. */
export function useFieldAnchors<K extends string>() {
  const nodes = useRef(new Map<K, unknown>());
  const anchor = useCallback((key: K) => (node: unknown) => {
    if (node) nodes.current.set(key, node);
    else nodes.current.delete(key);
  }, []);
  const reveal = useCallback((key: K) => {
    const node = nodes.current.get(key) as WebNode | undefined;
    node?.scrollIntoView?.({ behavior: 'smooth', block: 'center' });
    node?.querySelector?.('input, textarea, [role="button"]')?.focus?.();
  }, []);
  return { anchor, reveal };
}

const styles = StyleSheet.create({
  box: { gap: space.xs, padding: space.md, borderRadius: radii.md, backgroundColor: colors.dangerSoft, borderLeftWidth: 4, borderLeftColor: colors.danger },
  title: { ...type.bodyStrong, color: colors.danger },
  item: { ...type.body, color: colors.ink, textDecorationLine: 'underline' },
  itemLabel: { ...type.bodyStrong, color: colors.ink },
});
