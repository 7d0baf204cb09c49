// The Outbox list: messages newest first as a list of links, the open one marked, older pages on request.
import { ScrollView, StyleSheet, Text, View } from 'react-native';
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
    // A plain scroll view rather than a FlatList: the list role needs its items as its own children, and the mail
    // sink's pages are short.
    <ScrollView testID="outbox-list" contentContainerStyle={styles.content}>
      <Text style={styles.count}>{total === 1 ? '1 message' : `${total} messages`}</Text>
      <View role="list" aria-label="Messages" style={styles.list}>
        {messages.map((item) => (
          <View role="listitem" key={item.id}>
            <OutboxRow message={item} selected={item.id === selectedId} viewerZone={viewerZone} onOpen={onOpen} />
          </View>
        ))}
      </View>
      {hasMore ? (
        <View style={styles.more}>
          <Button label="Show older mail" variant="quiet" busy={loadingMore} onPress={onLoadMore} testID="outbox-more" />
        </View>
      ) : null}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  content: { gap: space.sm, paddingBottom: space.xl },
  list: { gap: space.sm },
  count: { ...type.caption, color: colors.inkMuted },
  more: { alignItems: 'center', paddingTop: space.sm },
});
