// The words sign-off screens use for risk, decisions, who may decide, and the API's error codes.
import type { SignoffSummary, RiskClass } from '@/shared/signoff';
import { isApiError } from '@/hooks/api-fetch';

export const RISK_WORDS: Record<RiskClass, string> = { low: 'Low risk', high: 'High risk' };

export const DECISION_WORDS = { approve: 'Approved', 'send-back': 'Sent back' } as const;

/** Why the viewer cannot decide, or null when they can. */
export function blockedSentence(blocked: SignoffSummary['me']['blocked']): string | null {
  switch (blocked) {
    case 'self': return 'You booked this window or made or accepted its plan, so another approver decides.';
    case 'decided': return 'You have decided on this round.';
    case 'closed': return 'This window is not waiting for decisions.';
    case 'role': return 'Only approvers decide on plans.';
    default: return null;
  }
}

export function quorumSentence(approvals: number, quorum: number): string {
  return `${approvals} of ${quorum} approval${quorum === 1 ? '' : 's'}`;
}

/** Where a failed decision's message goes: beside the code field, the comment field, or above the buttons. */
export function decisionErrorView(error: unknown): { field: 'code' | 'comment' | null; message: string } | null {
  if (!error) return null;
  if (!isApiError(error)) return { field: null, message: 'The decision was not recorded. Try again.' };
  switch (error.code) {
    case 'CODE_REQUIRED':
    case 'CODE_INVALID':
    case 'CODE_REPLAYED':
    case 'CODE_LOCKED':
      return { field: 'code', message: error.message };
    case 'VALIDATION_FAILED': {
      const onCode = error.details.some((d) => d.path.includes('code'));
      return { field: onCode ? 'code' : 'comment', message: error.details[0]?.message ?? error.message };
    }
    default:
      return { field: null, message: error.message };
  }
}
