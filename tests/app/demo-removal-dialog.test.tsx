// Removing the demo: the confirmation lists every kind that goes with its count and the account that stays, and
// the remove button works only once the confirmation words are typed.
import { fireEvent, render, screen } from '@testing-library/react-native';
import type { DemoDataSummary } from '@/shared/demo-data';
import { DemoDataPanel, DemoRemovalResultView } from '@/components/demo-data/demo-data-panel';

const summary: DemoDataSummary = {
  present: true,
  counts: {
    sites: 45, spans: 79, tenants: 6, slices: 124, placements: 124, windows: 13, plans: 0, notices: 0, signoffs: 1, accounts: 5, networkOutline: 1, demoSignOn: 1,
  },
  accountNames: ['Sam Okafor', 'Priya Lund'],
  keptAccount: { name: 'Robin Hale', email: 'admin@demo.test' },
};

function renderPanel(onRemove = jest.fn()) {
  render(<DemoDataPanel summary={summary} removing={false} error={null} onRemove={onRemove} />);
  fireEvent.press(screen.getByTestId('demo-data-remove'));
  return onRemove;
}

test('the confirmation names each kind with its count, leaves out kinds with none, and says whose account stays', () => {
  renderPanel();
  const dialog = screen.getByTestId('demo-removal-dialog');
  expect(dialog).toHaveTextContent(/45 sites/);
  expect(screen.getByTestId('demo-removal-count-windows')).toHaveTextContent('• 13 maintenance windows');
  expect(screen.getByTestId('demo-removal-count-signoffs')).toHaveTextContent('• 1 sign-off decision');
  expect(screen.getByTestId('demo-removal-count-networkOutline')).toHaveTextContent('• the map name and outline');
  expect(screen.queryByTestId('demo-removal-count-plans')).toBeNull();
  expect(dialog).toHaveTextContent(/Sam Okafor, Priya Lund/);
  expect(screen.getByTestId('demo-removal-kept-account')).toHaveTextContent(/Robin Hale, admin@demo.test.*change its e-mail address and password/);
});

test('remove stays disabled until the confirmation words are typed, then removes once pressed', () => {
  const onRemove = renderPanel();
  fireEvent.press(screen.getByTestId('demo-removal-confirm'));
  expect(onRemove).not.toHaveBeenCalled();
  fireEvent.changeText(screen.getByTestId('demo-removal-confirm-text'), 'remove demo');
  fireEvent.press(screen.getByTestId('demo-removal-confirm'));
  expect(onRemove).not.toHaveBeenCalled();
  fireEvent.changeText(screen.getByTestId('demo-removal-confirm-text'), 'Remove demo data');
  fireEvent.press(screen.getByTestId('demo-removal-confirm'));
  expect(onRemove).toHaveBeenCalledTimes(1);
});

test('keep it closes the confirmation without removing anything', () => {
  const onRemove = renderPanel();
  fireEvent.press(screen.getByTestId('demo-removal-cancel'));
  expect(screen.queryByTestId('demo-removal-dialog')).toBeNull();
  expect(onRemove).not.toHaveBeenCalled();
});

test('while removing the button says so and cannot be pressed again', () => {
  const onRemove = jest.fn();
  const { rerender } = render(<DemoDataPanel summary={summary} removing={false} error={null} onRemove={onRemove} />);
  fireEvent.press(screen.getByTestId('demo-data-remove'));
  fireEvent.changeText(screen.getByTestId('demo-removal-confirm-text'), 'remove demo data');
  rerender(<DemoDataPanel summary={summary} removing error={null} onRemove={onRemove} />);
  expect(screen.getByTestId('demo-removal-confirm')).toHaveTextContent('Removing the demo data…');
  fireEvent.press(screen.getByTestId('demo-removal-confirm'));
  expect(onRemove).not.toHaveBeenCalled();
});

test('the result lists what went and reminds the admin to change the kept account', () => {
  render(<DemoRemovalResultView result={{ removed: { ...summary.counts, accounts: 1 }, keptAccount: summary.keptAccount }} />);
  const result = screen.getByTestId('demo-removal-result');
  expect(result).toHaveTextContent(/1 demo account removed/);
  expect(result).toHaveTextContent(/admin@demo.test: change that account's e-mail address and password now/);
});
