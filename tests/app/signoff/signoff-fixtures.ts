// A sign-off summary as the API returns it, for the sign-off component tests.
import type { SignoffSummary } from '@/shared/signoff';

export function summaryFixture(extra: Partial<SignoffSummary> = {}): SignoffSummary {
  return {
    window: {
      id: 'w-1', title: 'Fibre splice, Gullhaven ring', workType: 'fibre splice', status: 'in-review',
      startsAt: '2030-01-10T21:00:00.000Z', endsAt: '2030-01-11T01:00:00.000Z', round: 1,
      owner: { id: 'u-eng', name: 'Sam Okafor' },
      elements: [{ kind: 'span', id: 'sp-1', name: 'Gullhaven – Tarnby', effect: 'down', fraction: null }],
    },
    plan: { id: 'pl-1', href: '/windows/w-1/plans/pl-1', acceptedAt: '2029-12-20T10:00:00.000Z', acceptedBy: { id: 'u-pl', name: 'Priya Lund' } },
    tenants: [
      { id: 't-1', name: 'Harbour Health', affected: 2, moving: 2, knockOn: 0, protectionLost: 0 },
      { id: 't-2', name: 'Marsh Water', affected: 2, moving: 1, knockOn: 0, protectionLost: 0 },
    ],
    totals: { affected: 4, moving: 3, stays: 0, unresolved: 1, knockOn: 0 },
    touch: { touched: 4, mustMove: 4, protectionLost: 0, unresolved: 1, knockOn: 0 },
    knockOn: [],
    unresolved: [{ slice: 's-4', name: 'Pump telemetry', tenantName: 'Marsh Water', reason: 'no path within 10 ms', outageAccepted: true }],
    riskClass: 'high',
    highestRisks: [{ slice: 's-1', name: 'Ambulance dispatch', severity: 'critical', failureProbability: 0.0012, unprotected: true }],
    criticalSlices: 1,
    mop: { fileName: 'splice-mop.pdf', href: '/api/windows/w-1/mop' },
    quorum: 2, approvals: 1, requireCode: true,
    decisions: [{
      round: 1, approver: { id: 'u-ap2', name: 'Jonas Weller' }, decision: 'approve', comment: 'Checked the ring capacity.',
      codeConfirmed: true, decidedAt: '2029-12-21T08:00:00.000Z',
    }],
    me: { decided: false, blocked: null },
    ...extra,
  };
}
