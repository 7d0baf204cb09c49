// Preferential-attachment growth: sites join one at a time and each links to m earlier sites drawn with
// probability proportional to their degree, which gives the heavy-tailed degrees of real transport networks
// (a few hubs, many sites with two links). Starts from a clique of m + 1 sites, so the graph is connected
// (for m ≥ 2 even 2-connected: every new site hangs on two distinct earlier sites).
// Reference: A.-L. Barabási, R. Albert, "Emergence of scaling in random networks", Science 286 (1999) 509–512.
//
// Geographic damping (optional, `distanceScaleKm`): the weight of an earlier site u for a newcomer v is
// degree(u) · exp(−d(u, v) / D), the Waxman distance factor (see waxman.ts) applied to the attachment rule, so
// most new links stay local while hubs still draw some long ones. The combination is ours (common practice in
// topology generators that add locality to preferential attachment; no single source).
import { greatCircleKm, type LatLon } from '../../planner/geo/great-circle';
import { createRng, type Rng } from '../../planner/random/rng';

export interface PreferentialAttachmentOptions {
  sites: number;
  seed: number;
  /** links each new site adds (Barabási–Albert's m) */
  linksPerSite?: number;
  /** site positions; required with distanceScaleKm */
  points?: LatLon[];
  /** D of the distance factor exp(−d / D), km; omitted = pure Barabási–Albert */
  distanceScaleKm?: number;
}

export interface AttachmentGraph {
  /** undirected links as [site, site] index pairs (smaller first), each pair at most once */
  links: [number, number][];
  degree: number[];
}

export const PREFERENTIAL_ATTACHMENT_DEFAULTS = { linksPerSite: 2 };

/** m distinct earlier sites for newcomer v, each draw proportional to weight among those not yet taken. */
function pickTargets(v: number, m: number, weight: (u: number) => number, rng: Rng): number[] {
  const w = Float64Array.from({ length: v }, (_, u) => weight(u));
  const picked: number[] = [];
  while (picked.length < m) {
    let total = 0;
    for (let u = 0; u < v; u += 1) total += w[u];
    // Weights are positive for every site not yet taken (each has degree ≥ m), unless exp() underflowed.
    let chosen = total > 0 ? -1 : w.findIndex((_x, u) => !picked.includes(u));
    let x = rng() * total;
    for (let u = 0; u < v && total > 0; u += 1) {
      if (w[u] <= 0) continue;
      chosen = u; // the last positive weight catches whatever rounding leaves in x
      x -= w[u];
      if (x < 0) break;
    }
    picked.push(chosen);
    w[chosen] = 0;
  }
  return picked;
}

export function preferentialAttachment(options: PreferentialAttachmentOptions): AttachmentGraph {
  const o = { ...PREFERENTIAL_ATTACHMENT_DEFAULTS, ...options };
  const m = o.linksPerSite;
  if (!(Number.isInteger(m) && m >= 1)) throw new RangeError('linksPerSite must be an integer ≥ 1');
  if (!(Number.isInteger(o.sites) && o.sites >= m + 1)) throw new RangeError(`preferential attachment needs at least ${m + 1} sites`);
  if (o.distanceScaleKm !== undefined && (!o.points || o.points.length < o.sites)) throw new RangeError('distanceScaleKm needs a point per site');
  const rng = createRng(o.seed);
  const degree = new Array<number>(o.sites).fill(0);
  const links: [number, number][] = [];
  const link = (u: number, v: number) => {
    links.push([Math.min(u, v), Math.max(u, v)]);
    degree[u] += 1;
    degree[v] += 1;
  };
  for (let u = 0; u <= m; u += 1) for (let v = u + 1; v <= m; v += 1) link(u, v);
  const points = o.points;
  const scaleKm = o.distanceScaleKm;
  for (let v = m + 1; v < o.sites; v += 1) {
    const weight = scaleKm === undefined || !points
      ? (u: number) => degree[u]
      : (u: number) => degree[u] * Math.exp(-greatCircleKm(points[u], points[v]) / scaleKm);
    for (const u of pickTargets(v, m, weight, rng)) link(u, v);
  }
  return { links, degree };
}
