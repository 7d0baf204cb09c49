// The one next step on a window: every state for every role, the runs that change it while assessed, and the bar
// that takes it (assess, submit, open the sign-off) with a single filled button.
import { act, fireEvent, screen, waitFor } from '@testing-library/react-native';
import type { RoleName } from '@/shared/api';
import type { PlanListItem } from '@/shared/plans';
import { WINDOW_STATUSES, type WindowStatus } from '@/shared/windows';
import { nextStep, type NextStepAction } from '@/components/windows/next-step';
import { WindowNextStep } from '@/components/windows/window-next-step';
import { plan } from './plans/plan-fixtures';
import { clearQueries, renderWithQueries, routedFetch, windowFixture } from './window-test-kit';

const mockPush = jest.fn();
jest.mock('expo-router', () => ({ useRouter: () => ({ push: mockPush }) }));

afterEach(() => { clearQueries(); mockPush.mockReset(); });

function runItem(extra: Partial<PlanListItem> = {}): PlanListItem {
  const { review: _review, ...rest } = plan();
  return { ...rest, totals: null, ...extra };
}

type Row = { label: string; action: NextStepAction['kind'] | null } | null;
const ROLES: RoleName[] = ['engineer', 'planner', 'approver', 'admin', 'tenant'];

// What each role sees with no runs yet; `null` = no bar at all. Columns follow ROLES.
const EXPECTED: Record<WindowStatus, Row[]> = {
  draft: [
    { label: 'Assess impact', action: 'assess' }, { label: 'Assess impact', action: 'assess' },
    { label: 'Assess impact', action: null }, { label: 'Assess impact', action: 'assess' }, null,
  ],
  assessed: [
    { label: 'Plan the moves', action: null }, { label: 'Plan the moves', action: 'open-plans' },
    { label: 'Plan the moves', action: null }, { label: 'Plan the moves', action: null }, null,
  ],
  planned: [
    { label: 'Submit for sign-off', action: null }, { label: 'Submit for sign-off', action: 'submit' },
    { label: 'Submit for sign-off', action: null }, { label: 'Submit for sign-off', action: null }, null,
  ],
  'in-review': [
    { label: 'Sign-off', action: null }, { label: 'Sign-off', action: null },
    { label: 'Decide', action: 'open-signoff' }, { label: 'Sign-off', action: null }, null,
  ],
  cleared: [
    { label: 'Tell the tenants', action: null }, { label: 'Tell the tenants', action: null },
    { label: 'Tell the tenants', action: null }, { label: 'Tell the tenants', action: null }, null,
  ],
  returned: [
    { label: 'Revise the plan', action: null }, { label: 'Revise the plan', action: 'open-plans' },
    { label: 'Revise the plan', action: null }, { label: 'Revise the plan', action: null }, null,
  ],
  notified: [
    { label: 'Start the work', action: 'transition' }, { label: 'Start the work', action: 'transition' },
    { label: 'Start the work', action: null }, { label: 'Start the work', action: 'transition' }, null,
  ],
  underway: [
    { label: 'Mark the work finished', action: 'transition' }, { label: 'Mark the work finished', action: 'transition' },
    { label: 'Mark the work finished', action: null }, { label: 'Mark the work finished', action: 'transition' }, null,
  ],
  done: [null, null, null, null, null],
  'rolled-back': [null, null, null, null, null],
  withdrawn: [null, null, null, null, null],
};

describe.each(WINDOW_STATUSES.map((status) => [status]))('a %s window', (status) => {
  test.each(ROLES.map((role, index) => [role, index]))('shows the %s the right next step', (role, index) => {
    const step = nextStep([role], { status }, []);
    const expected = EXPECTED[status][index];
    if (expected === null) {
      expect(step).toBeNull();
      return;
    }
    expect(step).not.toBeNull();
    expect({ label: step!.label, action: step!.action?.kind ?? null }).toEqual(expected);
    // The line says why in words, never a state name from the API.
    expect(step!.why.length).toBeGreaterThan(20);
    expect(step!.why).not.toMatch(/in-review|rolled-back|assessed\b(?! )/);
  });
});

test('a planner on an assessed window is sent to the newest finished run to review and accept it', () => {
  const plans = [
    runItem({ id: 'p-old', createdAt: '2030-01-01T09:00:00.000Z' }),
    runItem({ id: 'p-new', createdAt: '2030-01-01T11:00:00.000Z' }),
    runItem({ id: 'p-stale', createdAt: '2030-01-01T12:00:00.000Z', stale: true }),
  ];
  const step = nextStep(['planner'], { status: 'assessed' }, plans);
  expect(step?.label).toBe('Review and accept');
  expect(step?.action).toEqual({ kind: 'open-plan', planId: 'p-new' });
  expect(nextStep(['approver'], { status: 'assessed' }, plans)?.action).toBeNull();
});

test('a run still computing is followed before anything else; a failed run leaves planning as the step', () => {
  const running = runItem({ id: 'p-run', status: 'running', createdAt: '2030-01-01T12:00:00.000Z' });
  expect(nextStep(['planner'], { status: 'assessed' }, [running, runItem()])?.action).toEqual({ kind: 'open-plan', planId: 'p-run' });
  expect(nextStep(['admin'], { status: 'assessed' }, [running])?.label).toBe('Follow the run');
  expect(nextStep(['planner'], { status: 'assessed' }, [runItem({ status: 'failed' })])?.action).toEqual({ kind: 'open-plans' });
});

test('a person with several roles gets the step any of them may take', () => {
  expect(nextStep(['approver', 'planner'], { status: 'planned' }, [])?.action).toEqual({ kind: 'submit' });
  expect(nextStep(['tenant', 'engineer'], { status: 'draft' }, [])?.action).toEqual({ kind: 'assess' });
});

const planner = { id: 'u-pln', email: 'planner@demo.test', name: 'Pia Planner', roles: ['planner'] as RoleName[], tenantId: null };
const approver = { ...planner, id: 'u-apr', roles: ['approver'] as RoleName[] };

test('the bar on a planned window submits for sign-off and says who was e-mailed', async () => {
  const { calls } = routedFetch([
    { method: 'GET', path: /\/api\/windows\/w-1\/plans$/, reply: () => ({ status: 200, body: { plans: [] } }) },
    { method: 'POST', path: /\/api\/windows\/w-1\/submit$/, reply: () => ({ status: 200, body: { windowId: 'w-1', status: 'in-review', round: 1, approversMailed: 2 } }) },
  ]);
  renderWithQueries(<WindowNextStep window={windowFixture({ status: 'planned' })} me={planner} here={{ screen: 'window' }} />);
  expect(screen.getByTestId('next-step')).toHaveTextContent(/Next: Submit for sign-off/);
  await act(async () => fireEvent.press(screen.getByTestId('next-step-action')));
  await waitFor(() => expect(screen.getByTestId('next-step-done')).toHaveTextContent(/2 approvers were e-mailed/));
  expect(calls.filter((c) => c.method === 'POST').map((c) => c.url)).toEqual(['/api/windows/w-1/submit']);
});

test('the bar assesses a draft and then opens the impact screen', async () => {
  const impact = {
    windowId: 'w-1', windowVersion: 3, computedAt: '2030-01-01T10:00:00.000Z', affected: [], touchesCritical: false,
    splits: false, components: 1, overloaded: [], elements: [], currentPaths: [],
  };
  const { calls } = routedFetch([
    { method: 'GET', path: /\/api\/windows\/w-1\/plans$/, reply: () => ({ status: 200, body: { plans: [] } }) },
    { method: 'POST', path: /\/api\/windows\/w-1\/assess$/, reply: () => ({ status: 200, body: impact }) },
  ]);
  renderWithQueries(<WindowNextStep window={windowFixture({ status: 'draft', impactStored: false })} me={planner} here={{ screen: 'window' }} />);
  await act(async () => fireEvent.press(screen.getByTestId('next-step-action')));
  await waitFor(() => expect(calls.some((c) => c.method === 'POST' && c.url.endsWith('/assess'))).toBe(true));
  expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ version: 3 });
  await waitFor(() => expect(mockPush).toHaveBeenCalledWith('/windows/w-1/impact'));
});

test('an approver on a window in review opens the sign-off screen; on the plans screen "Plan the moves" has no button', async () => {
  routedFetch([{ method: 'GET', path: /\/api\/windows\/w-1\/plans$/, reply: () => ({ status: 200, body: { plans: [] } }) }]);
  renderWithQueries(<WindowNextStep window={windowFixture({ status: 'in-review' })} me={approver} here={{ screen: 'plan', planId: 'p-1' }} />);
  fireEvent.press(screen.getByTestId('next-step-action'));
  expect(mockPush).toHaveBeenCalledWith('/sign-off/w-1');
  clearQueries();
  renderWithQueries(<WindowNextStep window={windowFixture({ status: 'assessed' })} me={planner} here={{ screen: 'plans' }} />);
  await waitFor(() => expect(screen.getByTestId('next-step')).toHaveTextContent(/Plan the moves/));
  expect(screen.queryByTestId('next-step-action')).toBeNull();
});
