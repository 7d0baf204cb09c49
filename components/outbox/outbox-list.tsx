// The Outbox list: messages newest first, the open one marked, older pages on request.
import { FlatList, StyleSheet, Text, View } from 'react-native';
import type { OutboxSummary } from '@/shared/outbox';
import { Button } from '@/components/button';
import { colors, space, type } from '@/constants/theme';
import { OutboxRow } from './outbox-row';

type Props = {
  messages: OutboxSummary[];
  total: number;
  selectedId: number | null;
  viewerZone: string;
  onOpen: (id: number) => void;
  hasMore: boolean;
  loadingMore: boolean;
  onLoadMore: () => void;
};

export function OutboxList({ messages, total, selectedId, viewerZone, onOpen, hasMore, loadingMore, onLoadMore }: Props) {
  return (
    <FlatList
      testID="outbox-list"
      data={messages}
      keyExtractor={(m) => String(m.id)}
      contentContainerStyle={styles.content}
      ListHeaderComponent={<Text style={styles.count}>{total === 1 ? '1 message' : `${total} messages`}</Text>}
      renderItem={({ item }) => (
        <OutboxRow message={item} selected={item.id === selectedId} viewerZone={viewerZone} onOpen={onOpen} />
      )}
      ListFooterComponent={
        hasMore ? (
          <View style={styles.more}>
            <Button label="Show older mail" variant="quiet" busy={loadingMore} onPress={onLoadMore} testID="outbox-more" />
          </View>
        ) : null
      }
    />
  );
}

const styles = StyleSheet.create({
  content: { gap: space.sm, paddingBottom: space.xl },
  count: { ...type.caption, color: colors.inkMuted },
  more: { alignItems: 'center', paddingTop: space.sm },
});
