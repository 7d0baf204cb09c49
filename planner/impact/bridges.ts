// Bridges and connected components of the network with some elements removed (iterative, so large networks are safe).
// Reference: R. E. Tarjan, "A note on finding the bridges of a graph", Information Processing Letters 2(6), 1974.
import type { NetworkModel } from '../model/types';

export interface ElementMask {
  siteDown?: Uint8Array;
  spanDown?: Uint8Array;
}

function usable(net: NetworkModel, span: number, mask: ElementMask): boolean {
  if (mask.spanDown?.[span]) return false;
  const s = net.spans[span];
  return !(mask.siteDown && (mask.siteDown[s.a] || mask.siteDown[s.b]));
}

/** 1 for each span whose removal disconnects its ends (parallel spans protect each other). */
export function findBridges(net: NetworkModel, mask: ElementMask = {}): Uint8Array {
  const n = net.sites.length;
  const bridge = new Uint8Array(net.spans.length);
  const order = new Int32Array(n).fill(-1);
  const low = new Int32Array(n);
  const viaSpan = new Int32Array(n).fill(-1);
  const cursor = new Int32Array(n);
  const stack = new Int32Array(n);
  let counter = 0;
  for (let root = 0; root < n; root++) {
    if (order[root] !== -1 || mask.siteDown?.[root]) continue;
    let top = 0;
    stack[0] = root;
    order[root] = low[root] = counter++;
    cursor[root] = net.adjStart[root];
    while (top >= 0) {
      const v = stack[top];
      if (cursor[v] < net.adjStart[v + 1]) {
        const k = cursor[v]++;
        const span = net.adjSpan[k];
        const w = net.adjSite[k];
        if (span === viaSpan[v] || w === v || !usable(net, span, mask)) continue;
        if (order[w] === -1) {
          order[w] = low[w] = counter++;
          viaSpan[w] = span;
          cursor[w] = net.adjStart[w];
          stack[++top] = w;
        } else low[v] = Math.min(low[v], order[w]);
        continue;
      }
      top--;
      if (top < 0) break;
      const parent = stack[top];
      low[parent] = Math.min(low[parent], low[v]);
      if (low[v] > order[parent]) bridge[viaSpan[v]] = 1;
    }
  }
  return bridge;
}

/** Number of connected components among the sites that are not down. */
export function countComponents(net: NetworkModel, mask: ElementMask = {}): number {
  const n = net.sites.length;
  const seen = new Uint8Array(n);
  const queue = new Int32Array(n);
  let components = 0;
  for (let root = 0; root < n; root++) {
    if (seen[root] || mask.siteDown?.[root]) continue;
    components++;
    let head = 0;
    let tail = 0;
    queue[tail++] = root;
    seen[root] = 1;
    while (head < tail) {
      const v = queue[head++];
      for (let k = net.adjStart[v]; k < net.adjStart[v + 1]; k++) {
        const w = net.adjSite[k];
        if (seen[w] || !usable(net, net.adjSpan[k], mask)) continue;
        seen[w] = 1;
        queue[tail++] = w;
      }
    }
  }
  return components;
}
