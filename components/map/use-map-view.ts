// The map's zoom and pan: starts on the focus area when there is one (else the whole network), then follows the user.
// A new focus (another slice chosen on a plan) starts over from its own area.
import { useCallback, useMemo, useState } from 'react';
import { focusSiteIds, portraitFillView, viewForArea, type MapFocus } from '@/components/map/map-focus';
import type { NetworkMapData } from '@/components/map/map-types';
import { HOME_VIEW, type MapView } from '@/components/map/map-view';
import type { Projection } from '@/components/map/projection';

/** Room around the focus area for glyphs and names: a name runs ~100 px beside its site, left or right. */
const FOCUS_MARGIN_PX = 56;

type Options = {
  data: NetworkMapData;
  projection: Projection;
  size: { widthPx: number; heightPx: number };
  focus: MapFocus | undefined;
  topInsetPx: number;
  /** Without a focus, start enlarged towards the height of a portrait viewport (the phone's map screen). */
  fillPortrait?: boolean;
};

/** Room around the whole network when it starts enlarged on a portrait screen. */
const PORTRAIT_MARGIN_PX = 16;

export function useMapView({ data, projection, size, focus, topInsetPx, fillPortrait = false }: Options) {
  const focusKey = useMemo(() => (focus ? [...(focus.sites ?? []), '|', ...(focus.spans ?? [])].join(',') : ''), [focus]);
  const focusIds = useMemo(() => (focus ? focusSiteIds(data, focus) : []), [data, focus]);
  const start = useMemo(() => {
    if (focusIds.length === 0) {
      if (!fillPortrait) return HOME_VIEW;
      return portraitFillView(data.sites.map((s) => projection.project(s)), size, PORTRAIT_MARGIN_PX, topInsetPx) ?? HOME_VIEW;
    }
    const ids = new Set(focusIds);
    const points = data.sites.filter((s) => ids.has(s.id)).map((s) => projection.project(s));
    return viewForArea(points, size, FOCUS_MARGIN_PX, topInsetPx) ?? HOME_VIEW;
  }, [data, focusIds, projection, size, topInsetPx, fillPortrait]);
  // The user's own view, kept only while the focus it was made under still holds.
  const [own, setOwn] = useState<{ key: string; view: MapView } | null>(null);
  const view = own && own.key === focusKey ? own.view : start;
  const setView = useCallback(
    (next: MapView | ((current: MapView) => MapView)) =>
      setOwn((prev) => {
        const current = prev && prev.key === focusKey ? prev.view : start;
        return { key: focusKey, view: typeof next === 'function' ? next(current) : next };
      }),
    [focusKey, start],
  );
  return { view, setView, startView: start, focusIds };
}
