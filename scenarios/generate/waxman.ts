// Waxman random transport networks on a lat/lon box, for property tests and benchmarks.
// Reference: B. M. Waxman, "Routing of multipoint connections", IEEE JSAC 6(9), 1988;
// BRITE user manual (Medina et al., Boston University), Waxman router model.
//
// WARNING: convention. Libraries swap α and β; here, as in the BRITE manual,
//   P(u, v) = α · exp(−d(u, v) / (β · L)),   L = the largest distance between any two sites,
// so α scales the overall link density and β the share of long links.
// Two growth models:
//   'incremental' (BRITE's router-level default): sites join one at a time and each new site links to
//     `linksPerSite` earlier sites, a uniformly drawn candidate accepted with probability P(u, v);
//     connected by construction and with mean degree ≈ 2 · linksPerSite at every size.
//   'pairwise' (Waxman 1988 as written): every pair linked independently with P(u, v); the mean degree
//     then grows with n (≈ 112 at 1,000 sites with α = 0.5, β = 0.2), so leftover components are joined
//     to the main one through their nearest pair of sites.
import { greatCircleKm, type LatLon } from '../../planner/geo/great-circle';
import { createRng } from '../../planner/random/rng';

export interface WaxmanOptions {
  sites: number;
  seed: number;
  /** density factor α of the BRITE convention (default 0.5, common in VNE studies — memory) */
  alpha?: number;
  /** long-link factor β of the BRITE convention (default 0.2 — memory) */
  beta?: number;
  model?: 'incremental' | 'pairwise';
  /** links each new site adds in the incremental model (BRITE's m) */
  linksPerSite?: number;
  /** invented region the sites are scattered over (uniformly in lat/lon) */
  box?: { latMin: number; latMax: number; lonMin: number; lonMax: number };
}

export interface WaxmanGraph {
  points: LatLon[];
  /** undirected links as [site, site] index pairs, each pair at most once */
  links: [number, number][];
  /** great-circle length of each link (km) */
  lengthsKm: number[];
  /** the L of P(u, v): largest site-to-site distance (km) */
  maxDistanceKm: number;
}

export const WAXMAN_DEFAULTS = {
  alpha: 0.5,
  beta: 0.2,
  model: 'incremental' as const,
  linksPerSite: 2,
  box: { latMin: 44, latMax: 48, lonMin: 3, lonMax: 9 },
};

export function waxmanGraph(options: WaxmanOptions): WaxmanGraph {
  const o = { ...WAXMAN_DEFAULTS, ...options };
  if (!(o.sites >= 2)) throw new RangeError('a Waxman network needs at least 2 sites');
  const rng = createRng(o.seed);
  const points: LatLon[] = [];
  for (let i = 0; i < o.sites; i += 1) {
    points.push({
      lat: o.box.latMin + rng() * (o.box.latMax - o.box.latMin),
      lon: o.box.lonMin + rng() * (o.box.lonMax - o.box.lonMin),
    });
  }
  const dist = (u: number, v: number) => greatCircleKm(points[u], points[v]);
  let maxDistanceKm = 0;
  for (let u = 0; u < o.sites; u += 1) for (let v = u + 1; v < o.sites; v += 1) maxDistanceKm = Math.max(maxDistanceKm, dist(u, v));
  const prob = (u: number, v: number) => o.alpha * Math.exp(-dist(u, v) / (o.beta * maxDistanceKm));
  const linked = new Set<number>();
  const links: [number, number][] = [];
  const add = (u: number, v: number) => {
    const key = Math.min(u, v) * o.sites + Math.max(u, v);
    if (u === v || linked.has(key)) return false;
    linked.add(key);
    links.push([Math.min(u, v), Math.max(u, v)]);
    return true;
  };
  if (o.model === 'pairwise') pairwiseLinks(o.sites, prob, rng, add);
  else incrementalLinks(o.sites, o.linksPerSite, prob, dist, rng, add);
  joinComponents(o.sites, links, dist, add);
  return { points, links, lengthsKm: links.map(([u, v]) => dist(u, v)), maxDistanceKm };
}

type AddLink = (u: number, v: number) => boolean;

function pairwiseLinks(n: number, prob: (u: number, v: number) => number, rng: () => number, add: AddLink): void {
  for (let u = 0; u < n; u += 1) for (let v = u + 1; v < n; v += 1) if (rng() < prob(u, v)) add(u, v);
}

function incrementalLinks(
  n: number, m: number, prob: (u: number, v: number) => number,
  dist: (u: number, v: number) => number, rng: () => number, add: AddLink,
): void {
  for (let v = 1; v < n; v += 1) {
    const want = Math.min(m, v);
    let made = 0;
    // Rejection sampling as in BRITE; the attempt cap keeps run time bounded when P is tiny.
    for (let attempt = 0; made < want && attempt < 200 * want; attempt += 1) {
      const u = Math.floor(rng() * v);
      if (rng() < prob(u, v) && add(u, v)) made += 1;
    }
    if (made < want) {
      const nearest = Array.from({ length: v }, (_, u) => u).sort((a, b) => dist(a, v) - dist(b, v) || a - b);
      for (const u of nearest) if (made < want && add(u, v)) made += 1;
    }
  }
}

/** Joins every component to the one holding site 0 through the closest pair of sites between them. */
function joinComponents(n: number, links: [number, number][], dist: (u: number, v: number) => number, add: AddLink): void {
  const parent = Int32Array.from({ length: n }, (_, i) => i);
  const find = (x: number): number => {
    while (parent[x] !== x) x = parent[x] = parent[parent[x]];
    return x;
  };
  for (const [u, v] of links) parent[find(u)] = find(v);
  for (;;) {
    const root = find(0);
    const inMain: number[] = [];
    const outside: number[] = [];
    for (let i = 0; i < n; i += 1) (find(i) === root ? inMain : outside).push(i);
    if (outside.length === 0) return;
    const target = find(outside[0]);
    let best: [number, number] = [inMain[0], outside[0]];
    let bestKm = Infinity;
    for (const v of outside) {
      if (find(v) !== target) continue;
      for (const u of inMain) {
        const d = dist(u, v);
        if (d < bestKm) [bestKm, best] = [d, [u, v]];
      }
    }
    add(best[0], best[1]);
    parent[find(best[1])] = root;
  }
}
