// One audit row for people: who by name, what in words, the window or object by name with its screen, the
// changed fields in words and the comment.
import { actionWords } from '../../../shared/audit-actions';
import type { AuditEntry, AuditSubject } from '../../../shared/audit';
import type { SubjectIds, SubjectNames } from '../../queries/audit/audit-subjects';
import type { AuditTrailRow } from '../../queries/audit/audit-trail';
import { commentOf, summariseChanges } from './change-summary';

/** Entities whose names live in a table, by the key selectSubjectNames reads them under. */
const NAMED_ENTITIES: Record<string, keyof SubjectNames> = {
  window: 'windows', plan: 'plans', notice: 'notices', freeze: 'freezes', user: 'users', slice: 'slices', import: 'imports',
};

/** The ids of one page of rows, grouped for one look-up per kind. */
export function subjectIdsOf(rows: readonly AuditTrailRow[]): SubjectIds {
  const ids: SubjectIds = {};
  for (const r of rows) {
    const key = NAMED_ENTITIES[r.entity];
    if (key && r.entityId) (ids[key] ??= []).push(r.entityId);
  }
  return ids;
}

const record = (v: unknown): Record<string, unknown> => (v && typeof v === 'object' && !Array.isArray(v) ? v as Record<string, unknown> : {});

/** A deleted object keeps the name its own row recorded. */
function recordedName(r: AuditTrailRow): string | null {
  for (const side of [record(r.after), record(r.before)]) {
    for (const key of ['title', 'name', 'fileName']) if (typeof side[key] === 'string' && side[key]) return side[key] as string;
  }
  return null;
}

function subjectOf(r: AuditTrailRow, names: SubjectNames): AuditSubject | null {
  const id = r.entityId ?? '';
  const gone = (kind: string) => ({ kind, name: recordedName(r) ?? 'No longer listed', href: null });
  switch (r.entity) {
    case 'window': {
      const title = names.windows.get(id);
      return title ? { kind: 'Window', name: title, href: `/windows/${id}` } : gone('Window');
    }
    case 'plan': {
      const plan = names.plans.get(id);
      return plan ? { kind: 'Move plan for', name: plan.title, href: `/windows/${plan.windowId}/plans/${id}` } : gone('Move plan');
    }
    case 'notice': {
      const n = names.notices.get(id);
      return n ? { kind: `Notice to ${n.tenantName} for`, name: n.title, href: `/windows/${n.windowId}` } : gone('Notice');
    }
    case 'freeze': {
      const title = names.freezes.get(id);
      return title ? { kind: 'Freeze', name: title, href: '/freezes' } : gone('Freeze');
    }
    case 'user': return { kind: 'Person', name: names.users.get(id) ?? 'No longer listed', href: null };
    case 'slice': {
      const name = names.slices.get(id);
      return name ? { kind: 'Slice', name, href: `/slices/${id}` } : gone('Slice');
    }
    case 'import': return { kind: 'Import', name: names.imports.get(id) ?? recordedName(r) ?? 'No longer listed', href: '/imports' };
    case 'campaign': return { kind: 'Campaign', name: recordedName(r) ?? 'No longer listed', href: `/campaigns/${id}` };
    case 'policy': return { kind: 'Policies', name: 'Booking, notice and sign-off policies', href: '/sign-off/policy' };
    case 'sso-settings': return { kind: 'Settings', name: 'Single sign-on', href: null };
    case 'network': return { kind: 'Network', name: 'The whole network', href: '/network' };
    // A session is the actor's own: "who" already names it.
    default: return null;
  }
}

/** A sign-off decision reads as what was decided. */
function whatOf(r: AuditTrailRow): string {
  if (r.action === 'signoff.decision') {
    const decision = record(r.after).decision;
    if (decision === 'approve') return 'Approved a plan';
    if (decision === 'send-back') return 'Sent a plan back';
  }
  return actionWords(r.action);
}

export function toAuditEntry(r: AuditTrailRow, names: SubjectNames, timeZone: string): AuditEntry {
  return {
    id: String(r.id),
    at: r.at.toISOString(),
    who: r.actorName,
    action: r.action,
    what: whatOf(r),
    subject: subjectOf(r, names),
    changes: summariseChanges(r.before, r.after, timeZone),
    comment: commentOf(r.after),
  };
}
