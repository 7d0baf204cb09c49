// The People screen's pieces: the list with states and roles, filters sent to the API, the invite form's checks,
// deactivation asking first and showing the server's refusal, and the role picker keeping tenant contacts apart.
import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import type { Person } from '@/shared/people';
import { PeopleView } from '@/components/people/people-view';
import { toggleRole } from '@/components/people/role-picker';
import { clearQueries, renderWithQueries, routedFetch } from './window-test-kit';


const tenants = [{ id: 't-harbour', name: 'Harbour Co' }];
const person = (extra: Partial<Person>): Person => ({
  id: 'u-1', email: 'ada@operator.example', name: 'Ada Quay', roles: ['planner'], tenantId: null, tenantName: null,
  status: 'active', createdAt: '2031-05-01T08:00:00.000Z', deactivatedAt: null, invitationExpiresAt: null, ...extra,
});
const people = [
  person({}),
  person({ id: 'u-2', email: 'tess@harbour.example', name: 'Tess Pier', roles: ['tenant'], tenantId: 't-harbour', tenantName: 'Harbour Co', status: 'invited', invitationExpiresAt: '2031-05-04T08:00:00.000Z' }),
];

afterEach(clearQueries);

function render(list = people) {
  const fetched = routedFetch([{ method: 'GET', path: /\/api\/users/, reply: () => ({ status: 200, body: { users: list } }) }]);
  renderWithQueries(<PeopleView tenants={tenants} viewerZone="UTC" myId="u-9" />);
  return fetched;
}

test('each person shows name, roles with the tenant by name, state, and the actions their state allows', async () => {
  render();
  expect(await screen.findByTestId('people-count')).toHaveTextContent('2 people');
  expect(screen.getByTestId('person-u-2-roles')).toHaveTextContent('Tenant contact · Harbour Co');
  expect(screen.getByTestId('person-u-2-status')).toHaveTextContent('Invited');
  expect(screen.getByText('Invitation link works until 4 May 2031, 08:00')).toBeTruthy();
  expect(screen.getByTestId('person-u-1-deactivate')).toBeTruthy();
  expect(screen.queryByTestId('person-u-1-resend')).toBeNull();
  expect(screen.getByTestId('person-u-2-resend')).toBeTruthy();
  expect(screen.queryByTestId('person-u-2-deactivate')).toBeNull();
});

test('a role filter asks the API for that role only', async () => {
  const { calls } = render();
  await screen.findByTestId('people-list');
  fireEvent.press(screen.getByTestId('people-filter-role-approver'));
  await waitFor(() => expect(calls.at(-1)!.url).toBe('/api/users?role=approver'));
  expect(await screen.findByTestId('people-count')).toHaveTextContent('2 people');
});

test('an empty filtered list says nobody matches rather than that there are no people', async () => {
  render([]);
  expect(await screen.findByText('No people yet')).toBeTruthy();
  fireEvent.changeText(screen.getByTestId('people-search'), 'zed');
  expect(await screen.findByText('Nobody matches these filters')).toBeTruthy();
});

test('deactivating asks first, then shows the server\'s refusal for the last admin', async () => {
  const { calls } = routedFetch([
    { method: 'GET', path: /\/api\/users/, reply: () => ({ status: 200, body: { users: [person({ roles: ['admin'] })] } }) },
    { method: 'POST', path: /\/deactivate$/, reply: () => ({ status: 409, body: { error: { code: 'LAST_ADMIN', message: 'This is the last active admin.' } } }) },
  ]);
  renderWithQueries(<PeopleView tenants={tenants} viewerZone="UTC" myId="u-9" />);
  fireEvent.press(await screen.findByTestId('person-u-1-deactivate'));
  expect(screen.getByTestId('person-u-1-confirm')).toHaveTextContent(/signed out everywhere at once/);
  expect(calls.filter((c) => c.method === 'POST')).toEqual([]);
  fireEvent.press(screen.getByTestId('person-u-1-confirm-deactivate'));
  expect(await screen.findByTestId('person-u-1-error')).toHaveTextContent('This is the last active admin.');
  expect(calls.filter((c) => c.method === 'POST').map((c) => c.url)).toEqual(['/api/users/u-1/deactivate']);
});

test('the invite form names what is missing and sends nothing; a complete one is sent and confirmed', async () => {
  const { calls } = routedFetch([
    { method: 'GET', path: /\/api\/users/, reply: () => ({ status: 200, body: { users: people } }) },
    { method: 'POST', path: /\/api\/invitations$/, reply: (init) => ({ status: 201, body: { id: 'u-3', ...JSON.parse(String(init?.body)), expiresAt: '2031-05-04T08:00:00.000Z', mailQueued: true } }) },
  ]);
  renderWithQueries(<PeopleView tenants={tenants} viewerZone="UTC" myId="u-9" />);
  fireEvent.press(screen.getByTestId('people-invite-open'));
  fireEvent.changeText(screen.getByTestId('people-invite-email'), 'not-an-address');
  fireEvent.press(screen.getByTestId('people-invite-roles-tenant'));
  fireEvent.press(screen.getByTestId('people-invite-submit'));
  expect(screen.getByTestId('people-invite-email-error')).toHaveTextContent('Enter a valid e-mail address');
  expect(screen.getByTestId('people-invite-name-error')).toHaveTextContent('Enter the person\'s name');
  expect(screen.getByTestId('people-invite-roles-error')).toHaveTextContent('Choose the tenant this person belongs to');
  expect(calls.filter((c) => c.method === 'POST')).toEqual([]);

  fireEvent.changeText(screen.getByTestId('people-invite-email'), 'tom@harbour.example');
  fireEvent.changeText(screen.getByTestId('people-invite-name'), 'Tom Dock');
  fireEvent.press(screen.getByTestId('people-invite-roles-tenant-t-harbour'));
  fireEvent.press(screen.getByTestId('people-invite-submit'));
  expect(await screen.findByTestId('people-invite-done')).toHaveTextContent(/^Invitation sent to tom@harbour\.example\. The link works once, for 72 hours\./);
  expect(calls.find((c) => c.method === 'POST')!.body).toEqual({ email: 'tom@harbour.example', name: 'Tom Dock', roles: ['tenant'], tenantId: 't-harbour' });
  // The list is read again after the invitation, so the new person shows.
  await waitFor(() => expect(calls.filter((c) => c.method === 'GET').length).toBe(2));
});

test('the tenant role stands alone: choosing it drops operator roles, and an operator role drops it and its tenant', () => {
  expect(toggleRole({ roles: ['planner', 'approver'], tenantId: null }, 'tenant')).toEqual({ roles: ['tenant'], tenantId: null });
  expect(toggleRole({ roles: ['tenant'], tenantId: 't-harbour' }, 'engineer')).toEqual({ roles: ['engineer'], tenantId: null });
  expect(toggleRole({ roles: ['planner', 'approver'], tenantId: null }, 'planner')).toEqual({ roles: ['approver'], tenantId: null });
});
