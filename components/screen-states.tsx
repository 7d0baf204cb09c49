// The loading, error and empty states every screen shows before (or instead of) its data.
import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import { Button } from '@/components/button';
import { colors, space, type } from '@/constants/theme';

export function LoadingState({ label = 'Loading…' }: { label?: string }) {
  return (
    <View style={styles.centre} testID="state-loading" aria-busy>
      <ActivityIndicator color={colors.primary} aria-label={label} />
      <Text style={styles.muted}>{label}</Text>
    </View>
  );
}

// Callers pass `() => void query.refetch()`: React Query's refetch resolves even when the request fails (the failure
// lands in the query's error state), so nothing is lost by not awaiting it.
export function ErrorState({ message, onRetry }: { message: string; onRetry?: () => void }) {
  return (
    <View style={styles.centre} testID="state-error" role="alert">
      <Text style={styles.title}>Something went wrong</Text>
      <Text style={styles.muted}>{message}</Text>
      {onRetry ? <Button label="Try again" variant="quiet" onPress={onRetry} /> : null}
    </View>
  );
}

/** `page` when the state is all the screen shows: its title is then the page's one h1. */
export function EmptyState({ title, hint, page = false }: { title: string; hint?: string; page?: boolean }) {
  return (
    <View style={styles.centre} testID="state-empty">
      <Text style={styles.title} role={page ? 'heading' : undefined} aria-level={page ? 1 : undefined}>{title}</Text>
      {hint ? <Text style={styles.muted}>{hint}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  centre: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: space.md, padding: space.xl },
  title: { ...type.heading, color: colors.ink, textAlign: 'center' },
  muted: { ...type.body, color: colors.inkMuted, textAlign: 'center', maxWidth: 420 },
});
