// The search chart: round ticks on all three axes, and axis titles that carry their units.
import { render, screen } from '@testing-library/react-native';
import { PlanConvergence } from '@/components/plans/plan-convergence';
import type { PlanReview } from '@/shared/plans';

const point = (generation: number, moveCost: number, unresolvedWeight: number): PlanReview['trace'][number] => ({
  generation, evaluations: generation * 40, feasible: true,
  best: { moveCost, unresolvedWeight } as PlanReview['trace'][number]['best'],
});

// 0…137 rounds, move cost falling from 173 to 41, unresolved weight from 7 to 0.
const trace = Array.from({ length: 138 }, (_, g) => point(g, Math.round(173 - g * 0.96), Math.max(0, 7 - Math.floor(g / 20))));

function tickValues(prefix: string): number[] {
  return screen.queryAllByTestId(new RegExp(`^${prefix}`)).map((n) => Number(n.props.testID.slice(prefix.length)));
}

const isRoundStep = (values: number[]) => {
  const step = values[1] - values[0];
  const mantissa = step / 10 ** Math.floor(Math.log10(step));
  return [1, 2, 5].includes(Math.round(mantissa * 1e9) / 1e9) && values.every((v, i) => i === 0 || Math.abs(v - values[i - 1] - step) < 1e-9);
};

test('each axis has evenly spaced round ticks (1, 2 or 5 × 10^k) that cover the data', () => {
  render(<PlanConvergence trace={trace} />);
  const rounds = tickValues('plan-convergence-tick-round-');
  const cost = tickValues('plan-convergence-tick-left-');
  const left = tickValues('plan-convergence-tick-right-');
  for (const values of [rounds, cost, left]) {
    expect(values.length).toBeGreaterThanOrEqual(2);
    expect(isRoundStep(values)).toBe(true);
  }
  expect(Math.min(...rounds)).toBeLessThanOrEqual(0);
  expect(Math.max(...rounds)).toBeGreaterThanOrEqual(137);
  expect(Math.max(...cost)).toBeGreaterThanOrEqual(173);
  expect(Math.max(...left)).toBeGreaterThanOrEqual(7);
});

test('the axes are titled with their units', () => {
  render(<PlanConvergence trace={trace} />);
  expect(screen.getByTestId('plan-convergence-left-title')).toHaveTextContent(/\(points\)/);
  expect(screen.getByTestId('plan-convergence-right-title')).toHaveTextContent(/\(priority points\)/);
  expect(screen.getByTestId('plan-convergence-bottom-title')).toHaveTextContent(/Round.*\(generation\)/);
});

test('a search of one round draws no chart', () => {
  render(<PlanConvergence trace={[point(0, 10, 0)]} />);
  expect(screen.getByTestId('plan-convergence-empty')).toBeTruthy();
});
