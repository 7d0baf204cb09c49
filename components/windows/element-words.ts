// How a site or span reads where people pick or review a window's elements: its name, and a second line that tells
// it apart from similar ones (a site's kind, compute and place; a span's capacity and length). Never its id.
import type { SITE_KINDS } from '@/shared/scenario';
import { formatCpu, formatGbps, formatKm, siteKindLabel } from '@/components/inventory/format';

export type ElementWords = { name: string; detail: string };

type SiteFacts = { name: string; kind: (typeof SITE_KINDS)[number]; cpu: number; lat: number; lon: number };
type SpanFacts = { aName: string; bName: string; capacityGbps: number; lengthKm: number };

/** "55.47° N, 26.53° W": WGS 84 to two decimals (about a kilometre), enough to tell two places apart. */
export function formatPlace(lat: number, lon: number): string {
  const part = (value: number, positive: string, negative: string) => `${Math.abs(value).toFixed(2)}° ${value < 0 ? negative : positive}`;
  return `${part(lat, 'N', 'S')}, ${part(lon, 'E', 'W')}`;
}

/** "Core site" but "Cell site" (the kind already says site). */
export function siteKindWords(kind: SiteFacts['kind']): string {
  return kind === 'cell-site' ? siteKindLabel(kind) : `${siteKindLabel(kind)} site`;
}

/** "Vellaport" / "Core site · 640 vCPU · 55.47° N, 26.53° W" */
export function siteWords(site: SiteFacts): ElementWords {
  return { name: site.name, detail: `${siteKindWords(site.kind)} · ${formatCpu(site.cpu)} · ${formatPlace(site.lat, site.lon)}` };
}

/** A span by its two ends, the way the change-board pack names it: "Vellaport – Orrindale" / "Span · 100 Gbit/s · 65.5 km" */
export function spanWords(span: SpanFacts): ElementWords {
  return { name: `${span.aName} – ${span.bName}`, detail: `Span · ${formatGbps(span.capacityGbps)} · ${formatKm(span.lengthKm)}` };
}

/** What stands in while the inventory has not answered, or when the element is gone from it. */
export function unknownElementWords(kind: 'site' | 'span', state: 'loading' | 'missing' | 'failed'): ElementWords {
  const noun = kind === 'site' ? 'site' : 'span';
  if (state === 'missing') return { name: `A ${noun} no longer in the inventory`, detail: 'It has been removed from the network inventory.' };
  if (state === 'failed') return { name: `A ${noun} whose name could not be loaded`, detail: 'Reload the page to try again.' };
  return { name: `Looking up the ${noun}…`, detail: '' };
}
