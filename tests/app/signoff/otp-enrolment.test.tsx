// Enrolment screen pieces: the QR code and the key as text, a confirm that sends the typed code; and the queue list.
import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { OtpEnrolmentView } from '@/components/signoff/otp-enrolment';
import { SignoffQueueList } from '@/components/signoff/signoff-queue-list';
import { clearQueries, renderWithQueries } from '../window-test-kit';

afterEach(clearQueries);

const enrolment = {
  uri: 'otpauth://totp/Slackwater:approver%40demo.test?secret=GEZDGNBVGY3TQOJQGEZDGNBVGY3TQOJQ',
  keyBase32: 'GEZDGNBVGY3TQOJQGEZDGNBVGY3TQOJQ',
  qrSvg: '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 29 29"><path d="M0 0h29v29H0z" fill="#fff"/></svg>',
};

const base = { timeZone: 'Etc/GMT+1', starting: false, confirming: false, removing: false, error: null, onStart: jest.fn(), onRemove: jest.fn() };

test('before enrolling: one button that starts it', () => {
  const onStart = jest.fn();
  renderWithQueries(<OtpEnrolmentView {...base} onStart={onStart} status={{ enrolled: false, confirmedAt: null }} enrolment={null} onConfirm={jest.fn()} />);
  fireEvent.press(screen.getByTestId('otp-start'));
  expect(onStart).toHaveBeenCalled();
  expect(screen.queryByTestId('otp-key')).toBeNull();
});

test('while enrolling: the QR code, the key as text, and a confirm that takes six digits only', async () => {
  const onConfirm = jest.fn();
  renderWithQueries(<OtpEnrolmentView {...base} status={{ enrolled: false, confirmedAt: null }} enrolment={enrolment} onConfirm={onConfirm} />);
  expect(screen.getByTestId('otp-qr')).toBeTruthy();
  expect(screen.getByTestId('otp-key')).toHaveTextContent('GEZD GNBV GY3T QOJQ GEZD GNBV GY3T QOJQ');
  fireEvent.changeText(screen.getByTestId('otp-confirm-code'), '28708');
  expect(screen.getByTestId('otp-confirm-submit')).toBeDisabled();
  fireEvent.changeText(screen.getByTestId('otp-confirm-code'), '287082');
  fireEvent.press(screen.getByTestId('otp-confirm-submit'));
  await waitFor(() => expect(onConfirm).toHaveBeenCalledWith('287082'));
});

test('enrolled: says so, and removing asks for a current code', () => {
  const onRemove = jest.fn();
  renderWithQueries(<OtpEnrolmentView {...base} onRemove={onRemove} status={{ enrolled: true, confirmedAt: '2030-01-02T10:00:00.000Z' }} enrolment={null} onConfirm={jest.fn()} />);
  // 10:00 UTC is 09:00 in the network's zone (UTC−1), said in words with the zone, never as an ISO string.
  expect(screen.getByTestId('otp-enrolled')).toHaveTextContent(/set up since Wed 2 Jan, 09:00 GMT-1\./);
  fireEvent.changeText(screen.getByTestId('otp-remove-code'), '123456');
  fireEvent.press(screen.getByTestId('otp-remove-submit'));
  expect(onRemove).toHaveBeenCalledWith('123456');
});

test('the queue lists windows with approvals so far and whether the viewer still has to decide', () => {
  const onOpen = jest.fn();
  const item = (windowId: string, me: { decided: boolean; blocked: 'self' | 'decided' | null }) => ({
    windowId, title: `Window ${windowId}`, startsAt: '2030-01-10T21:00:00.000Z', endsAt: '2030-01-11T01:00:00.000Z',
    workType: null, round: 1, riskClass: 'high' as const, critical: true, quorum: 2, approvals: 1, me,
  });
  renderWithQueries(<SignoffQueueList timeZone="UTC" onOpen={onOpen} items={[item('w-a', { decided: false, blocked: null }), item('w-b', { decided: false, blocked: 'self' })]} />);
  expect(screen.getByTestId('signoff-queue-item-w-a')).toHaveTextContent(/1 of 2 approvals · critical service.*Waiting for your decision/);
  expect(screen.getByTestId('signoff-queue-item-w-b')).toHaveTextContent(/another approver decides/);
  fireEvent.press(screen.getByTestId('signoff-queue-item-w-a'));
  expect(onOpen).toHaveBeenCalledWith('w-a');
});
