// Chooses which site names to print and on which side: bigger kinds first, never over another name or site.
import type { PlacedSite } from '@/components/map/map-geometry';
import { KIND_ORDER } from '@/components/map/site-glyphs';

/** Rough width of one character of the 12 px label font; enough to keep boxes apart without measuring text. */
const CHAR_WIDTH_PX = 6.6;
const LABEL_HEIGHT_PX = 14;
/** Gap between a glyph and its name. */
export const LABEL_GAP_PX = 4;

export type LabelSide = 'right' | 'left' | 'above' | 'below';
/** Sides tried in turn: beside the site reads best, above or below when both beside are taken. */
const SIDES: readonly LabelSide[] = ['right', 'left', 'above', 'below'];
type Box = { left: number; top: number; right: number; bottom: number };

const overlaps = (a: Box, b: Box) => a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom;

function glyphBox(site: PlacedSite, r: number): Box {
  return { left: site.x - r, top: site.y - r, right: site.x + r, bottom: site.y + r };
}

/** Label box beside a glyph of radius `r` (baseline just under the site's centre), or centred above or below it. */
export function labelBox(site: PlacedSite, r: number, side: LabelSide = 'right'): Box {
  const width = site.name.length * CHAR_WIDTH_PX;
  if (side === 'above' || side === 'below') {
    const top = side === 'above' ? site.y - r - LABEL_GAP_PX - LABEL_HEIGHT_PX : site.y + r + LABEL_GAP_PX;
    return { left: site.x - width / 2, top, right: site.x + width / 2, bottom: top + LABEL_HEIGHT_PX };
  }
  const left = side === 'right' ? site.x + r + LABEL_GAP_PX : site.x - r - LABEL_GAP_PX - width;
  return { left, top: site.y - LABEL_HEIGHT_PX / 2 - 2, right: left + width, bottom: site.y + LABEL_HEIGHT_PX / 2 };
}

/** Where the text is drawn for a label box: its anchor point and alignment (baseline ~3 px above the box's bottom). */
export function labelAnchor(site: PlacedSite, r: number, side: LabelSide): { x: number; y: number; anchor: 'start' | 'end' | 'middle' } {
  const box = labelBox(site, r, side);
  if (side === 'right') return { x: box.left, y: site.y + 4, anchor: 'start' };
  if (side === 'left') return { x: box.right, y: site.y + 4, anchor: 'end' };
  return { x: site.x, y: box.bottom - 3, anchor: 'middle' };
}

/**
 * The sites to name, each with its side: pinned ones first (the selected site, highlighted ones; `pinOf` gives
 * their order, null for unpinned), then the first `kindCount` kinds, biggest first. A name goes right of its site,
 * else left, else above, else below; it is left out when every side would cover another name or any site's glyph,
 * or fall outside the viewport — except pin 0 (the selected site), which is always named.
 */
export function pickLabels(
  sites: readonly PlacedSite[],
  kindCount: number,
  radiusOf: (site: PlacedSite) => number,
  size: { widthPx: number; heightPx: number },
  pinOf: (site: PlacedSite) => number | null = () => null,
): Map<string, LabelSide> {
  const chosen = new Map<string, LabelSide>();
  // Every glyph is an obstacle from the start: a name over a site would read as that site's name.
  const taken: { id: string | null; box: Box }[] = sites.map((s) => ({ id: s.id, box: glyphBox(s, radiusOf(s)) }));
  // Pinned sites rank below every kind index, so they are always candidates and placed first.
  const rank = (s: PlacedSite) => {
    const pin = pinOf(s);
    return pin === null ? KIND_ORDER.indexOf(s.kind) : pin - KIND_ORDER.length - 1;
  };
  const candidates = sites.filter((s) => rank(s) < kindCount).sort((a, b) => rank(a) - rank(b));
  const fits = (site: PlacedSite, box: Box) =>
    box.left >= 0 && box.right <= size.widthPx && box.top >= 0 && box.bottom <= size.heightPx &&
    !taken.some((t) => t.id !== site.id && overlaps(t.box, box));
  for (const site of candidates) {
    // Pin 0 (the selected site) is named even in a crowd: the user is looking for it.
    const side = SIDES.find((s) => fits(site, labelBox(site, radiusOf(site), s))) ??
      (pinOf(site) === 0 ? 'right' : undefined);
    if (!side) continue;
    taken.push({ id: null, box: labelBox(site, radiusOf(site), side) });
    chosen.set(site.id, side);
  }
  return chosen;
}
