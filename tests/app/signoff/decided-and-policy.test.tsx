// "Decided by me" under the queue, the empty queue keeping it in reach, and the policy form refusing a high-risk
// quorum below the low-risk one before anything is sent.
import { fireEvent, screen } from '@testing-library/react-native';
import { DecidedByMe } from '@/components/signoff/decided-by-me';
import { SignoffPolicyForm } from '@/components/signoff/signoff-policy-form';
import { SignoffQueueList } from '@/components/signoff/signoff-queue-list';
import { POLICY_DEFAULTS } from '@/shared/policies';
import type { DecidedByMeItem } from '@/shared/signoff-mine';
import { clearQueries, renderWithQueries } from '../window-test-kit';

afterEach(clearQueries);

const decided = (extra: Partial<DecidedByMeItem> = {}): DecidedByMeItem => ({
  windowId: 'w-1', title: 'Fibre splice, Gullhaven ring', windowStatus: 'notified',
  startsAt: '2030-01-10T21:00:00.000Z', endsAt: '2030-01-11T01:00:00.000Z', round: 1, currentRound: 1,
  decision: 'approve', comment: 'Checked the ring capacity.', codeConfirmed: true, decidedAt: '2030-01-05T08:30:00.000Z',
  ...extra,
});

test('decided by me: each decision with when (viewer zone), the window as it is now, and a way back to it', () => {
  const onOpen = jest.fn();
  renderWithQueries(
    <DecidedByMe timeZone="Europe/Oslo" onOpen={onOpen} items={[
      decided(),
      decided({ windowId: 'w-2', title: 'Rectifier swap', windowStatus: 'in-review', decision: 'send-back', round: 1, currentRound: 2, codeConfirmed: false, comment: null }),
    ]} />,
  );
  expect(screen.getByTestId('signoff-decided-by-me')).toHaveTextContent(/^Decided by me/);
  // 08:30 UTC is 09:30 in Oslo in January (CET).
  expect(screen.getByTestId('signoff-decided-w-1-1')).toHaveTextContent(/Fibre splice, Gullhaven ring.*Notified.*Approved .*09:30.*Review round 1 · confirmed with a code.*Checked the ring capacity/);
  expect(screen.getByTestId('signoff-decided-w-2-1')).toHaveTextContent(/Sent back .*Earlier review round 1 \(now round 2\)/);
  fireEvent.press(screen.getByTestId('signoff-decided-w-2-1'));
  expect(onOpen).toHaveBeenCalledWith('w-2');
});

test('decided by me, nothing yet: says so', () => {
  renderWithQueries(<DecidedByMe timeZone="UTC" onOpen={jest.fn()} items={[]} />);
  expect(screen.getByTestId('signoff-decided-by-me')).toHaveTextContent(/not decided on any window yet/);
});

test('an empty queue still shows what follows it', () => {
  renderWithQueries(<SignoffQueueList items={[]} timeZone="UTC" onOpen={jest.fn()} footer={<DecidedByMe timeZone="UTC" onOpen={jest.fn()} items={[decided()]} />} />);
  expect(screen.getByTestId('signoff-queue-empty')).toHaveTextContent(/Nothing to sign off/);
  expect(screen.getByTestId('signoff-decided-w-1-1')).toBeTruthy();
});

test('policy form: a high-risk quorum below the low-risk one names both and cannot be saved; equal can', () => {
  const onSave = jest.fn();
  renderWithQueries(<SignoffPolicyForm policies={POLICY_DEFAULTS} saving={false} error={null} saved={false} onSave={onSave} />);
  fireEvent.changeText(screen.getByTestId('policy-quorum-low'), '3');
  fireEvent.changeText(screen.getByTestId('policy-quorum-high'), '2');
  expect(screen.getByTestId('policy-quorum-high-error')).toHaveTextContent(/2 \(high risk\) is fewer than 3 \(low risk\)/);
  fireEvent.press(screen.getByTestId('policy-save'));
  expect(onSave).not.toHaveBeenCalled();
  fireEvent.changeText(screen.getByTestId('policy-quorum-high'), '3');
  expect(screen.queryByTestId('policy-quorum-high-error')).toBeNull();
  fireEvent.press(screen.getByTestId('policy-save'));
  expect(onSave).toHaveBeenCalledWith({ signoffQuorumLow: 3, signoffQuorumHigh: 3, signoffRequireCode: POLICY_DEFAULTS.signoffRequireCode });
});

test('policy form: the server\'s refusal is shown', () => {
  renderWithQueries(<SignoffPolicyForm policies={POLICY_DEFAULTS} saving={false} error="High-risk plans would need 1 approval, fewer than the 2 low-risk plans need." saved={false} onSave={jest.fn()} />);
  expect(screen.getByTestId('policy-error')).toHaveTextContent(/fewer than the 2 low-risk/);
});
