// One-time codes set up inside a decision: the key opens in the authenticator app on this phone, shows as a QR code
// and as text; after the first code is confirmed the decision goes on with the typed comment and the pressed choice.
import { useState } from 'react';
import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { Linking, Pressable } from 'react-native';
import { DecisionForm } from '@/components/signoff/decision-form';
import { DecisionDraftScope } from '@/components/signoff/decision-draft';
import { useOtpStatusQuery } from '@/hooks/queries/signoff';
import type { SignoffDecisionBody } from '@/shared/signoff';
import { clearQueries, renderWithQueries, routedFetch } from '../window-test-kit';

afterEach(clearQueries);

const enrolment = {
  uri: 'otpauth://totp/Slackwater:approver%40demo.test?secret=GEZDGNBVGY3TQOJQGEZDGNBVGY3TQOJQ&issuer=Slackwater',
  keyBase32: 'GEZDGNBVGY3TQOJQGEZDGNBVGY3TQOJQ',
  qrSvg: '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 29 29"><path d="M0 0h29v29H0z" fill="#fff"/></svg>',
};

function otpRoutes() {
  let enrolled = false;
  return routedFetch([
    { method: 'GET', path: /^\/api\/me\/otp$/, reply: () => ({ status: 200, body: { enrolled, confirmedAt: enrolled ? '2030-01-02T10:00:00.000Z' : null } }) },
    { method: 'POST', path: /^\/api\/me\/otp\/enrol$/, reply: () => ({ status: 200, body: enrolment }) },
    {
      method: 'POST', path: /^\/api\/me\/otp\/confirm$/, reply: () => {
        enrolled = true;
        return { status: 200, body: { enrolled: true, confirmedAt: '2030-01-02T10:00:00.000Z' } };
      },
    },
  ]);
}

/** As the route wires it: the enrolment state comes from the status query, which the confirm updates. */
function Harness({ onDecide, draftKey }: { onDecide: (body: SignoffDecisionBody) => void; draftKey?: string }) {
  const otp = useOtpStatusQuery();
  const [shown, setShown] = useState(true);
  const form = <DecisionForm requireCode codeEnrolled={otp.data?.enrolled ?? false} busy={false} error={null} onDecide={onDecide} />;
  return (
    <>
      {/* Unmounts and mounts the form again, as leaving the screen and coming back does. */}
      <Pressable testID="toggle-form" onPress={() => setShown((s) => !s)} />
      {shown ? (draftKey ? <DecisionDraftScope draftKey={draftKey}>{form}</DecisionDraftScope> : form) : null}
    </>
  );
}

test('no codes yet: setting up happens in place, with the link for this phone, the QR code and the key as text', async () => {
  const { calls } = otpRoutes();
  const open = jest.spyOn(Linking, 'openURL').mockResolvedValue(true);
  renderWithQueries(<Harness onDecide={jest.fn()} />);
  expect(await screen.findByTestId('otp-inline-enrol')).toBeTruthy();
  expect(screen.queryByTestId('signoff-code')).toBeNull();
  fireEvent.press(screen.getByTestId('signoff-enrol'));
  fireEvent.press(await screen.findByTestId('otp-open-authenticator'));
  expect(open).toHaveBeenCalledWith(enrolment.uri);
  expect(screen.getByTestId('otp-qr')).toBeTruthy();
  expect(screen.getByTestId('otp-key')).toHaveTextContent('GEZD GNBV GY3T QOJQ GEZD GNBV GY3T QOJQ');
  expect(calls.map((c) => `${c.method} ${c.url}`)).toContain('POST /api/me/otp/enrol');
  open.mockRestore();
});

test('after the first code is confirmed the decision goes on: comment and choice kept, no "Remove codes"', async () => {
  const { calls } = otpRoutes();
  const onDecide = jest.fn();
  renderWithQueries(<Harness onDecide={onDecide} />);
  fireEvent.changeText(await screen.findByTestId('signoff-comment'), 'Checked the ring capacity.');
  fireEvent.press(screen.getByTestId('signoff-send-back'));
  expect(onDecide).not.toHaveBeenCalled();
  expect(screen.getByTestId('otp-inline-prompt')).toHaveTextContent(/To send back, set up codes first/);
  fireEvent.press(screen.getByTestId('signoff-enrol'));
  fireEvent.changeText(await screen.findByTestId('otp-confirm-code'), '287082');
  fireEvent.press(screen.getByTestId('otp-confirm-submit'));
  expect(await screen.findByTestId('signoff-enrolled-here')).toHaveTextContent(/next code.*press Send back/);
  expect(calls.find((c) => c.url === '/api/me/otp/confirm')?.body).toEqual({ code: '287082' });
  expect(screen.queryByTestId('otp-inline-enrol')).toBeNull();
  expect(screen.queryByText(/Remove codes/)).toBeNull();
  expect(screen.getByTestId('signoff-comment').props.value).toBe('Checked the ring capacity.');
  fireEvent.changeText(screen.getByTestId('signoff-code'), '402931');
  fireEvent.press(screen.getByTestId('signoff-send-back'));
  expect(onDecide).toHaveBeenCalledWith({ decision: 'send-back', comment: 'Checked the ring capacity.', code: '402931' });
});

test('inside a draft scope the typed comment and the pressed choice survive the form being mounted again', async () => {
  otpRoutes();
  renderWithQueries(<Harness onDecide={jest.fn()} draftKey="u-ap/w-remount" />);
  fireEvent.changeText(await screen.findByTestId('signoff-comment'), 'Weekend is quieter.');
  fireEvent.press(screen.getByTestId('signoff-approve'));
  fireEvent.press(screen.getByTestId('toggle-form'));
  expect(screen.queryByTestId('signoff-comment')).toBeNull();
  fireEvent.press(screen.getByTestId('toggle-form'));
  await waitFor(() => expect(screen.getByTestId('signoff-comment').props.value).toBe('Weekend is quieter.'));
  expect(screen.getByTestId('otp-inline-prompt')).toHaveTextContent(/To approve, set up codes first/);
});

test('a wrong first code is said in place and the decision stays as typed', async () => {
  routedFetch([
    { method: 'GET', path: /^\/api\/me\/otp$/, reply: () => ({ status: 200, body: { enrolled: false, confirmedAt: null } }) },
    { method: 'POST', path: /^\/api\/me\/otp\/enrol$/, reply: () => ({ status: 200, body: enrolment }) },
    { method: 'POST', path: /^\/api\/me\/otp\/confirm$/, reply: () => ({ status: 403, body: { error: { code: 'CODE_INVALID', message: 'That code is not right.' } } }) },
  ]);
  renderWithQueries(<Harness onDecide={jest.fn()} />);
  fireEvent.changeText(await screen.findByTestId('signoff-comment'), 'Fine by me.');
  fireEvent.press(screen.getByTestId('signoff-enrol'));
  fireEvent.changeText(await screen.findByTestId('otp-confirm-code'), '111111');
  fireEvent.press(screen.getByTestId('otp-confirm-submit'));
  expect(await screen.findByTestId('otp-error')).toHaveTextContent('That code is not right.');
  expect(screen.getByTestId('otp-inline-enrol')).toBeTruthy();
  expect(screen.getByTestId('signoff-comment').props.value).toBe('Fine by me.');
});
