// A site's or span's readable name (and the line that tells it apart), read from the inventory. People read names,
// never ids: while the inventory answers, or when the element is gone, plain words stand in.
import { Text, View, type TextStyle } from 'react-native';
import { ApiError } from '@/hooks/api-fetch';
import { useSiteQuery } from '@/hooks/queries/sites';
import { useSpanQuery } from '@/hooks/queries/spans';
import { siteWords, spanWords, unknownElementWords, type ElementWords } from '@/components/windows/element-words';

type Kind = 'site' | 'span';

function stateOf(query: { isError: boolean; error: unknown }): 'loading' | 'missing' | 'failed' {
  if (!query.isError) return 'loading';
  return query.error instanceof ApiError && query.error.status === 404 ? 'missing' : 'failed';
}

/**
 * The words for one element; `known` (what the search already said when it was picked) skips the look-up.
 * Both queries are always called so the hook order never changes; the unused one stays disabled (empty id).
 */
export function useElementWords(kind: Kind, id: string, known?: ElementWords): ElementWords {
  const site = useSiteQuery(kind === 'site' && !known ? id : '');
  const span = useSpanQuery(kind === 'span' && !known ? id : '');
  if (known) return known;
  if (kind === 'site') return site.data ? siteWords(site.data.site) : unknownElementWords('site', stateOf(site));
  return span.data ? spanWords(span.data.span) : unknownElementWords('span', stateOf(span));
}

type Props = { kind: Kind; id: string; style?: TextStyle };

export function ElementName({ kind, id, style }: Props) {
  return <Text style={style}>{useElementWords(kind, id).name}</Text>;
}

type SummaryProps = Props & { detailStyle?: TextStyle; testID?: string };

/** Name over its distinguishing line (kind, compute and place for a site; capacity and length for a span). */
export function ElementSummary({ kind, id, style, detailStyle, testID }: SummaryProps) {
  const words = useElementWords(kind, id);
  return (
    <View testID={testID}>
      <Text style={style}>{words.name}</Text>
      {words.detail ? <Text style={detailStyle} testID={testID ? `${testID}-detail` : undefined}>{words.detail}</Text> : null}
    </View>
  );
}
