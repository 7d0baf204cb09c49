// Round axis ticks for charts: steps of 1, 2 or 5 × 10^k, so a reader can take values off the axis at a glance.
// Reference: the "nice numbers" labelling of Heckbert, Graphics Gems (1990), limited to the 1-2-5 steps.

export type AxisTicks = { step: number; min: number; max: number; ticks: number[] };

const STEPS = [1, 2, 5, 10] as const;

/** The smallest 1-2-5 × 10^k step that covers `range` in at most `maxTicks - 1` steps; never below `minStep`. */
export function niceStep(range: number, maxTicks: number, minStep = 0): number {
  const wanted = range / Math.max(1, maxTicks - 1);
  if (!(wanted > 0) || !Number.isFinite(wanted)) return Math.max(minStep, 1);
  const power = 10 ** Math.floor(Math.log10(wanted));
  const factor = STEPS.find((s) => s * power >= wanted * (1 - 1e-9)) ?? 10;
  return Math.max(minStep, factor * power);
}

/**
 * Ticks from a round number at or below `low` to one at or above `high`, at most `maxTicks` of them (at least two).
 * `integer` keeps the step at 1 or more, for counts such as rounds of a search.
 */
export function niceTicks(low: number, high: number, maxTicks = 5, integer = false): AxisTicks {
  const lo = Math.min(low, high);
  const hi = Math.max(low, high);
  let step = niceStep(hi - lo, maxTicks, integer ? 1 : 0);
  // Rounding both ends outwards can add a tick; step up until the count fits.
  for (;;) {
    const min = Math.floor(lo / step + 1e-9) * step;
    const max = Math.max(min + step, Math.ceil(hi / step - 1e-9) * step);
    const count = Math.round((max - min) / step) + 1;
    if (count <= Math.max(2, maxTicks)) {
      // Multiplying each tick out (not adding steps up) keeps 0.1 × 3 from printing as 0.30000000000000004.
      const ticks = Array.from({ length: count }, (_, i) => Number(((min / step + i) * step).toPrecision(12)));
      return { step, min: ticks[0], max: ticks[ticks.length - 1], ticks };
    }
    step = niceStep(step * 1.5 * (maxTicks - 1), maxTicks, step * 1.0001);
  }
}
