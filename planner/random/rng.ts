// Seeded pseudo-random numbers so that every planner run is reproducible from its seed.
// Reference: mulberry32 (Tommy Ettinger, public domain), a 32-bit generator with full 2^32 period.

/** Uniform numbers in [0, 1). */
export type Rng = () => number;

/** A deterministic generator for `seed` (any finite number; only its low 32 bits matter). */
export function createRng(seed: number): Rng {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A uniform integer in [0, n). */
export function randomInt(rng: Rng, n: number): number {
  return Math.floor(rng() * n);
}

/**
 * An independent seed for sub-stream `stream` of `seed` (islands, workers), mixed with the
 * splitmix32 finaliser so neighbouring streams do not start correlated.
 */
export function deriveSeed(seed: number, stream: number): number {
  let z = ((seed >>> 0) + Math.imul(stream + 1, 0x9e3779b9)) >>> 0;
  z = Math.imul(z ^ (z >>> 16), 0x85ebca6b) >>> 0;
  z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35) >>> 0;
  return (z ^ (z >>> 16)) >>> 0;
}
