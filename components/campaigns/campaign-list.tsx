// The campaigns, newest first: title, state, windows scheduled and left out, total cost; each opens its draft.
import type { z } from 'zod';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { campaignListSchema } from '@/shared/slots';
import { linkKeyProps } from '@/components/key-props';
import { formatInstant } from '@/components/time';
import { colors, radii, space, type } from '@/constants/theme';
import { CAMPAIGN_STATUS_LABELS, formatPoints } from './campaign-words';

type Item = z.infer<typeof campaignListSchema>['campaigns'][number];

type Props = { campaigns: readonly Item[]; timeZone: string; onOpen: (id: string) => void };

export function CampaignList({ campaigns, timeZone, onOpen }: Props) {
  const sorted = [...campaigns].sort((a, b) => b.createdAt.localeCompare(a.createdAt));
  return (
    <View style={styles.list} role="list" aria-label="Campaigns" testID="campaign-list">
      {sorted.map((c) => (
        <View key={c.id} role="listitem">
          <Pressable role="link" onPress={() => onOpen(c.id)} {...linkKeyProps(() => onOpen(c.id))}
            style={({ pressed }) => [styles.row, pressed && styles.pressed]} testID={`campaign-row-${c.id}`}>
            <View style={styles.head}>
              <Text style={styles.title}>{c.title}</Text>
              <Text style={styles.status}>{CAMPAIGN_STATUS_LABELS[c.status]}</Text>
            </View>
            <Text style={styles.body}>
              {c.windows.length} {c.windows.length === 1 ? 'window' : 'windows'} scheduled
              {c.unscheduled.length > 0 ? ` · ${c.unscheduled.length} not scheduled` : ''}
              {c.totalCost === null ? '' : ` · total cost ${formatPoints(c.totalCost)}`}
            </Text>
            <Text style={styles.muted}>Started {formatInstant(c.createdAt, timeZone)}</Text>
          </Pressable>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  row: { gap: space.xs, padding: space.md, minHeight: 44, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
  pressed: { backgroundColor: colors.primarySoft },
  head: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', gap: space.sm },
  title: { ...type.heading, color: colors.ink, flexShrink: 1 },
  status: { ...type.label, color: colors.primary, borderWidth: 1, borderColor: colors.primary, borderRadius: radii.pill, paddingHorizontal: space.sm },
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
});
