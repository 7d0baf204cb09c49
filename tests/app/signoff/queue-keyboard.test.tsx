// The sign-off queue opens a window from the keyboard as well as by touch: its rows are links without an address,
// which a browser would not follow on Enter, so the row does it.
import { fireEvent, render, screen } from '@testing-library/react-native';
import type { SignoffQueueItem } from '@/shared/signoff';
import { SignoffQueueList } from '@/components/signoff/signoff-queue-list';

const item = (windowId: string, title: string): SignoffQueueItem => ({
  windowId, title, startsAt: '2030-01-08T01:00:00.000Z', endsAt: '2030-01-08T04:00:00.000Z', workType: 'software upgrade',
  round: 1, riskClass: 'low', critical: false, quorum: 1, approvals: 0, me: { decided: false, blocked: null },
});

test.each(['Enter', ' '])('%j on a queue row opens that window; other keys do nothing', (key) => {
  const onOpen = jest.fn();
  render(<SignoffQueueList items={[item('w-1', 'Rectifier swap'), item('w-2', 'Fibre splice')]} timeZone="UTC" onOpen={onOpen} />);
  fireEvent(screen.getByTestId('signoff-queue-item-w-2'), 'keyDown', { key: 'Tab', preventDefault: () => undefined });
  expect(onOpen).not.toHaveBeenCalled();
  fireEvent(screen.getByTestId('signoff-queue-item-w-2'), 'keyDown', { key, preventDefault: () => undefined });
  expect(onOpen).toHaveBeenCalledWith('w-2');
});
