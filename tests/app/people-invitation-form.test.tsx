// The invitee's form: whom it is for, the password checks before sending, the server's refusal in words, the
// invitee handed on once signed in, and the single sign-on slot shown only when filled.
import { Text } from 'react-native';
import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { INVITE_PASSWORDS_DIFFER, InvitationForm } from '@/components/people/invitation-form';
import { clearQueries, renderWithQueries, routedFetch } from './window-test-kit';

const TOKEN = 'y'.repeat(43);
const invitee = { email: 'mara@operator.example', name: 'Mara Lock', staff: true };
const user = { id: 'u-7', email: invitee.email, name: invitee.name, roles: ['approver'], tenantId: null };

afterEach(clearQueries);

function fill(password: string, again: string) {
  fireEvent.changeText(screen.getByTestId('invitation-password'), password);
  fireEvent.changeText(screen.getByTestId('invitation-password-again'), again);
  fireEvent.press(screen.getByTestId('invitation-submit'));
}

test('a short password and a different repeat get their messages and nothing is sent', () => {
  const { fetchMock } = routedFetch([]);
  renderWithQueries(<InvitationForm token={TOKEN} invitee={invitee} onDone={jest.fn()} />);
  expect(screen.getByTestId('invitation-for')).toHaveTextContent('Welcome, Mara Lock. Choose a password for mara@operator.example to start using Slackwater.');
  fill('short', 'other');
  expect(screen.getByTestId('invitation-password-error')).toHaveTextContent('Use at least 12 characters');
  expect(screen.getByTestId('invitation-password-again-error')).toHaveTextContent(INVITE_PASSWORDS_DIFFER);
  expect(fetchMock).not.toHaveBeenCalled();
  expect(screen.queryByTestId('invitation-sso-slot')).toBeNull();
});

test('a weak password is refused in the server\'s words; a good one signs in and hands the user on', async () => {
  let weak = true;
  const { calls } = routedFetch([{
    method: 'POST', path: /\/api\/invitations\/accept$/,
    reply: () => (weak
      ? { status: 400, body: { error: { code: 'WEAK_PASSWORD', message: 'Choose another password. This is a commonly used password.' } } }
      : { status: 201, body: { user } }),
  }]);
  const onDone = jest.fn();
  renderWithQueries(<InvitationForm token={TOKEN} invitee={invitee} onDone={onDone} />);
  fill('password1234', 'password1234');
  expect(await screen.findByTestId('invitation-error')).toHaveTextContent('Choose another password. This is a commonly used password.');
  weak = false;
  fill('quiet ferry lantern 84 gulls', 'quiet ferry lantern 84 gulls');
  await waitFor(() => expect(onDone).toHaveBeenCalledWith(user));
  expect(calls.at(-1)!.body).toEqual({ token: TOKEN, password: 'quiet ferry lantern 84 gulls' });
});

test('the single sign-on slot shows what it is given', () => {
  routedFetch([]);
  renderWithQueries(<InvitationForm token={TOKEN} invitee={invitee} onDone={jest.fn()} singleSignOn={<Text>Sign in with your company</Text>} />);
  expect(screen.getByTestId('invitation-sso-slot')).toHaveTextContent('Sign in with your company');
});
