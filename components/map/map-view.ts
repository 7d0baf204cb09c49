// The user's view onto the fitted map: a zoom factor and a pan offset in screen pixels, applied after the projection.
import type { Point } from '@/components/map/projection';

export type MapView = { zoom: number; panX: number; panY: number };

export const HOME_VIEW: MapView = { zoom: 1, panX: 0, panY: 0 };
export const MIN_ZOOM = 1;
export const MAX_ZOOM = 16;
/** One press of + or − changes the zoom by this factor. */
export const ZOOM_STEP = 1.6;

export function applyView(view: MapView, p: Point): Point {
  return { x: p.x * view.zoom + view.panX, y: p.y * view.zoom + view.panY };
}

/**
 * Zooms by `factor` keeping the map point under `focus` (screen px) where it is, as a wheel or pinch should.
 * The zoom is held within MIN_ZOOM…MAX_ZOOM; at MIN_ZOOM the view returns home so the whole network shows.
 */
export function zoomAround(view: MapView, factor: number, focus: Point): MapView {
  const zoom = Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, view.zoom * factor));
  if (zoom === MIN_ZOOM) return HOME_VIEW;
  const ratio = zoom / view.zoom;
  return { zoom, panX: focus.x - (focus.x - view.panX) * ratio, panY: focus.y - (focus.y - view.panY) * ratio };
}

/**
 * Moves the view by a drag of (dx, dy) px, keeping at least `marginPx` of the map's box inside the viewport
 * so the network cannot be dragged out of sight.
 */
export function panBy(view: MapView, dx: number, dy: number, size: { widthPx: number; heightPx: number }, marginPx = 48): MapView {
  const clamp = (pan: number, extentPx: number) => {
    const scaled = extentPx * view.zoom;
    const min = marginPx - scaled;
    const max = extentPx - marginPx;
    return Math.min(max, Math.max(min, pan));
  };
  return { zoom: view.zoom, panX: clamp(view.panX + dx, size.widthPx), panY: clamp(view.panY + dy, size.heightPx) };
}

/** Which site kinds carry a name label at this zoom: the big sites first, the small ones only when close in. */
export function labelledKindCount(zoom: number): number {
  if (zoom < 1.5) return 1;
  if (zoom < 3) return 2;
  if (zoom < 6) return 3;
  return 4;
}
