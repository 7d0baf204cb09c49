// A site's or span's readable name, read from the inventory; the id stands in until (or unless) it arrives.
import { Text, type TextStyle } from 'react-native';
import { useSiteQuery } from '@/hooks/queries/sites';
import { useSpanQuery } from '@/hooks/queries/spans';

type Props = { id: string; style?: TextStyle };

function SiteName({ id, style }: Props) {
  const site = useSiteQuery(id);
  return <Text style={style}>{site.data?.site.name ?? id}</Text>;
}

function SpanName({ id, style }: Props) {
  const span = useSpanQuery(id);
  return <Text style={style}>{span.data ? `${span.data.span.aName} – ${span.data.span.bName}` : id}</Text>;
}

export function ElementName({ kind, ...props }: Props & { kind: 'site' | 'span' }) {
  return kind === 'site' ? <SiteName {...props} /> : <SpanName {...props} />;
}
