// The password forms: forgot (one answer for every address), reset (checks before sending, policy feedback shown)
// and the Security screen's Change password panel (current password required, other sessions reported).
import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { ForgotPasswordForm } from '@/components/passwords/forgot-password-form';
import { PASSWORDS_DIFFER } from '@/components/passwords/password-fields';
import { ResetPasswordForm } from '@/components/passwords/reset-password-form';
import { ChangePasswordPanel } from '@/components/security/change-password-panel';
import { FORGOT_PASSWORD_ANSWER } from '@/shared/passwords';
import { clearQueries, renderWithQueries, routedFetch } from './window-test-kit';

const TOKEN = 'x'.repeat(43);
const WEAK = { error: { code: 'WEAK_PASSWORD', message: 'Choose another password. This is a commonly used password. Add a few more words that are less common.' } };

afterEach(clearQueries);

describe('forgot password', () => {
  test('a malformed address is caught before sending', () => {
    const { fetchMock } = routedFetch([]);
    renderWithQueries(<ForgotPasswordForm />);
    fireEvent.changeText(screen.getByTestId('forgot-password-email'), 'not-an-address');
    fireEvent.press(screen.getByTestId('forgot-password-submit'));
    expect(screen.getByTestId('forgot-password-email-error')).toHaveTextContent('Enter a valid e-mail address');
    expect(fetchMock).not.toHaveBeenCalled();
  });

  test('sends the trimmed address and shows the server\'s one answer', async () => {
    const { calls } = routedFetch([{ method: 'POST', path: /forgot-password$/, reply: () => ({ status: 202, body: { message: FORGOT_PASSWORD_ANSWER } }) }]);
    renderWithQueries(<ForgotPasswordForm />);
    fireEvent.changeText(screen.getByTestId('forgot-password-email'), ' rowan@harbour.example ');
    fireEvent.press(screen.getByTestId('forgot-password-submit'));
    expect(await screen.findByTestId('forgot-password-sent')).toHaveTextContent(FORGOT_PASSWORD_ANSWER);
    expect(calls[0].body).toEqual({ email: 'rowan@harbour.example' });
  });

  test('a request limit shows the server\'s wording', async () => {
    routedFetch([{ method: 'POST', path: /forgot-password$/, reply: () => ({ status: 429, body: { error: { code: 'RATE_LIMITED', message: 'Too many reset links asked for this e-mail address. Try again in 42 minutes.' } } }) }]);
    renderWithQueries(<ForgotPasswordForm />);
    fireEvent.changeText(screen.getByTestId('forgot-password-email'), 'rowan@harbour.example');
    fireEvent.press(screen.getByTestId('forgot-password-submit'));
    expect(await screen.findByTestId('forgot-password-error')).toHaveTextContent(/Try again in 42 minutes\.$/);
  });
});

describe('reset password', () => {
  test('a short password and a different repeat are caught before sending', () => {
    const { fetchMock } = routedFetch([]);
    renderWithQueries(<ResetPasswordForm token={TOKEN} onDone={jest.fn()} />);
    fireEvent.changeText(screen.getByTestId('reset-password-new'), 'short');
    fireEvent.changeText(screen.getByTestId('reset-password-again'), 'shorter');
    fireEvent.press(screen.getByTestId('reset-password-submit'));
    expect(screen.getByTestId('reset-password-new-error')).toHaveTextContent('Use at least 12 characters');
    expect(screen.getByTestId('reset-password-again-error')).toHaveTextContent(PASSWORDS_DIFFER);
    expect(fetchMock).not.toHaveBeenCalled();
  });

  test('the policy\'s feedback shows in plain words and the person stays on the form', async () => {
    routedFetch([{ method: 'POST', path: /reset-password$/, reply: () => ({ status: 400, body: WEAK }) }]);
    const onDone = jest.fn();
    renderWithQueries(<ResetPasswordForm token={TOKEN} onDone={onDone} />);
    fireEvent.changeText(screen.getByTestId('reset-password-new'), 'password1234');
    fireEvent.changeText(screen.getByTestId('reset-password-again'), 'password1234');
    fireEvent.press(screen.getByTestId('reset-password-submit'));
    expect(await screen.findByTestId('reset-password-error')).toHaveTextContent(/This is a commonly used password\./);
    expect(onDone).not.toHaveBeenCalled();
  });

  test('a good password is sent with the token, then the person is handed on', async () => {
    const { calls } = routedFetch([{ method: 'POST', path: /reset-password$/, reply: () => ({ status: 204, body: null }) }]);
    const onDone = jest.fn();
    renderWithQueries(<ResetPasswordForm token={TOKEN} onDone={onDone} />);
    fireEvent.changeText(screen.getByTestId('reset-password-new'), 'tidal fern oyster lantern');
    fireEvent.changeText(screen.getByTestId('reset-password-again'), 'tidal fern oyster lantern');
    fireEvent.press(screen.getByTestId('reset-password-submit'));
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(calls[0].body).toEqual({ token: TOKEN, password: 'tidal fern oyster lantern' });
  });
});

describe('change password', () => {
  function fill(current: string, next: string, again = next) {
    fireEvent.changeText(screen.getByTestId('change-password-current'), current);
    fireEvent.changeText(screen.getByTestId('change-password-new'), next);
    fireEvent.changeText(screen.getByTestId('change-password-again'), again);
    fireEvent.press(screen.getByTestId('change-password-submit'));
  }

  test('the current password is required before anything is sent', () => {
    const { fetchMock } = routedFetch([]);
    renderWithQueries(<ChangePasswordPanel />);
    fill('', 'tidal fern oyster lantern');
    expect(screen.getByTestId('change-password-current-error')).toHaveTextContent('Enter your current password');
    expect(fetchMock).not.toHaveBeenCalled();
  });

  test('a wrong current password shows the server\'s words', async () => {
    routedFetch([{ method: 'POST', path: /\/api\/me\/password$/, reply: () => ({ status: 400, body: { error: { code: 'CURRENT_PASSWORD_WRONG', message: 'Your current password is not correct.' } } }) }]);
    renderWithQueries(<ChangePasswordPanel />);
    fill('not-it-at-all', 'tidal fern oyster lantern');
    expect(await screen.findByTestId('change-password-error')).toHaveTextContent('Your current password is not correct.');
    expect(screen.queryByTestId('change-password-done')).toBeNull();
  });

  test('a weak new password shows the feedback', async () => {
    routedFetch([{ method: 'POST', path: /\/api\/me\/password$/, reply: () => ({ status: 400, body: WEAK }) }]);
    renderWithQueries(<ChangePasswordPanel />);
    fill('test-password-1', 'password1234');
    expect(await screen.findByTestId('change-password-error')).toHaveTextContent(/Add a few more words that are less common\./);
  });

  test('a change says how many other sessions were signed out and clears the fields', async () => {
    const { calls } = routedFetch([{ method: 'POST', path: /\/api\/me\/password$/, reply: () => ({ status: 200, body: { otherSessionsEnded: 2 } }) }]);
    renderWithQueries(<ChangePasswordPanel />);
    fill('test-password-1', 'tidal fern oyster lantern');
    expect(await screen.findByTestId('change-password-done')).toHaveTextContent(/2 other sessions were signed out; this one stays\./);
    expect(calls[0].body).toEqual({ currentPassword: 'test-password-1', newPassword: 'tidal fern oyster lantern' });
    expect(screen.getByTestId('change-password-current').props.value).toBe('');
  });
});
