// The demo accounts, one per role. Demo only: replace them before real use (README).
import type { Scenario } from '../../shared/scenario';
import type { Role } from '../schema';

export const DEMO_PASSWORD = 'demo-password-1';

export interface DemoUser {
  id: string;
  email: string;
  name: string;
  role: Role;
}

export const DEMO_USERS: readonly DemoUser[] = [
  { id: 'user-demo-admin', email: 'admin@demo.test', name: 'Robin Hale', role: 'admin' },
  { id: 'user-demo-engineer', email: 'engineer@demo.test', name: 'Sam Okafor', role: 'engineer' },
  { id: 'user-demo-planner', email: 'planner@demo.test', name: 'Priya Lund', role: 'planner' },
  { id: 'user-demo-approver', email: 'approver@demo.test', name: 'Jonas Weller', role: 'approver' },
  // A second change-board member: high-risk plans need two approvals by default (policy signoffQuorumHigh).
  { id: 'user-demo-approver-2', email: 'approver2@demo.test', name: 'Mei Castell', role: 'approver' },
  { id: 'user-demo-tenant', email: 'tenant@demo.test', name: 'Tess Marlow', role: 'tenant' },
];

/** The tenant the tenant account belongs to: the first one without critical slices (so the demo
 *  tenant view is an ordinary customer), else the first tenant, else none. */
export function pickDemoTenantId(scenario: Pick<Scenario, 'tenants' | 'slices'>): string | null {
  const critical = new Set(scenario.slices.filter((s) => s.critical).map((s) => s.tenant));
  const ordinary = scenario.tenants.find((t) => !critical.has(t.id));
  return (ordinary ?? scenario.tenants[0])?.id ?? null;
}
