// The key to the map: utilisation bands (spans and site fill) and the grey of elements without a figure, site shapes
// by kind, and any highlight tones in use.
import { StyleSheet, Text, View } from 'react-native';
import Svg, { Line, Path } from 'react-native-svg';
import { UTILISATION_BANDS } from '@/components/map/colour-scale';
import type { HighlightTone } from '@/components/map/map-highlight';
import { TONE_COLOURS, TONE_LABELS } from '@/components/map/map-tones';
import { glyphPath, KIND_LABELS, KIND_ORDER } from '@/components/map/site-glyphs';
import { colors, mapColors, space, type } from '@/constants/theme';

type Props = { tones?: readonly HighlightTone[]; compact?: boolean; toneLabels?: Partial<Record<HighlightTone, string>> };

function Swatch({ colour, dashed = false, testID }: { colour: string; dashed?: boolean; testID?: string }) {
  return (
    <Svg width={22} height={10} testID={testID}>
      <Line x1={2} y1={5} x2={20} y2={5} stroke={colour} strokeWidth={4} strokeLinecap="round" strokeDasharray={dashed ? [5, 4] : undefined} />
    </Svg>
  );
}

export function MapLegend({ tones = [], compact = false, toneLabels }: Props) {
  return (
    <View style={styles.legend} testID="map-legend" accessibilityLabel="Map legend">
      <View style={styles.row}>
        <Text style={styles.heading}>Used</Text>
        {UTILISATION_BANDS.map((band) => (
          <View key={band.index} style={styles.item}>
            <Swatch colour={band.colour} testID={`map-legend-band-${band.index}`} />
            <Text style={styles.text}>{band.label}</Text>
          </View>
        ))}
        <View style={styles.item}>
          <Swatch colour={mapColors.noFigure} testID="map-legend-no-figure" />
          <Text style={styles.text}>no figure</Text>
        </View>
      </View>
      {compact ? null : (
        <View style={styles.row}>
          <Text style={styles.heading}>Sites</Text>
          {KIND_ORDER.map((kind) => (
            <View key={kind} style={styles.item}>
              <Svg width={18} height={18}>
                <Path d={glyphPath(kind, 9, 9, 6)} fill={mapColors.land} stroke={mapColors.siteStroke} strokeWidth={1.2} />
              </Svg>
              <Text style={styles.text}>{KIND_LABELS[kind]}</Text>
            </View>
          ))}
        </View>
      )}
      {tones.length > 0 ? (
        <View style={styles.row}>
          {tones.map((tone) => (
            <View key={tone} style={styles.item}>
              <Swatch colour={TONE_COLOURS[tone]} dashed={tone === 'window'} />
              <Text style={styles.text}>{toneLabels?.[tone] ?? TONE_LABELS[tone]}</Text>
            </View>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  legend: { gap: space.xs, paddingVertical: space.sm, paddingHorizontal: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', columnGap: space.md, rowGap: space.xxs },
  heading: { ...type.label, color: colors.inkMuted, minWidth: 40 },
  item: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  text: { ...type.caption, color: colors.ink },
});
