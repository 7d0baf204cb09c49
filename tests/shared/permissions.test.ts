// The role → capability table and the window-state sets of shared/permissions.ts, spelled out one role at a time.
import { ROLE_NAMES, type RoleName } from '../../shared/api';
import {
  canAdminister, canBookInsideFreeze, canBookWindows, canExportInventory, canImportInventory, canOpenSignoffQueue,
  canReadPlans, canReadWindowNotices, canResendNotices, canRunPlans, canSignOff, canSubmitForSignoff, isOperator,
  tenantScopeOf, usesTenantPortal, windowIsAssessable, windowIsEditable, windowTakesRuns,
} from '../../shared/permissions';
import { WINDOW_STATUSES } from '../../shared/windows';

const capabilities = {
  isOperator, canBookWindows, canExportInventory, canImportInventory, canAdminister, canBookInsideFreeze,
  canReadWindowNotices, canResendNotices, canRunPlans, canReadPlans, canSubmitForSignoff, canSignOff,
  canOpenSignoffQueue, usesTenantPortal,
};
type Capability = keyof typeof capabilities;

// Read off the routes' guards (server/routes) before the sets moved here; each role alone.
const table: Record<RoleName, Capability[]> = {
  admin: ['isOperator', 'canBookWindows', 'canExportInventory', 'canImportInventory', 'canAdminister',
    'canBookInsideFreeze', 'canReadWindowNotices', 'canResendNotices', 'canReadPlans', 'canOpenSignoffQueue'],
  engineer: ['isOperator', 'canBookWindows', 'canExportInventory'],
  planner: ['isOperator', 'canBookWindows', 'canExportInventory', 'canImportInventory', 'canReadWindowNotices',
    'canResendNotices', 'canRunPlans', 'canReadPlans', 'canSubmitForSignoff'],
  approver: ['isOperator', 'canReadWindowNotices', 'canReadPlans', 'canSignOff', 'canOpenSignoffQueue'],
  tenant: ['usesTenantPortal'],
};

describe.each(ROLE_NAMES)('a user holding only %s', (role) => {
  test.each(Object.keys(capabilities) as Capability[])('%s', (name) => {
    expect(capabilities[name]([role])).toBe(table[role].includes(name));
  });
});

test('a user without roles may do nothing', () => {
  for (const check of Object.values(capabilities)) expect(check([])).toBe(false);
});

test('roles add up: a tenant who is also a planner may run plans', () => {
  expect(canRunPlans(['tenant', 'planner'])).toBe(true);
  expect(isOperator(['tenant', 'planner'])).toBe(true);
});

test('window states: plans run in assessed, planned, returned; assess in draft, assessed; edit until the work starts', () => {
  expect(WINDOW_STATUSES.filter(windowTakesRuns)).toEqual(['assessed', 'planned', 'returned']);
  expect(WINDOW_STATUSES.filter(windowIsAssessable)).toEqual(['draft', 'assessed']);
  expect(WINDOW_STATUSES.filter((s) => !windowIsEditable(s)).sort()).toEqual(['done', 'rolled-back', 'underway', 'withdrawn']);
});

describe('tenantScopeOf', () => {
  test('any operator role opens everything, even beside tenant', () => {
    expect(tenantScopeOf({ roles: ['engineer'], tenantId: null })).toBeNull();
    expect(tenantScopeOf({ roles: ['tenant', 'approver'], tenantId: 't1' })).toBeNull();
  });
  test('a tenant-only user is limited to its tenant, or to nothing without one', () => {
    expect(tenantScopeOf({ roles: ['tenant'], tenantId: 't1' })).toBe('t1');
    expect(tenantScopeOf({ roles: ['tenant'], tenantId: null })).toBe('');
  });
  test('a user without roles is not scoped (its guards refuse it instead)', () => {
    expect(tenantScopeOf({ roles: [], tenantId: null })).toBeNull();
  });
});
