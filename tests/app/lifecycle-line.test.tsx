// The window's stage line: a list of the usual steps where the current one is marked in words and by
// aria-current="step", not by colour alone.
import { render, screen, within } from '@testing-library/react-native';
import { StyleSheet } from 'react-native';
import { LifecycleLine } from '@/components/windows/lifecycle-line';

const steps = () => screen.getByTestId('window-lifecycle').findAll((n) => typeof n.type === 'string' && n.props.role === 'listitem');

test('the current step carries aria-current="step" and "(now)"; steps before it are ticked', () => {
  render(<LifecycleLine status="planned" />);
  const items = steps();
  expect(items).toHaveLength(8);
  const current = items.filter((i) => i.props['aria-current'] === 'step');
  expect(current).toHaveLength(1);
  expect(current[0]).toHaveTextContent(/Planned \(now\)/);
  expect(items[0]).toHaveTextContent(/✓ Draft/);
  expect(items[3]).not.toHaveTextContent(/✓|now/);
  // Weight and underline, besides any colour, set it apart.
  const style = StyleSheet.flatten(within(screen.getByTestId('window-lifecycle-current')).getByText(/^Planned/).props.style);
  expect(style.textDecorationLine).toBe('underline');
});

test('a state off the usual path is added as the current step', () => {
  render(<LifecycleLine status="returned" />);
  const current = steps().filter((i) => i.props['aria-current'] === 'step');
  expect(current).toHaveLength(1);
  expect(current[0]).toHaveTextContent(/Returned \(now\)/);
});
