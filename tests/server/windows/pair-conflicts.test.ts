// pairConflictReasons on small compiled networks: joint splits only when the pair does more than each alone.
import { buildInventory } from '../../../planner/model/build-inventory';
import { countComponents } from '../../../planner/impact/bridges';
import type { Scenario } from '../../../shared/scenario';
import { outageOf, pairConflictReasons } from '../../../server/services/windows/pair-conflicts';
import type { ElementRow } from '../../../server/queries/windows/window-rows';

/** A line a–b–c–d–e plus a ring p–q–r–s; one slice on a and e, one on p and r. */
function scenario(): Scenario {
  const site = (id: string) => ({ id, name: id, kind: 'edge' as const, lat: 0, lon: 0, cpu: 8 });
  const span = (id: string, a: string, b: string) => ({ id, a, b, capacityGbps: 10, lengthKm: 1 });
  const slice = (id: string) => ({ id, tenant: 't', name: id, sst: 1, priority: 3, functions: [{ id: `${id}-f1`, cpu: 1 }, { id: `${id}-f2`, cpu: 1 }], ties: [] });
  return {
    format: 'slackwater-scenario/1',
    sites: ['a', 'b', 'c', 'd', 'e', 'p', 'q', 'r', 's'].map(site),
    spans: [span('ab', 'a', 'b'), span('bc', 'b', 'c'), span('cd', 'c', 'd'), span('de', 'd', 'e'),
      span('pq', 'p', 'q'), span('qr', 'q', 'r'), span('rs', 'r', 's'), span('sp', 's', 'p')],
    tenants: [{ id: 't', name: 'T', noticeDays: 1 }],
    slices: [slice('line'), slice('ring')],
    placements: [
      { slice: 'line', sites: { 'line-f1': 'a', 'line-f2': 'e' }, paths: {} },
      { slice: 'ring', sites: { 'ring-f1': 'p', 'ring-f2': 'r' }, paths: {} },
    ],
  } as Scenario;
}

const inv = buildInventory(scenario());
const base = countComponents(inv.network);
const side = (...spans: string[]) => {
  const elements: ElementRow[] = spans.map((id) => ({ kind: 'span', id, effect: 'down', fraction: null }));
  return { elements, outage: outageOf(inv.network, elements) };
};

test('two cuts in unrelated places each split on their own: no joint split, no stranded slice', () => {
  expect(pairConflictReasons(inv, side('ab'), side('qr'), base)).toEqual([]);
});

test('two cuts on the same line each split it alone: the pair adds nothing jointly', () => {
  expect(pairConflictReasons(inv, side('ab'), side('de'), base)).toEqual([]);
});

test('two cuts of one ring: harmless alone, together a split that strands the ring slice', () => {
  const reasons = pairConflictReasons(inv, side('pq'), side('rs'), base);
  expect(reasons.map((r) => r.reason)).toEqual(['joint-split', 'strands-slice']);
  expect(reasons[1].ids).toEqual(['ring']);
});

test('a shared element is reported with its id even when nothing splits', () => {
  const reasons = pairConflictReasons(inv, side('pq'), side('pq'), base);
  expect(reasons).toEqual([expect.objectContaining({ reason: 'shared-element', ids: ['span:pq'] })]);
});
