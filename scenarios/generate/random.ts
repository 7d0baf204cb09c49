// Seeded helpers for the demo generator, on the planner's generator (planner/random/rng.ts), so the same seed
// always yields the same demo.json.
import type { Rng } from '../../planner/random/rng';

export type { Rng };

export const between = (rng: Rng, min: number, max: number): number => min + (max - min) * rng();
export const intBetween = (rng: Rng, min: number, max: number): number => Math.floor(between(rng, min, max + 1));
export const pick = <T>(rng: Rng, items: readonly T[]): T => items[Math.floor(rng() * items.length)];
export const round = (n: number, digits: number): number => Math.round(n * 10 ** digits) / 10 ** digits;
