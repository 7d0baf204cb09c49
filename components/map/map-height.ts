// How tall a map inside a scrolling page is drawn: most of a phone's width, capped so the page can still be scrolled past.

/** Bounds of an in-page map's drawing, legend not included. */
export const PAGE_MAP_HEIGHT_PX = { min: 300, max: 480 } as const;

/**
 * Height for a map in a column `columnWidthPx` wide on a window `windowHeightPx` tall: at least half the window
 * (a narrow column gets a tall map rather than a small one), near-square in a wide column, never over 60 % of it.
 */
export function pageMapHeightPx(columnWidthPx: number, windowHeightPx: number): number {
  const wanted = Math.min(Math.max(columnWidthPx * 0.9, windowHeightPx * 0.5), windowHeightPx * 0.6);
  return Math.round(Math.min(PAGE_MAP_HEIGHT_PX.max, Math.max(PAGE_MAP_HEIGHT_PX.min, wanted)));
}
