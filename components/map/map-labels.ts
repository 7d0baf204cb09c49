// Chooses which site names to print: bigger kinds first, and never a label over another one.
import type { PlacedSite } from '@/components/map/map-geometry';
import { KIND_ORDER } from '@/components/map/site-glyphs';

/** Rough width of one character of the 12 px label font; enough to keep boxes apart without measuring text. */
const CHAR_WIDTH_PX = 6.6;
const LABEL_HEIGHT_PX = 14;

type Box = { left: number; top: number; right: number; bottom: number };

const overlaps = (a: Box, b: Box) => a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom;

function glyphBox(site: PlacedSite, r: number): Box {
  return { left: site.x - r, top: site.y - r, right: site.x + r, bottom: site.y + r };
}

/** Label box to the right of a glyph of radius `r`, baseline just under the site's centre. */
export function labelBox(site: PlacedSite, r: number): Box {
  const left = site.x + r + 4;
  return { left, top: site.y - LABEL_HEIGHT_PX / 2 - 2, right: left + site.name.length * CHAR_WIDTH_PX, bottom: site.y + LABEL_HEIGHT_PX / 2 };
}

/**
 * Ids of the sites to label: pinned ones first (the selected site, highlighted ones; `pinOf` gives their order,
 * null for unpinned), then the first `kindCount` kinds, biggest first, skipping any label that would overlap one
 * already placed or fall outside the viewport.
 */
export function pickLabels(
  sites: readonly PlacedSite[],
  kindCount: number,
  radiusOf: (site: PlacedSite) => number,
  size: { widthPx: number; heightPx: number },
  pinOf: (site: PlacedSite) => number | null = () => null,
): Set<string> {
  const chosen = new Set<string>();
  const placed: Box[] = [];
  // Pinned sites rank below every kind index, so they are always candidates and placed first.
  const rank = (s: PlacedSite) => {
    const pin = pinOf(s);
    return pin === null ? KIND_ORDER.indexOf(s.kind) : pin - KIND_ORDER.length - 1;
  };
  const candidates = sites.filter((s) => rank(s) < kindCount).sort((a, b) => rank(a) - rank(b));
  // A name must not cover another named-kind site's glyph either (it would read as that site's name).
  const glyphs = candidates.map((s) => ({ id: s.id, box: glyphBox(s, radiusOf(s)) }));
  for (const site of candidates) {
    const box = labelBox(site, radiusOf(site));
    const visible = box.right > 0 && box.left < size.widthPx && box.bottom > 0 && box.top < size.heightPx;
    const coversGlyph = glyphs.some((g) => g.id !== site.id && overlaps(g.box, box));
    if (!visible || coversGlyph || placed.some((p) => overlaps(p, box))) continue;
    placed.push(box);
    chosen.add(site.id);
  }
  return chosen;
}
