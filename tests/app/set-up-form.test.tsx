// The first admin's form: each field's check before anything is sent, the server's refusal in words, and the
// admin handed on once the account exists.
import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { PASSWORDS_DIFFER, SetUpForm } from '@/components/setup/set-up-form';
import { clearQueries, renderWithQueries, routedFetch } from './window-test-kit';

const TOKEN = 'x'.repeat(43);
const user = { id: 'u-1', email: 'ada@operator.example', name: 'Ada Quay', roles: ['admin'], tenantId: null };

function fill(values: { name?: string; email?: string; password?: string; again?: string }) {
  fireEvent.changeText(screen.getByTestId('set-up-name'), values.name ?? '');
  fireEvent.changeText(screen.getByTestId('set-up-email'), values.email ?? '');
  fireEvent.changeText(screen.getByTestId('set-up-password'), values.password ?? '');
  fireEvent.changeText(screen.getByTestId('set-up-password-again'), values.again ?? '');
  fireEvent.press(screen.getByTestId('set-up-submit'));
}

afterEach(clearQueries);

test('empty name, a malformed e-mail, a short password and a different repeat each get their message; nothing is sent', () => {
  const { fetchMock } = routedFetch([]);
  renderWithQueries(<SetUpForm token={TOKEN} onDone={jest.fn()} />);
  fill({ name: ' ', email: 'not-an-address', password: 'short', again: 'shorter' });
  expect(screen.getByTestId('set-up-name-error')).toHaveTextContent('Enter your name');
  expect(screen.getByTestId('set-up-email-error')).toHaveTextContent('Enter a valid e-mail address');
  expect(screen.getByTestId('set-up-password-error')).toHaveTextContent('Use at least 12 characters');
  expect(screen.getByTestId('set-up-password-again-error')).toHaveTextContent(PASSWORDS_DIFFER);
  expect(fetchMock).not.toHaveBeenCalled();
});

test('a valid form sends the token with the admin and hands the new admin on', async () => {
  const { calls } = routedFetch([{ method: 'POST', path: /\/api\/set-up$/, reply: () => ({ status: 201, body: { user } }) }]);
  const onDone = jest.fn();
  renderWithQueries(<SetUpForm token={TOKEN} onDone={onDone} />);
  fill({ name: 'Ada Quay', email: ' ada@operator.example ', password: 'long enough password', again: 'long enough password' });
  await waitFor(() => expect(onDone).toHaveBeenCalledWith(user));
  expect(calls[0].body).toEqual({ token: TOKEN, name: 'Ada Quay', email: 'ada@operator.example', password: 'long enough password' });
  expect(screen.queryByTestId('set-up-password-again-error')).toBeNull();
});

test('the server\'s refusal shows in a banner and the person stays on the form', async () => {
  routedFetch([{
    method: 'POST', path: /\/api\/set-up$/,
    reply: () => ({ status: 409, body: { error: { code: 'ALREADY_SET_UP', message: 'This instance already has an admin. Sign in instead.' } } }),
  }]);
  const onDone = jest.fn();
  renderWithQueries(<SetUpForm token={TOKEN} onDone={onDone} />);
  fill({ name: 'Ada Quay', email: 'ada@operator.example', password: 'long enough password', again: 'long enough password' });
  expect(await screen.findByTestId('set-up-error')).toHaveTextContent('This instance already has an admin. Sign in instead.');
  expect(onDone).not.toHaveBeenCalled();
});
