// The window of a real-shape benchmark scenario: one site and two spans down at once (spans that do not touch
// that site), all three carrying slices today, chosen so that the rest of the network stays connected — a
// window that splits the network leaves slices without any way round, which tells nothing about a planner.
import type { ScenarioWindow } from '../../shared/scenario';
import type { Inventory } from '../../planner/model/types';
import { randomInt, type Rng } from '../../planner/random/rng';

const ATTEMPTS = 500;

function loadedElements(inv: Inventory): { sites: number[]; spans: number[] } {
  const sites = new Set<number>();
  const spans = new Set<number>();
  for (const p of inv.placements) {
    p.sites.forEach((s) => sites.add(s));
    p.paths.forEach((path) => path.forEach((s) => spans.add(s)));
  }
  return { sites: [...sites].sort((a, b) => a - b), spans: [...spans].sort((a, b) => a - b) };
}

/** Whether the sites other than `site` stay connected without `site`'s spans and the two spans. */
function staysConnected(inv: Inventory, site: number, spans: number[]): boolean {
  const net = inv.network;
  const start = site === 0 ? 1 : 0;
  const seen = new Uint8Array(net.sites.length);
  seen[site] = 1;
  seen[start] = 1;
  const stack = [start];
  let reached = 1;
  while (stack.length > 0) {
    const u = stack.pop()!;
    for (let k = net.adjStart[u]; k < net.adjStart[u + 1]; k += 1) {
      const v = net.adjSite[k];
      if (seen[v] || spans.includes(net.adjSpan[k])) continue;
      seen[v] = 1;
      reached += 1;
      stack.push(v);
    }
  }
  return reached === net.sites.length - 1;
}

/** 22:00–02:00 local (UTC+01:00), a night-work slot. */
const NIGHT = { start: '2030-03-04T22:00:00+01:00', end: '2030-03-05T02:00:00+01:00' };

/** One random site-and-two-spans window over loaded elements, or null when it would split the network. */
function drawWindow(inv: Inventory, loaded: { sites: number[]; spans: number[] }, rng: Rng, id: string): ScenarioWindow | null {
  const net = inv.network;
  const site = loaded.sites[randomInt(rng, loaded.sites.length)];
  const away = loaded.spans.filter((s) => net.spans[s].a !== site && net.spans[s].b !== site);
  if (away.length < 2) return null;
  const first = away[randomInt(rng, away.length)];
  const rest = away.filter((s) => s !== first);
  const second = rest[randomInt(rng, rest.length)];
  if (!staysConnected(inv, site, [first, second])) return null;
  return {
    id, title: 'Site power work and two fibre splices', ...NIGHT, workType: 'combined',
    down: { sites: [net.sites[site].id], spans: [net.spans[first].id, net.spans[second].id] }, reduced: [],
  };
}

/**
 * A window that keeps the network connected: among the first ATTEMPTS draws, the first that `prefer` accepts,
 * else the first drawn.
 */
export function pickRealShapeWindow(inv: Inventory, rng: Rng, prefer: (w: ScenarioWindow) => boolean = () => true, id = 'window-1'): ScenarioWindow {
  const loaded = loadedElements(inv);
  let fallback: ScenarioWindow | undefined;
  for (let attempt = 0; attempt < ATTEMPTS; attempt += 1) {
    const w = drawWindow(inv, loaded, rng, id);
    if (!w) continue;
    if (prefer(w)) return w;
    fallback ??= w;
  }
  if (fallback) return fallback;
  throw new RangeError('no site-and-two-spans window keeps this network connected');
}
