// Our own site shapes, one per kind, as SVG path data centred on a point: bigger, more angular shapes for bigger sites.
import type { MapSiteKind } from '@/components/map/map-types';

/** Half-size of each kind's glyph in px at a normal map; compact maps draw them smaller. */
export const GLYPH_RADIUS_PX: Record<MapSiteKind, number> = { core: 9, aggregation: 7.5, edge: 5.5, 'cell-site': 3.5 };

/** Kinds from biggest to smallest: the order for drawing (small on top), labelling and the legend. */
export const KIND_ORDER: readonly MapSiteKind[] = ['core', 'aggregation', 'edge', 'cell-site'];

export const KIND_LABELS: Record<MapSiteKind, string> = {
  core: 'Core',
  aggregation: 'Aggregation',
  edge: 'Edge',
  'cell-site': 'Cell site',
};

const f = (n: number) => Number(n.toFixed(2));

function polygon(x: number, y: number, r: number, corners: number, startDeg: number): string {
  const points = Array.from({ length: corners }, (_, i) => {
    const a = ((startDeg + (360 / corners) * i) * Math.PI) / 180;
    return `${f(x + r * Math.cos(a))} ${f(y + r * Math.sin(a))}`;
  });
  return `M${points.join(' L')} Z`;
}

function circle(x: number, y: number, r: number): string {
  return `M${f(x - r)} ${f(y)} A${f(r)} ${f(r)} 0 1 0 ${f(x + r)} ${f(y)} A${f(r)} ${f(r)} 0 1 0 ${f(x - r)} ${f(y)} Z`;
}

/** core = hexagon (flat top), aggregation = diamond, edge = square, cell site = small circle. */
export function glyphPath(kind: MapSiteKind, x: number, y: number, r: number): string {
  switch (kind) {
    case 'core':
      return polygon(x, y, r, 6, 0);
    case 'aggregation':
      return polygon(x, y, r, 4, 90);
    case 'edge':
      return polygon(x, y, r * Math.SQRT2 * 0.85, 4, 45);
    case 'cell-site':
      return circle(x, y, r);
  }
}
