// The window lifecycle of DESIGN §3 as a table, with the guards of steps that need later stages' work.
import type { WindowStatus } from '../../../shared/windows';

export const NEXT_STATES: Record<WindowStatus, readonly WindowStatus[]> = {
  draft: ['assessed', 'withdrawn'],
  assessed: ['planned', 'withdrawn'],
  planned: ['in-review', 'withdrawn'],
  'in-review': ['cleared', 'returned', 'withdrawn'],
  returned: ['planned', 'withdrawn'],
  cleared: ['notified', 'withdrawn'],
  notified: ['underway', 'withdrawn'],
  underway: ['done', 'rolled-back'],
  done: [],
  'rolled-back': [],
  withdrawn: [],
};

/**
 * Steps that only other parts of the product may take: the value says what is needed. `assessed` comes from
 * computing the impact; plans, sign-off and notices set the rest once they exist.
 */
export const GUARDED: Partial<Record<WindowStatus, string>> = {
  assessed: 'compute its impact (POST /api/windows/:id/assess).',
  planned: 'a move plan must be accepted first.',
  'in-review': 'an accepted plan must be submitted for sign-off.',
  cleared: 'the change board must sign the plan off.',
  returned: 'the change board must reject the plan.',
  notified: 'the tenants must be sent their notices.',
};

export type TransitionCheck = { ok: true } | { ok: false; kind: 'illegal' | 'guarded'; why: string };

export function checkTransition(from: WindowStatus, to: WindowStatus): TransitionCheck {
  if (!NEXT_STATES[from].includes(to)) {
    const allowed = NEXT_STATES[from];
    return { ok: false, kind: 'illegal', why: allowed.length ? `From ${from} it can go to: ${allowed.join(', ')}.` : `${from} is final.` };
  }
  const guard = GUARDED[to];
  return guard ? { ok: false, kind: 'guarded', why: guard } : { ok: true };
}
