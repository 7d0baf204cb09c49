// A row of chips that scrolls sideways, with a fade and an arrow at each clipped edge, shown only while chips are
// hidden past it: a row cut mid-chip without a hint reads as all there is.
import { useState, type ReactNode } from 'react';
import { ScrollView, StyleSheet, Text, View, type LayoutChangeEvent, type NativeScrollEvent, type NativeSyntheticEvent, type StyleProp, type ViewStyle } from 'react-native';
import { LinearGradient } from 'expo-linear-gradient';
import { colors, space, type } from '@/constants/theme';

type Props = {
  children: ReactNode;
  testID: string;
  /** The colour behind the row, which the fade blends into. */
  backgroundColor?: string;
  contentContainerStyle?: StyleProp<ViewStyle>;
  role?: 'tablist' | 'radiogroup' | 'group';
  label?: string;
};

/** Less than this much hidden (px) counts as none: rounding on the web leaves a pixel or so. */
const SLACK_PX = 2;
const FADE_WIDTH_PX = 32;

export type ClippedEdges = { start: boolean; end: boolean };

/** Which edges hide chips, from the row's width, its content's width and how far it is scrolled. */
export function clippedEdges(viewWidthPx: number, contentWidthPx: number, offsetPx: number): ClippedEdges {
  if (!(viewWidthPx > 0) || contentWidthPx <= viewWidthPx + SLACK_PX) return { start: false, end: false };
  return { start: offsetPx > SLACK_PX, end: offsetPx + viewWidthPx < contentWidthPx - SLACK_PX };
}

function transparentOf(hex: string): string {
  // #RRGGBB → #RRGGBB00, so the fade runs from clear to the background without a grey middle.
  return /^#[0-9a-f]{6}$/i.test(hex) ? `${hex}00` : 'transparent';
}

function Fade({ side, backgroundColor, testID }: { side: 'start' | 'end'; backgroundColor: string; testID: string }) {
  const clear = transparentOf(backgroundColor);
  return (
    // Only a visual hint that chips lie past the edge: a screen reader reads every chip anyway.
    <View pointerEvents="none" aria-hidden style={[styles.fade, side === 'start' ? styles.fadeStart : styles.fadeEnd]} testID={testID}>
      <LinearGradient
        colors={side === 'start' ? [backgroundColor, clear] : [clear, backgroundColor]}
        start={{ x: 0, y: 0.5 }}
        end={{ x: 1, y: 0.5 }}
        style={StyleSheet.absoluteFill}
      />
      <Text style={[styles.arrow, side === 'start' ? styles.arrowStart : styles.arrowEnd]}>{side === 'start' ? '‹' : '›'}</Text>
    </View>
  );
}

export function ChipRow({ children, testID, backgroundColor = colors.surface, contentContainerStyle, role, label }: Props) {
  const [viewWidthPx, setViewWidthPx] = useState(0);
  const [contentWidthPx, setContentWidthPx] = useState(0);
  const [offsetPx, setOffsetPx] = useState(0);
  const edges = clippedEdges(viewWidthPx, contentWidthPx, offsetPx);
  return (
    <View style={styles.frame} testID={testID}>
      <ScrollView
        horizontal
        showsHorizontalScrollIndicator={false}
        style={styles.strip}
        contentContainerStyle={[styles.row, contentContainerStyle]}
        onLayout={(e: LayoutChangeEvent) => setViewWidthPx(e.nativeEvent.layout.width)}
        onContentSizeChange={(width: number) => setContentWidthPx(width)}
        onScroll={(e: NativeSyntheticEvent<NativeScrollEvent>) => setOffsetPx(e.nativeEvent.contentOffset.x)}
        scrollEventThrottle={32}
        role={role}
        aria-label={label}
      >
        {children}
      </ScrollView>
      {edges.start ? <Fade side="start" backgroundColor={backgroundColor} testID={`${testID}-more-before`} /> : null}
      {edges.end ? <Fade side="end" backgroundColor={backgroundColor} testID={`${testID}-more-after`} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { position: 'relative' },
  // A horizontal ScrollView grows to fill a column by default; the strip keeps its own height.
  strip: { flexGrow: 0, flexShrink: 0 },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.xs, paddingVertical: space.xxs },
  fade: { position: 'absolute', top: 0, bottom: 0, width: FADE_WIDTH_PX, justifyContent: 'center' },
  fadeStart: { left: 0 },
  fadeEnd: { right: 0 },
  arrow: { ...type.heading, color: colors.inkMuted },
  arrowStart: { textAlign: 'left' },
  arrowEnd: { textAlign: 'right' },
});
