// The (e) rows: per-instance lines of the real-shape set and its targets, each naming the instances that miss.
import { pct, type Row } from './report';
import { describeOutcome, MAX_KNOCK_ON_MOVES, type ShapeOutcome } from './real-shape-run';

const SECTION = '(e)';
/** exact "needs over 10 s" */
const SLOW_EXACT_MS = 10_000;

const names = (list: ShapeOutcome[]) => list.map((o) => o.label).join(', ');
const missing = (list: ShapeOutcome[]) => (list.length === 0 ? '' : `; missed: ${names(list)}`);
const share = (k: number, n: number) => `${k}/${n} = ${pct(k / Math.max(1, n))}`;

export function instanceRows(list: ShapeOutcome[]): Row[] {
  return list.map((o) => ({ section: SECTION, figure: o.label, value: describeOutcome(o) }));
}

/** DE alone (touched only) leaves no more unresolved than exact (touched only); never more than optimum + 1. */
function unresolvedRow(list: ShapeOutcome[]): Row {
  const within = list.filter((o) => o.de.unresolved <= o.exact.objective.unresolved);
  const overByTwo = list.filter((o) => o.de.unresolved > o.exact.objective.unresolved + 1);
  const proven = list.filter((o) => o.exact.optimal).length;
  return {
    section: SECTION,
    figure: 'real shape: DE alone (touched only) ≤ exact (touched only) unresolved',
    value: `${share(within.length, list.length)}; exact proven optimal on ${proven}/${list.length}; above exact + 1: ${overByTwo.length === 0 ? 'none' : names(overByTwo)}${missing(list.filter((o) => !within.includes(o)))}`,
    target: '≥ 90 %, never > optimum + 1',
    met: list.length > 0 ? within.length >= 0.9 * list.length && overByTwo.length === 0 : null,
  };
}

/** Where exact with knock-on blocks resolves more than the touched-only optimum, DE with knock-on must too. */
function knockOnRow(list: ShapeOutcome[]): Row {
  const room = list.filter((o) => o.exact.optimal && o.exactKnockOn.objective.unresolved < o.exact.objective.unresolved);
  const beat = room.filter((o) => o.deKnockOn.unresolved < o.exact.objective.unresolved);
  const anywhere = list.filter((o) => o.exact.optimal && o.deKnockOn.unresolved < o.exact.objective.unresolved).length;
  return {
    section: SECTION,
    figure: `real shape, knock-on moves allowed (≤ ${MAX_KNOCK_ON_MOVES}): DE alone below the touched-only optimum where exact+k shows one can be`,
    value: room.length === 0
      ? `no window where exact with knock-on beats the touched-only optimum (DE+k below it on ${anywhere})`
      : `${beat.length}/${room.length} (${names(room)}); DE+k below it on ${anywhere} in all${missing(room.filter((o) => !beat.includes(o)))}`,
    target: 'every such window',
    met: room.length > 0 ? beat.length === room.length : null,
  };
}

/** Move cost within 10 % of the proven optimum's wherever DE leaves the same number unresolved. */
function moveCostRow(list: ShapeOutcome[]): Row {
  const equal = list.filter((o) => o.exact.optimal && o.de.unresolved === o.exact.objective.unresolved);
  const ratio = (o: ShapeOutcome) => (o.exact.objective.moveCost > 0 ? o.de.moveCost / o.exact.objective.moveCost : o.de.moveCost > 0 ? Infinity : 1);
  const over = equal.filter((o) => ratio(o) > 1.1 + 1e-9);
  const worst = Math.max(0, ...equal.map(ratio));
  return {
    section: SECTION,
    figure: 'real shape: DE move cost where its unresolved count equals the proven optimum\'s',
    value: equal.length === 0 ? 'no such window' : `worst ${worst.toFixed(3)}× over ${equal.length} windows${missing(over)}`,
    target: '≤ 1.10 × optimum',
    met: equal.length > 0 ? over.length === 0 : null,
  };
}

/** Where exact (touched only) needs over 10 s, DE alone (touched only) takes at most a quarter of its time. */
function timeRow(list: ShapeOutcome[]): Row {
  const slow = list.filter((o) => o.exact.ms > SLOW_EXACT_MS);
  const over = slow.filter((o) => o.deMs > 0.25 * o.exact.ms);
  const worst = Math.max(0, ...slow.map((o) => o.deMs / o.exact.ms));
  return {
    section: SECTION,
    figure: 'real shape: DE time where exact needs over 10 s, as a share of exact\'s',
    value: slow.length === 0 ? 'no such window' : `worst ${pct(worst)} over ${slow.length} windows${missing(over)}`,
    target: '≤ 25 % each',
    met: slow.length > 0 ? over.length === 0 : null,
  };
}

export function targetRows(list: ShapeOutcome[]): Row[] {
  return [unresolvedRow(list), knockOnRow(list), moveCostRow(list), timeRow(list)];
}
