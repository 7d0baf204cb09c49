// Spans as lines coloured by utilisation, with a tone halo when highlighted and a wide invisible band to tap.
// Pointer only, like the site layer; the list beside the map names each span with its load.
import { G, Line } from 'react-native-svg';
import { utilisationColour } from '@/components/map/colour-scale';
import type { PlacedSpan } from '@/components/map/map-geometry';
import type { EmphasisLookup } from '@/components/map/map-highlight';
import { TONE_COLOURS } from '@/components/map/map-tones';
import { MAP_DIMMED_OPACITY, mapColors } from '@/constants/theme';

/** Invisible band around each span that takes taps; wide enough for a finger, narrow enough not to swallow neighbours. */
export const SPAN_HIT_WIDTH_PX = 24;

/** Thicker lines for bigger pipes: 10G, 40G, 100G+ read apart at a glance. */
export function spanWidthPx(capacityGbps: number, compact: boolean): number {
  const base = capacityGbps >= 100 ? 4.5 : capacityGbps >= 40 ? 3 : 2;
  return compact ? base * 0.75 : base;
}

type Props = {
  spans: readonly PlacedSpan[];
  emphasis: EmphasisLookup;
  selectedId: string | null;
  compact: boolean;
  onPress: (id: string) => void;
};

export function MapSpanLayer({ spans, emphasis, selectedId, compact, onPress }: Props) {
  return (
    <G>
      {spans.map((span) => {
        const { dimmed, tone } = emphasis.span(span.id);
        const width = spanWidthPx(span.capacityGbps, compact) + (tone ? 1.5 : 0);
        const ends = { x1: span.from.x, y1: span.from.y, x2: span.to.x, y2: span.to.y };
        return (
          <G
            key={span.id}
            testID={`map-span-${span.id}`}
            opacity={dimmed ? MAP_DIMMED_OPACITY : 1}
            onPress={() => onPress(span.id)}
          >
            {selectedId === span.id ? <Line {...ends} stroke={mapColors.selection} strokeWidth={width + 8} strokeLinecap="round" /> : null}
            {tone ? <Line {...ends} stroke={TONE_COLOURS[tone]} strokeOpacity={0.4} strokeWidth={width + 7} strokeLinecap="round" /> : null}
            <Line
              {...ends}
              stroke={utilisationColour(span.utilisation)}
              strokeWidth={width}
              strokeLinecap="round"
              strokeDasharray={tone === 'window' ? [7, 5] : undefined}
            />
            <Line {...ends} stroke="transparent" strokeWidth={SPAN_HIT_WIDTH_PX} />
          </G>
        );
      })}
    </G>
  );
}
