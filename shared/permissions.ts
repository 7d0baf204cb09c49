// Who may do what: every role set and window-state set that decides an answer, named by what it allows.
// The server's guards read these sets; the app's screens read the same ones to hide actions the API would refuse.
import type { Me, RoleName } from './api';
import type { WindowStatus } from './windows';

type Roles = readonly RoleName[];

/** The operator's own people (every role but tenant): the whole calendar, freezes, policies, sign-off summaries,
 * MOP files, and one-time codes of their own. */
export const OPERATOR_ROLES: Roles = ['admin', 'engineer', 'planner', 'approver'];
/** Read windows (a tenant only those touching its slices) and a tenant notice (a tenant only its own). */
export const WINDOW_READER_ROLES: Roles = [...OPERATOR_ROLES, 'tenant'];
export const NOTICE_READER_ROLES: Roles = [...OPERATOR_ROLES, 'tenant'];
/** Book, edit, assess, move along the lifecycle and attach a MOP to windows (DESIGN §2). */
export const WINDOW_BOOKER_ROLES: Roles = ['engineer', 'planner', 'admin'];
/** Download the inventory as a scenario or GraphML file. */
export const INVENTORY_EXPORT_ROLES: Roles = ['planner', 'admin', 'engineer'];
/** Upload and apply imports, and validate a scenario file. */
export const INVENTORY_IMPORT_ROLES: Roles = ['admin', 'planner'];
/** Users, freeze and policy changes, notice overrides, one-time code resets, the Outbox, booking inside a freeze. */
export const ADMIN_ROLES: Roles = ['admin'];
/** A window's tenant notices with their sending state: operator staff without engineers. */
export const WINDOW_NOTICE_READER_ROLES: Roles = ['admin', 'planner', 'approver'];
/** Send a failed notice again. */
export const NOTICE_RESENDER_ROLES: Roles = ['admin', 'planner'];
/** Run, cancel and accept move plans. */
export const PLAN_RUNNER_ROLES: Roles = ['planner'];
/** Read move plans (tenants never see them; engineers are refused). */
export const PLAN_READER_ROLES: Roles = ['planner', 'approver', 'admin'];
/** Find slots for a window, and read any staff member's slot searches (they are not secret). */
export const SLOT_SEARCH_ROLES: Roles = ['engineer', 'planner', 'admin'];
/** Plan, change, book and discard campaigns of windows. */
export const CAMPAIGN_PLANNER_ROLES: Roles = ['planner'];
/** Read campaigns, drafts included (the calendar's draft overlay). */
export const CAMPAIGN_READER_ROLES: Roles = ['planner', 'admin', 'engineer'];
/**
 * The change-board pack and its moves CSV: every operator role. Engineers included on purpose: they carry out
 * the moves in the field, and the pack shows the accepted plan only, not the runs behind it.
 */
export const CHANGE_PACK_READER_ROLES: Roles = OPERATOR_ROLES;
/** Submit a window's accepted plan for sign-off. */
export const SIGNOFF_SUBMITTER_ROLES: Roles = ['planner'];
/** Decide a sign-off (approve or return). */
export const SIGNOFF_APPROVER_ROLES: Roles = ['approver'];
/** Open the sign-off queue. */
export const SIGNOFF_QUEUE_ROLES: Roles = ['approver', 'admin'];
/** Read the audit trail and download it as CSV (nobody changes it). */
export const AUDIT_READER_ROLES: Roles = ['admin', 'approver'];
/** The tenant portal: upcoming work and acknowledging notices. */
export const TENANT_PORTAL_ROLES: Roles = ['tenant'];

/** True when `roles` holds at least one of `allowed`. */
export function holdsAnyRole(roles: Roles, allowed: Roles): boolean {
  return roles.some((role) => allowed.includes(role));
}

export const isOperator = (roles: Roles) => holdsAnyRole(roles, OPERATOR_ROLES);
export const canBookWindows = (roles: Roles) => holdsAnyRole(roles, WINDOW_BOOKER_ROLES);
export const canExportInventory = (roles: Roles) => holdsAnyRole(roles, INVENTORY_EXPORT_ROLES);
export const canImportInventory = (roles: Roles) => holdsAnyRole(roles, INVENTORY_IMPORT_ROLES);
export const canAdminister = (roles: Roles) => holdsAnyRole(roles, ADMIN_ROLES);
/** A freeze stops every booking but an admin's (DESIGN §2). */
export const canBookInsideFreeze = canAdminister;
export const canReadWindowNotices = (roles: Roles) => holdsAnyRole(roles, WINDOW_NOTICE_READER_ROLES);
export const canResendNotices = (roles: Roles) => holdsAnyRole(roles, NOTICE_RESENDER_ROLES);
export const canRunPlans = (roles: Roles) => holdsAnyRole(roles, PLAN_RUNNER_ROLES);
export const canReadPlans = (roles: Roles) => holdsAnyRole(roles, PLAN_READER_ROLES);
export const canSearchSlots = (roles: Roles) => holdsAnyRole(roles, SLOT_SEARCH_ROLES);
export const canPlanCampaigns = (roles: Roles) => holdsAnyRole(roles, CAMPAIGN_PLANNER_ROLES);
export const canReadCampaigns = (roles: Roles) => holdsAnyRole(roles, CAMPAIGN_READER_ROLES);
export const canReadChangePack = (roles: Roles) => holdsAnyRole(roles, CHANGE_PACK_READER_ROLES);
export const canSubmitForSignoff = (roles: Roles) => holdsAnyRole(roles, SIGNOFF_SUBMITTER_ROLES);
export const canSignOff = (roles: Roles) => holdsAnyRole(roles, SIGNOFF_APPROVER_ROLES);
export const canOpenSignoffQueue = (roles: Roles) => holdsAnyRole(roles, SIGNOFF_QUEUE_ROLES);
export const canReadAuditTrail = (roles: Roles) => holdsAnyRole(roles, AUDIT_READER_ROLES);
export const usesTenantPortal = (roles: Roles) => holdsAnyRole(roles, TENANT_PORTAL_ROLES);

/** States in which a window's plans may be run and accepted: its impact is known and the plan not yet signed off. */
export const PLANNABLE_STATES: readonly WindowStatus[] = ['assessed', 'planned', 'returned'];
/** States in which a window's impact may be (re)computed. */
export const ASSESSABLE_STATES: readonly WindowStatus[] = ['draft', 'assessed'];
/** States before the work starts: a window may still be edited or withdrawn. */
export const EDITABLE_STATES: readonly WindowStatus[] = ['draft', 'assessed', 'planned', 'in-review', 'cleared', 'returned', 'notified'];

export const windowTakesRuns = (status: WindowStatus) => PLANNABLE_STATES.includes(status);
export const windowIsAssessable = (status: WindowStatus) => ASSESSABLE_STATES.includes(status);
export const windowIsEditable = (status: WindowStatus) => EDITABLE_STATES.includes(status);

/**
 * Who sees what: null = not scoped (any operator role opens network-wide data); otherwise the tenant a
 * tenant-only user is limited to, and '' for a tenant user without a tenant, who sees nothing rather than everything.
 */
export function tenantScopeOf(user: Pick<Me, 'roles' | 'tenantId'>): string | null {
  const operator = user.roles.some((role) => role !== 'tenant');
  if (operator || !user.roles.includes('tenant')) return null;
  return user.tenantId ?? '';
}
