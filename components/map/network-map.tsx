// The network map: land, spans coloured by load, sites by kind; tap to select, highlight a placement or a window,
// pan and zoom (drag, pinch, wheel on the web, and buttons everywhere).
import { useCallback, useMemo, useRef, useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { Path, Rect } from 'react-native-svg';
import { fitNetwork, placeNetwork } from '@/components/map/map-geometry';
import { emphasisFor, type HighlightTone, type MapHighlight } from '@/components/map/map-highlight';
import { CONTROLS_ROW_HEIGHT_PX, MapControls } from '@/components/map/map-controls';
import { MapLegend } from '@/components/map/map-legend';
import { MapSiteLayer, siteRadiusPx } from '@/components/map/map-site-layer';
import { pickLabels } from '@/components/map/map-labels';
import { MapSpanLayer } from '@/components/map/map-span-layer';
import type { MapSelection, NetworkMapData } from '@/components/map/map-types';
import { HOME_VIEW, labelledKindCount, zoomAround, ZOOM_STEP } from '@/components/map/map-view';
import type { MapFocus } from '@/components/map/map-focus';
import { useMapView } from '@/components/map/use-map-view';
import type { Point } from '@/components/map/projection';
import { useMapGestures } from '@/components/map/use-map-gestures';
import { useWheelZoom } from '@/components/map/use-wheel-zoom';
import { colors, mapColors, radii } from '@/constants/theme';

export type NetworkMapProps = {
  data: NetworkMapData;
  /** Drawn bold in its tone (default `placement`); everything else is dimmed. */
  highlight?: MapHighlight;
  /** A second set in its own tone (default `window`), e.g. a window's elements beside a slice's new route. */
  secondaryHighlight?: MapHighlight;
  selected?: MapSelection | null;
  onSelect?: (selection: MapSelection) => void;
  /** A smaller map for detail screens: fixed height, smaller glyphs, no labels, short legend. */
  compact?: boolean;
  /** Legend words for the tones when a screen gives them its own meaning (a plan's before and after). */
  toneLabels?: Partial<Record<HighlightTone, string>>;
  /** The area to open on (a window's equipment, a plan's moves): zoomed to it and its neighbours, its sites named. */
  focus?: MapFocus;
  /** A fixed height for the drawing (the legend goes under it), for maps inside a scrolling page. */
  heightPx?: number;
  /** The map screen on a phone held upright: start enlarged towards the full height (see portraitFillView). */
  fillPortrait?: boolean;
};

// Until the first layout arrives (and in tests, where none does) the map draws at a phone-like size.
const FALLBACK_SIZE = { widthPx: 360, heightPx: 320 };
const COMPACT_HEIGHT_PX = 260;
/** Smallest a full map gets when the screen around it is crowded (a phone with the selection panel open). */
const MIN_HEIGHT_PX = 200;
/** Below this width the zoom buttons go in a row along the top, and the network is fitted below them. */
const NARROW_MAP_MAX_WIDTH_PX = 600;
/** Room around the network for glyphs and labels at the edges. */
const FIT_PADDING_PX = 28;

function usedTones(...highlights: (MapHighlight | undefined)[]): HighlightTone[] {
  const tones = highlights.map((h, i) => (h && ((h.sites?.length ?? 0) + (h.spans?.length ?? 0) > 0) ? (h.tone ?? (i === 0 ? 'placement' : 'window')) : null));
  return [...new Set(tones.filter((t): t is HighlightTone => t !== null))];
}

export function NetworkMap(props: NetworkMapProps) {
  const { data, highlight, secondaryHighlight, selected = null, onSelect, compact = false, toneLabels, focus, heightPx, fillPortrait } = props;
  const [size, setSize] = useState(heightPx ? { ...FALLBACK_SIZE, heightPx } : FALLBACK_SIZE);
  const surface = useRef<View>(null);
  const narrow = size.widthPx < NARROW_MAP_MAX_WIDTH_PX;
  const topInsetPx = narrow ? CONTROLS_ROW_HEIGHT_PX - FIT_PADDING_PX / 2 : 0;
  const projection = useMemo(() => fitNetwork(data, size, FIT_PADDING_PX, topInsetPx), [data, size, topInsetPx]);
  const { view, setView, focusIds } = useMapView({ data, projection, size, focus, topInsetPx, fillPortrait });
  const gestures = useMapGestures({ view, size, setView });
  useWheelZoom(surface, useCallback((factor: number, at: Point) => setView((v) => zoomAround(v, factor, at)), [setView]));

  const geometry = useMemo(() => placeNetwork(data, projection, view), [data, projection, view]);
  const emphasis = useMemo(() => emphasisFor(highlight, secondaryHighlight), [highlight, secondaryHighlight]);
  // Wide maps have room for more names at the same zoom.
  const selectedSite = selected?.kind === 'site' ? selected.id : null;
  const labelled = useMemo(() => {
    const kinds = compact ? 0 : labelledKindCount(view.zoom * Math.max(1, size.widthPx / 400));
    const toned = (id: string) => emphasis.site(id).tone !== null;
    const inFocus = new Set(focusIds);
    // The selected site first, then highlighted ones in the focus area, then other highlighted ones, whatever their kind.
    const pinOf = (s: { id: string }) => (s.id === selectedSite ? 0 : toned(s.id) ? (inFocus.has(s.id) ? 1 : 2) : null);
    return pickLabels(geometry.sites, kinds, (s) => siteRadiusPx(s.kind, compact, toned(s.id)), size, pinOf);
  }, [geometry, compact, view.zoom, size, emphasis, selectedSite, focusIds]);

  const onLayout = (e: LayoutChangeEvent) => {
    const { width, height } = e.nativeEvent.layout;
    if (width > 0 && height > 0) setSize({ widthPx: width, heightPx: height });
  };
  const select = (kind: MapSelection['kind']) => (id: string) => {
    if (gestures.takeDragged()) return;
    onSelect?.({ kind, id });
  };
  const centre = { x: size.widthPx / 2, y: size.heightPx / 2 };

  return (
    <View style={[styles.frame, !compact && !heightPx && styles.fill]} testID="network-map">
      <View
        ref={surface}
        style={[styles.surface, heightPx ? { height: heightPx } : compact ? styles.compactSurface : styles.fill]}
        onLayout={onLayout}
        {...gestures.panHandlers}
      >
        {/* One image to assistive technology: its groups are drawing, not content (screens list the elements in text). */}
        <Svg width={size.widthPx} height={size.heightPx} role="img" accessibilityLabel={`Map of ${data.name ?? 'the network'}`}>
          <Rect x={0} y={0} width={size.widthPx} height={size.heightPx} fill={mapColors.sea} />
          {geometry.outlinePath ? (
            <Path d={geometry.outlinePath} fill={mapColors.land} stroke={mapColors.coast} strokeWidth={1} fillRule="evenodd" testID="map-outline" />
          ) : null}
          <MapSpanLayer spans={geometry.spans} emphasis={emphasis} selectedId={selected?.kind === 'span' ? selected.id : null} compact={compact} onPress={select('span')} />
          <MapSiteLayer
            sites={geometry.sites}
            emphasis={emphasis}
            selectedId={selectedSite}
            compact={compact}
            labelled={labelled}
            onPress={select('site')}
          />
        </Svg>
        <MapControls
          row={narrow}
          canZoomOut={view.zoom > 1}
          onZoomIn={() => setView((v) => zoomAround(v, ZOOM_STEP, centre))}
          onZoomOut={() => setView((v) => zoomAround(v, 1 / ZOOM_STEP, centre))}
          onReset={() => setView(HOME_VIEW)}
        />
      </View>
      <MapLegend tones={usedTones(highlight, secondaryHighlight)} compact={compact} toneLabels={toneLabels} />
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { backgroundColor: colors.surface, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border, overflow: 'hidden' },
  // WARNING: no `flex: 0` for the compact map: react-native-web turns it into a zero flex-basis and the map collapses.
  fill: { flex: 1 },
  surface: { minHeight: MIN_HEIGHT_PX, overflow: 'hidden', backgroundColor: mapColors.sea, userSelect: 'none', cursor: 'grab' } as object,
  compactSurface: { height: COMPACT_HEIGHT_PX },
});
