// Preferential attachment: connected, m links per newcomer, heavy-tailed degrees, deterministic per seed.
// Reference for the model: A.-L. Barabási, R. Albert, Science 286 (1999) 509–512 — growth with m links per new
// node attached in proportion to degree gives a power-law degree tail; the "max ≥ 3 × median" check below is
// our own plain reading of "heavy-tailed" (common practice, no single source).
import { preferentialAttachment } from '../../../scenarios/generate/preferential-attachment';
import { townSites } from '../../../scenarios/generate/town-sites';

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

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

describe('preferentialAttachment', () => {
  const cases = [40, 100, 200].flatMap((sites) => [1, 2, 3].map((seed) => ({ sites, seed })));

  it.each(cases)('is connected, simple and adds m = 2 links per new site ($sites sites, seed $seed)', ({ sites, seed }) => {
    for (const points of [undefined, townSites({ sites, seed }).points]) {
      const g = preferentialAttachment({ sites, seed, points, distanceScaleKm: points ? 60 : undefined });
      expect(connected(sites, g.links)).toBe(true);
      expect(new Set(g.links.map(([u, v]) => `${u}-${v}`)).size).toBe(g.links.length);
      expect(g.links.every(([u, v]) => u < v)).toBe(true);
      // A triangle to start, then two links for each of the other sites.
      expect(g.links.length).toBe(3 + 2 * (sites - 3));
      expect(Math.min(...g.degree)).toBeGreaterThanOrEqual(2);
      expect(g.degree.reduce((a, b) => a + b, 0)).toBe(2 * g.links.length);
    }
  });

  it.each(cases)('has a heavy-tailed degree distribution: max ≥ 3 × median ($sites sites, seed $seed)', ({ sites, seed }) => {
    const pure = preferentialAttachment({ sites, seed });
    expect(Math.max(...pure.degree)).toBeGreaterThanOrEqual(3 * median(pure.degree));
    const geographic = preferentialAttachment({ sites, seed, points: townSites({ sites, seed }).points, distanceScaleKm: 60 });
    expect(Math.max(...geographic.degree)).toBeGreaterThanOrEqual(3 * median(geographic.degree));
  });

  it('is deterministic per seed', () => {
    const points = townSites({ sites: 80, seed: 4 }).points;
    const a = preferentialAttachment({ sites: 80, seed: 4, points, distanceScaleKm: 60 });
    expect(preferentialAttachment({ sites: 80, seed: 4, points, distanceScaleKm: 60 })).toEqual(a);
    expect(preferentialAttachment({ sites: 80, seed: 5, points, distanceScaleKm: 60 }).links).not.toEqual(a.links);
  });

  it('rejects too few sites and a distance scale without points', () => {
    expect(() => preferentialAttachment({ sites: 2, seed: 1 })).toThrow(RangeError);
    expect(() => preferentialAttachment({ sites: 10, seed: 1, distanceScaleKm: 50 })).toThrow(RangeError);
  });
});

describe('townSites', () => {
  it('keeps every site inside its box, town centres first, deterministic per seed', () => {
    const box = { latMin: 10, latMax: 12, lonMin: 20, lonMax: 23 };
    const t = townSites({ sites: 150, seed: 9, box });
    expect(t.points).toHaveLength(150);
    expect(t.points.every((p) => p.lat >= box.latMin && p.lat <= box.latMax && p.lon >= box.lonMin && p.lon <= box.lonMax)).toBe(true);
    expect(t.town.slice(0, t.towns)).toEqual(Array.from({ length: t.towns }, (_, k) => k));
    expect(townSites({ sites: 150, seed: 9, box })).toEqual(t);
  });
});
