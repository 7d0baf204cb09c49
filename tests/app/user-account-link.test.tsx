// Every signed-in user reaches their own settings (time zone, codes, sessions) from their name in the frame,
// whatever their roles: tenants and engineers have no sign-off area that would lead there.
import type { ReactElement } from 'react';
import { fireEvent, render, screen } from '@testing-library/react-native';
import type { Me } from '@/shared/api';
import { UserSummary } from '@/components/shell/user-summary';

const mockPush = jest.fn();
jest.mock('expo-router', () => ({
  Link: ({ href, children }: { href: string; children: ReactElement<{ onPress?: () => void }> }) =>
    require('react').cloneElement(children, { onPress: () => mockPush(href) }),
}));

const people: Me[] = [
  { id: 'u-te', email: 'tenant@demo.test', name: 'Tia Tenant', roles: ['tenant'], tenantId: 't1' },
  { id: 'u-en', email: 'engineer@demo.test', name: 'Eli Engineer', roles: ['engineer'], tenantId: null },
];

test.each(people)('$name opens their settings from their name, which the link names first', (user) => {
  mockPush.mockClear();
  render(<UserSummary user={user} onSignOut={() => undefined} signingOut={false} tone="light" compact />);
  const link = screen.getByTestId('user-account');
  expect(link.props.accessibilityLabel ?? link.props['aria-label']).toMatch(new RegExp(`^${user.name}, ${user.roles[0]}: your time zone`));
  fireEvent.press(link);
  expect(mockPush).toHaveBeenCalledWith('/security');
});
