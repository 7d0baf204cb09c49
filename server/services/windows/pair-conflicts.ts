// Why two time-overlapping windows conflict (DESIGN §4.4): a shared element, a split of the network that
// only both together cause, or a slice whose function sites only both together disconnect.
import { countComponents, type ElementMask } from '../../../planner/impact/bridges';
import type { Inventory, NetworkModel } from '../../../planner/model/types';
import type { WindowConflict } from '../../../shared/window-impact';
import type { ElementRow } from '../../queries/windows/window-rows';

type Reason = WindowConflict['reasons'][number];

/** What one window does to connectivity; cached per window so N overlapping windows cost N, not N². */
export type Outage = { mask: Required<ElementMask>; components: number; labels: Int32Array };

/** Only `down` elements cut the graph; a reduced element still connects. Unknown ids are ignored. */
export function outageOf(net: NetworkModel, elements: readonly ElementRow[]): Outage {
  const mask = { siteDown: new Uint8Array(net.sites.length), spanDown: new Uint8Array(net.spans.length) };
  for (const e of elements) {
    if (e.effect !== 'down') continue;
    const i = (e.kind === 'site' ? net.siteIndex : net.spanIndex).get(e.id);
    if (i !== undefined) (e.kind === 'site' ? mask.siteDown : mask.spanDown)[i] = 1;
  }
  return withMask(net, mask);
}

function withMask(net: NetworkModel, mask: Required<ElementMask>): Outage {
  return { mask, components: countComponents(net, mask), labels: componentLabels(net, mask) };
}

/** Component number per site under the mask; -1 for a site that is down. */
export function componentLabels(net: NetworkModel, mask: Required<ElementMask>): Int32Array {
  const labels = new Int32Array(net.sites.length).fill(-1);
  const queue = new Int32Array(net.sites.length);
  let next = 0;
  for (let root = 0; root < net.sites.length; root++) {
    if (labels[root] !== -1 || mask.siteDown[root]) continue;
    let [head, tail] = [0, 0];
    queue[tail++] = root;
    labels[root] = next;
    while (head < tail) {
      const v = queue[head++];
      for (let k = net.adjStart[v]; k < net.adjStart[v + 1]; k++) {
        const w = net.adjSite[k];
        const span = net.spans[net.adjSpan[k]];
        if (labels[w] !== -1 || mask.siteDown[w] || mask.spanDown[span.index]) continue;
        labels[w] = next;
        queue[tail++] = w;
      }
    }
    next++;
  }
  return labels;
}

function combine(net: NetworkModel, a: Outage, b: Outage): Outage {
  const or = (x: Uint8Array, y: Uint8Array) => x.map((v, i) => v | y[i]);
  return withMask(net, { siteDown: or(a.mask.siteDown, b.mask.siteDown), spanDown: or(a.mask.spanDown, b.mask.spanDown) });
}

function connected(labels: Int32Array, sites: readonly number[]): boolean {
  return sites.every((s) => labels[s] !== -1 && labels[s] === labels[sites[0]]);
}

function strandMessage(slices: readonly string[]): string {
  return `Together the windows cut off parts of ${slices.length} slice(s): ${slices.join(', ')}.`;
}

function sharedElements(a: readonly ElementRow[], b: readonly ElementRow[]): string[] {
  const keys = new Set(a.map((e) => `${e.kind}:${e.id}`));
  return [...new Set(b.map((e) => `${e.kind}:${e.id}`))].filter((k) => keys.has(k)).sort();
}

/** Slices whose function sites stay connected under each window alone but not under both. */
function strandedSlices(inv: Inventory, a: Outage, b: Outage, both: Outage): string[] {
  const out: string[] = [];
  inv.placements.forEach((p, s) => {
    if (connected(both.labels, p.sites)) return;
    if (connected(a.labels, p.sites) && connected(b.labels, p.sites)) out.push(inv.slices[s].id);
  });
  return out;
}

type Side = { elements: readonly ElementRow[]; outage: Outage };

/**
 * `baseComponents` = components of the intact network. Outages in unrelated parts of the network add up
 * (each adds its own pieces), so only a count above the sum of both windows' own splits is a joint split.
 */
export function pairConflictReasons(inv: Inventory, a: Side, b: Side, baseComponents: number): Reason[] {
  const reasons: Reason[] = [];
  const shared = sharedElements(a.elements, b.elements);
  if (shared.length > 0) {
    reasons.push({ reason: 'shared-element', message: `Both windows take out ${shared.join(', ')}.`, ids: shared });
  }
  const both = combine(inv.network, a.outage, b.outage);
  if (both.components > a.outage.components + b.outage.components - baseComponents) {
    reasons.push({
      reason: 'joint-split', ids: [],
      message: `Together the windows split the network into ${both.components} parts; apart they would not.`,
    });
  }
  const stranded = strandedSlices(inv, a.outage, b.outage, both);
  if (stranded.length > 0) {
    reasons.push({ reason: 'strands-slice', ids: stranded, message: strandMessage(stranded) });
  }
  return reasons;
}
