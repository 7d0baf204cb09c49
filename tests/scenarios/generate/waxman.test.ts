// Waxman generator: connectivity, determinism and the α/β convention of the BRITE manual.
// Source for the convention: BRITE user manual (confirmed in REFERENCES.md): P(u,v) = α·exp(−d/(βL)), L = max distance.
import { waxmanGraph } from '../../../scenarios/generate/waxman';

function connected(n: number, links: [number, number][]): boolean {
  const adj: number[][] = Array.from({ length: n }, () => []);
  for (const [u, v] of links) {
    adj[u].push(v);
    adj[v].push(u);
  }
  const seen = new Set([0]);
  const stack = [0];
  while (stack.length) {
    for (const v of adj[stack.pop()!]) {
      if (seen.has(v)) continue;
      seen.add(v);
      stack.push(v);
    }
  }
  return seen.size === n;
}

describe('waxmanGraph', () => {
  it('is connected and has no duplicate or self links, for both models', () => {
    for (const model of ['incremental', 'pairwise'] as const) {
      for (const seed of [1, 2, 3]) {
        const g = waxmanGraph({ sites: 40, seed, model });
        expect(connected(40, g.links)).toBe(true);
        const keys = new Set(g.links.map(([u, v]) => `${u}-${v}`));
        expect(keys.size).toBe(g.links.length);
        expect(g.links.every(([u, v]) => u < v)).toBe(true);
      }
    }
  });

  it('gives the same graph for the same seed and a different one for another seed', () => {
    expect(waxmanGraph({ sites: 30, seed: 9 })).toEqual(waxmanGraph({ sites: 30, seed: 9 }));
    expect(waxmanGraph({ sites: 30, seed: 9 }).links).not.toEqual(waxmanGraph({ sites: 30, seed: 10 }).links);
  });

  it('incremental growth adds linksPerSite links per new site (mean degree ≈ 2m at any size)', () => {
    const g = waxmanGraph({ sites: 300, seed: 4, linksPerSite: 2 });
    // first site adds none, second adds one (only one earlier site), every other adds two
    expect(g.links.length).toBe(1 + 2 * 298);
  });

  it('α is the density: with β huge, P ≈ α for every pair (pairwise model)', () => {
    const n = 60;
    const pairs = (n * (n - 1)) / 2;
    const g = waxmanGraph({ sites: n, seed: 5, model: 'pairwise', alpha: 0.3, beta: 1e9 });
    // binomial(1770, 0.3): sd ≈ 19 links; allow 5 sd
    expect(Math.abs(g.links.length - 0.3 * pairs)).toBeLessThan(100);
  });

  it('β is the long-link share: with β tiny, no pair survives and only the joining tree remains', () => {
    const g = waxmanGraph({ sites: 50, seed: 6, model: 'pairwise', alpha: 1, beta: 1e-9 });
    expect(g.links.length).toBe(49);
    expect(connected(50, g.links)).toBe(true);
  });

  it('link lengths are great-circle distances not above L', () => {
    const g = waxmanGraph({ sites: 25, seed: 7 });
    expect(g.lengthsKm.every((d) => d > 0 && d <= g.maxDistanceKm + 1e-9)).toBe(true);
  });
});
