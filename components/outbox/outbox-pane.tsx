// The Outbox's list side: a title, a line on where the mail comes from, then the list or its state.
import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { colors, space, type } from '@/constants/theme';

export function OutboxPane({ children }: { children: ReactNode }) {
  return (
    <View style={styles.pane} testID="outbox-pane">
      <Text style={styles.title} role="heading" aria-level={1}>
        Outbox
      </Text>
      <Text style={styles.hint}>Every e-mail the local mail sink received. Nothing here left this machine.</Text>
      <View style={styles.body}>{children}</View>
    </View>
  );
}

/** The message id in an Outbox path (/outbox/42), or null on the list itself. */
export function outboxIdFromPath(pathname: string): number | null {
  const match = /^\/outbox\/(\d+)/.exec(pathname);
  return match ? Number(match[1]) : null;
}

const styles = StyleSheet.create({
  pane: { flex: 1, gap: space.sm, padding: space.md },
  title: { ...type.display, color: colors.abyss },
  hint: { ...type.body, color: colors.inkMuted },
  body: { flex: 1 },
});
