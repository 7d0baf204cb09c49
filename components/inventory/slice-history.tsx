// Placement history by revision, newest first, each with what moved since the revision before it.
import { StyleSheet, Text, View } from 'react-native';
import type { PlacementRevision } from '@/shared/inventory';
import { Badge } from '@/components/inventory/badges';
import { formatWhen } from '@/components/inventory/format';
import { placementMoves, type PlacementMove } from '@/components/inventory/placement-diff';
import { colors, radii, space, type } from '@/constants/theme';

function moveText(move: PlacementMove, siteName: (id: string) => string): string {
  if (move.kind === 'function') {
    const from = move.from ? siteName(move.from) : 'nowhere';
    const to = move.to ? siteName(move.to) : 'nowhere';
    return `${move.id}: ${from} → ${to}`;
  }
  return `${move.id}: rerouted (${move.from?.length ?? 0} → ${move.to?.length ?? 0} spans)`;
}

type Props = { history: readonly PlacementRevision[]; siteName: (id: string) => string };

export function SliceHistory({ history, siteName }: Props) {
  if (history.length === 0) return <Text style={styles.muted}>This slice has never been placed.</Text>;
  return (
    <View style={styles.list} testID="slice-history">
      {history.map((rev, index) => {
        // History is newest first, so the revision before this one is the next entry.
        const older = history[index + 1];
        const moves = placementMoves(older, rev);
        const siteCount = new Set(Object.values(rev.sites)).size;
        return (
          <View key={rev.revision} style={styles.row} testID={`slice-revision-${rev.revision}`}>
            <View style={styles.line}>
              <Text style={styles.name}>{`Revision ${rev.revision}`}</Text>
              {rev.current ? <Badge label="Current" tone="primary" /> : null}
              <Text style={styles.muted}>{`${rev.reason} · ${formatWhen(rev.createdAt)}`}</Text>
            </View>
            {older ? (
              moves.length === 0 ? (
                <Text style={styles.muted}>No change of site or path.</Text>
              ) : (
                moves.map((move) => <Text key={`${move.kind}-${move.id}`} style={styles.move}>{moveText(move, siteName)}</Text>)
              )
            ) : (
              <Text style={styles.muted}>{`First placement: ${Object.keys(rev.sites).length} functions on ${siteCount} ${siteCount === 1 ? 'site' : 'sites'}.`}</Text>
            )}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { borderWidth: 1, borderColor: colors.border, borderRadius: radii.lg, overflow: 'hidden' },
  row: { padding: space.md, gap: space.xxs, borderBottomWidth: 1, borderBottomColor: colors.surfaceSunken },
  line: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  name: { ...type.bodyStrong, color: colors.ink },
  move: { ...type.caption, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
});
