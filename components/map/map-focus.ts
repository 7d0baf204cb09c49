// Fits a map to the area that matters (a window's equipment, a plan's moves) instead of the whole network:
// which sites make up that area, and the zoom and pan that show it with a margin.
import type { MapView } from '@/components/map/map-view';
import { MAX_ZOOM, MIN_ZOOM } from '@/components/map/map-view';
import type { NetworkMapData } from '@/components/map/map-types';
import type { Point } from '@/components/map/projection';

export type MapFocus = { sites?: readonly string[]; spans?: readonly string[] };

/**
 * The sites of the focus area: the focus sites, both ends of the focus spans, and every site one span away from
 * those, so the area shows where the traffic comes from and goes to. Ids not in the data are left out.
 */
export function focusSiteIds(data: Pick<NetworkMapData, 'sites' | 'spans'>, focus: MapFocus): string[] {
  const known = new Set(data.sites.map((s) => s.id));
  const core = new Set<string>((focus.sites ?? []).filter((id) => known.has(id)));
  const focusSpans = new Set(focus.spans ?? []);
  for (const span of data.spans) {
    if (!focusSpans.has(span.id)) continue;
    if (known.has(span.a)) core.add(span.a);
    if (known.has(span.b)) core.add(span.b);
  }
  const area = new Set(core);
  for (const span of data.spans) {
    if (core.has(span.a) && known.has(span.b)) area.add(span.b);
    if (core.has(span.b) && known.has(span.a)) area.add(span.a);
  }
  return [...area];
}

/**
 * The view (zoom and pan over the fitted whole-network map) that shows `points` (screen px at zoom 1) inside the
 * viewport with at least `marginPx` on every side. The zoom stays within MIN_ZOOM…MAX_ZOOM, so an area as big as
 * the network gives the home view; `topInsetPx` keeps the area clear of buttons along the top.
 */
export function viewForArea(
  points: readonly Point[],
  size: { widthPx: number; heightPx: number },
  marginPx: number,
  topInsetPx = 0,
): MapView | null {
  const finite = points.filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y));
  if (finite.length === 0) return null;
  const xs = finite.map((p) => p.x);
  const ys = finite.map((p) => p.y);
  const box = { left: Math.min(...xs), right: Math.max(...xs), top: Math.min(...ys), bottom: Math.max(...ys) };
  const innerW = Math.max(1, size.widthPx - 2 * marginPx);
  const innerH = Math.max(1, size.heightPx - topInsetPx - 2 * marginPx);
  // A lone site has no extent: treat it as a small area rather than zooming in without limit.
  const width = Math.max(box.right - box.left, 1);
  const height = Math.max(box.bottom - box.top, 1);
  const zoom = Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, Math.min(innerW / width, innerH / height)));
  if (zoom === MIN_ZOOM) return { zoom: MIN_ZOOM, panX: 0, panY: 0 };
  const centre = { x: (box.left + box.right) / 2, y: (box.top + box.bottom) / 2 };
  const target = { x: size.widthPx / 2, y: topInsetPx + (size.heightPx - topInsetPx) / 2 };
  return { zoom, panX: target.x - centre.x * zoom, panY: target.y - centre.y * zoom };
}

/** Most a portrait start view enlarges the whole network beyond fitting its width: the rest is one pan away. */
export const PORTRAIT_FILL_MAX_ZOOM = 1.7;

/**
 * A phone held upright fits a wide network by its width and leaves most of the height empty. This start view
 * enlarges the network towards the viewport's height (at most PORTRAIT_FILL_MAX_ZOOM, so only the far east and
 * west edges start off screen), centred on the network; null when the viewport is not taller than the network.
 */
export function portraitFillView(points: readonly Point[], size: { widthPx: number; heightPx: number }, marginPx: number, topInsetPx = 0): MapView | null {
  const finite = points.filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y));
  if (finite.length < 2 || size.heightPx <= size.widthPx) return null;
  const ys = finite.map((p) => p.y);
  const xs = finite.map((p) => p.x);
  const height = Math.max(...ys) - Math.min(...ys);
  const innerH = size.heightPx - topInsetPx - 2 * marginPx;
  if (height <= 0 || innerH <= height) return null;
  const zoom = Math.min(PORTRAIT_FILL_MAX_ZOOM, innerH / height);
  const centre = { x: (Math.min(...xs) + Math.max(...xs)) / 2, y: (Math.min(...ys) + Math.max(...ys)) / 2 };
  const target = { x: size.widthPx / 2, y: topInsetPx + (size.heightPx - topInsetPx) / 2 };
  return { zoom, panX: target.x - centre.x * zoom, panY: target.y - centre.y * zoom };
}
