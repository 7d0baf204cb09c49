// People (admin): the user list with its filters, role changes, deactivation, and invitations by e-mail.
import { z } from 'zod';
import { roleSchema, type RoleName } from './api';

export const PERSON_STATUSES = ['active', 'invited', 'deactivated'] as const;
export const personStatusSchema = z.enum(PERSON_STATUSES);
export type PersonStatus = z.infer<typeof personStatusSchema>;

/** How long an invitation link works, in hours. */
export const INVITATION_VALID_HOURS = 72;
/**
 * Shortest password an invitee may choose, checked in the form before sending; the server's password policy
 * (server/auth/password-policy.ts) checks it again and also refuses passwords that are easy to guess.
 */
export const INVITEE_PASSWORD_MIN_CHARS = 12;

export const personSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  roles: z.array(roleSchema),
  tenantId: z.string().nullable(),
  /** the tenant's name, for people to read (null for staff) */
  tenantName: z.string().nullable(),
  status: personStatusSchema,
  /** ISO instant the account was created (or the invitation first sent) */
  createdAt: z.string(),
  deactivatedAt: z.string().nullable(),
  /** for an invited person: when the newest link stops working (null when none is open) */
  invitationExpiresAt: z.string().nullable(),
});
export type Person = z.infer<typeof personSchema>;

/** GET /api/users (admin): everyone, or those matching the filters. */
export const peopleListSchema = z.object({ users: z.array(personSchema) });
export type PeopleList = z.infer<typeof peopleListSchema>;

const optionalText = z.string().trim().max(200).optional().transform((v) => (v === '' ? undefined : v));

export const peopleFilterSchema = z.object({
  /** part of a name or e-mail address, any case */
  q: optionalText,
  role: roleSchema.optional(),
  tenant: optionalText,
  status: personStatusSchema.optional(),
});
export type PeopleFilter = z.infer<typeof peopleFilterSchema>;

const STAFF_ROLES: readonly RoleName[] = ['admin', 'engineer', 'planner', 'approver'];

/** What a set of roles and a tenant must satisfy together; the message for the first rule broken, else null. */
export function roleAssignmentProblem(roles: readonly RoleName[], tenantId: string | null | undefined): { path: string; message: string } | null {
  if (roles.length === 0) return { path: 'roles', message: 'Choose at least one role' };
  const tenant = roles.includes('tenant');
  if (tenant && roles.some((role) => STAFF_ROLES.includes(role))) {
    return { path: 'roles', message: 'A tenant contact holds the tenant role only: remove the operator roles or the tenant role' };
  }
  if (tenant && !tenantId) return { path: 'tenantId', message: 'Choose the tenant this person belongs to' };
  if (!tenant && tenantId) return { path: 'tenantId', message: 'Only tenant contacts belong to a tenant: clear the tenant or choose the tenant role' };
  return null;
}

const rolesField = z.array(roleSchema).max(5).transform((roles) => [...new Set(roles)]);
const tenantField = z.string().trim().min(1).max(200).nullable().optional().transform((v) => v ?? null);

function checkAssignment(value: { roles: RoleName[]; tenantId: string | null }, ctx: z.RefinementCtx): void {
  const problem = roleAssignmentProblem(value.roles, value.tenantId);
  if (problem) ctx.addIssue({ code: 'custom', path: [problem.path], message: problem.message });
}

/** PUT /api/users/:id/roles */
export const roleAssignmentSchema = z.object({ roles: rolesField, tenantId: tenantField }).superRefine(checkAssignment);
export type RoleAssignment = z.infer<typeof roleAssignmentSchema>;

/** POST /api/invitations */
export const invitationRequestSchema = z.object({
  email: z.email('Enter a valid e-mail address').max(254),
  name: z.string().trim().min(1, 'Enter the person\'s name').max(120, 'Use at most 120 characters'),
  roles: rolesField,
  tenantId: tenantField,
}).superRefine(checkAssignment);
export type InvitationRequest = z.input<typeof invitationRequestSchema>;

/** 201 from POST /api/invitations and 200 from its resend: the invited person (`id` is their account's id). */
export const invitationSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  roles: z.array(roleSchema),
  tenantId: z.string().nullable(),
  expiresAt: z.string(),
  /** false when the mail could not be put on the queue: the invitation stands, send it again */
  mailQueued: z.boolean(),
});
export type Invitation = z.infer<typeof invitationSchema>;

/** An invitation token as mailed: 32 random bytes in base64url (RFC 4648 §5), without padding. */
export const invitationTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{43}$/, 'This invitation link is not complete');

/** GET /api/invitations/link/:token while the link works: whom it is for. */
/** GET /api/invitations/link/:token: who the link is for; `staff` when single sign-on may stand in for a password. */
export const invitationLinkSchema = z.object({ email: z.string(), name: z.string(), staff: z.boolean() });
export type InvitationLink = z.infer<typeof invitationLinkSchema>;

export const inviteePasswordSchema = z.string()
  .min(INVITEE_PASSWORD_MIN_CHARS, `Use at least ${INVITEE_PASSWORD_MIN_CHARS} characters`)
  .max(1024, 'Use at most 1024 characters');

/** POST /api/invitations/accept */
export const acceptInvitationSchema = z.object({ token: invitationTokenSchema, password: inviteePasswordSchema });
export type AcceptInvitation = z.infer<typeof acceptInvitationSchema>;
