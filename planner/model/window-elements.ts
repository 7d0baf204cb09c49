// Resolves a window's element ids to indices once, so every planner pass works on numbers.
import { UnknownElementError } from '../errors';
import type { NetworkModel, WindowSpec } from './types';

export interface WindowElements {
  downSites: number[];
  downSpans: number[];
  /** smallest fraction per reduced element (an element listed twice keeps the harsher cut) */
  reducedSites: Map<number, number>;
  reducedSpans: Map<number, number>;
}

function lookup(index: Map<string, number>, id: string, what: string, windowId: string): number {
  const i = index.get(id);
  if (i === undefined) throw new UnknownElementError(`window "${windowId}" names unknown ${what} "${id}"`);
  return i;
}

function keepSmallest(map: Map<number, number>, key: number, fraction: number): void {
  map.set(key, Math.min(map.get(key) ?? 1, fraction));
}

export function resolveWindow(net: NetworkModel, window: WindowSpec): WindowElements {
  const downSites = window.downSites.map((id) => lookup(net.siteIndex, id, 'site', window.id));
  const downSpans = window.downSpans.map((id) => lookup(net.spanIndex, id, 'span', window.id));
  const reducedSites = new Map<number, number>();
  const reducedSpans = new Map<number, number>();
  for (const r of window.reduced) {
    if ('site' in r) keepSmallest(reducedSites, lookup(net.siteIndex, r.site, 'site', window.id), r.fraction);
    else keepSmallest(reducedSpans, lookup(net.spanIndex, r.span, 'span', window.id), r.fraction);
  }
  return { downSites, downSpans, reducedSites, reducedSpans };
}
