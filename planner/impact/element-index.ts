// Reverse index from physical elements to the slices on them, so impact work is proportional to the answer.
import type { Inventory } from '../model/types';

/** CSR lists: entries of site i are siteSlice/siteFn[siteStart[i] .. siteStart[i+1]-1]; likewise for spans. */
export interface ElementIndex {
  siteStart: Int32Array;
  siteSlice: Int32Array;
  siteFn: Int32Array;
  spanStart: Int32Array;
  spanSlice: Int32Array;
  spanTie: Int32Array;
}

function csr(count: number, pairs: [number, number, number][]) {
  const start = new Int32Array(count + 1);
  for (const [element] of pairs) start[element + 1]++;
  for (let i = 0; i < count; i++) start[i + 1] += start[i];
  const fill = start.slice(0, count);
  const slice = new Int32Array(pairs.length);
  const part = new Int32Array(pairs.length);
  // Pairs arrive in (slice, part) order, so each element's entries stay sorted.
  for (const [element, s, p] of pairs) {
    slice[fill[element]] = s;
    part[fill[element]++] = p;
  }
  return { start, slice, part };
}

export function buildElementIndex(inv: Inventory): ElementIndex {
  const sitePairs: [number, number, number][] = [];
  const spanPairs: [number, number, number][] = [];
  inv.placements.forEach((p, s) => {
    p.sites.forEach((site, f) => sitePairs.push([site, s, f]));
    p.paths.forEach((path, t) => {
      // A loopless path lists a span once; dedupe anyway so a tie is never counted twice on a span.
      for (const span of new Set(path)) spanPairs.push([span, s, t]);
    });
  });
  const sites = csr(inv.network.sites.length, sitePairs);
  const spans = csr(inv.network.spans.length, spanPairs);
  return {
    siteStart: sites.start, siteSlice: sites.slice, siteFn: sites.part,
    spanStart: spans.start, spanSlice: spans.slice, spanTie: spans.part,
  };
}

const cache = new WeakMap<Inventory, ElementIndex>();

/** Built once per inventory (inventories are treated as immutable). */
export function elementIndexFor(inv: Inventory): ElementIndex {
  let index = cache.get(inv);
  if (index === undefined) {
    index = buildElementIndex(inv);
    cache.set(inv, index);
  }
  return index;
}
