// Seeded randomness for the demo generator: mulberry32, so the same seed always yields the same demo.json.
export type Rng = () => number;

/** mulberry32: a tiny 32-bit PRNG, good enough for invented demo data (not for anything else). */
export function mulberry32(seed: number): Rng {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export const between = (rng: Rng, min: number, max: number): number => min + (max - min) * rng();
export const intBetween = (rng: Rng, min: number, max: number): number => Math.floor(between(rng, min, max + 1));
export const pick = <T>(rng: Rng, items: readonly T[]): T => items[Math.floor(rng() * items.length)];
export const round = (n: number, digits: number): number => Math.round(n * 10 ** digits) / 10 ** digits;
