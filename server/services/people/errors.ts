// Errors of the People screen: invitations, roles, deactivation.
import { domainError } from '../../errors';

export class PersonNotFoundError extends domainError('PERSON_NOT_FOUND', 404, () => 'No such person.') {}

export class InvitationNotFoundError extends domainError('INVITATION_NOT_FOUND', 404,
  () => 'No open invitation for this person: they joined already, or the invitation was revoked.') {}

/** Expired, used, revoked and unknown links get one answer, so a guess learns nothing about which it hit. */
export class InvitationLinkInvalidError extends domainError('INVITATION_LINK_INVALID', 404,
  () => 'This invitation link does not work any more: it was used, it expired (links last 72 hours), a newer one was sent, or it was copied only in part. Ask the admin who invited you to send it again.') {}

export class PersonEmailInUseError extends domainError('EMAIL_IN_USE', 409,
  () => 'Someone with this e-mail address is already on the People list. Find them there instead of inviting again.') {}

export class UnknownTenantError extends domainError('UNKNOWN_TENANT', 400, () => 'The chosen tenant does not exist.') {}

export class LastAdminError extends domainError('LAST_ADMIN', 409,
  (what: 'deactivate' | 'demote') => (what === 'deactivate'
    ? 'This is the last active admin: deactivating them would leave nobody to manage people. Give someone else the admin role first.'
    : 'This is the last active admin: without the admin role nobody could manage people. Give someone else the admin role first.')) {}

export class AlreadyDeactivatedError extends domainError('ALREADY_DEACTIVATED', 409, () => 'This person is deactivated already.') {}

export class NotDeactivatedError extends domainError('NOT_DEACTIVATED', 409, () => 'This person is active already.') {}

export class InvitedPersonError extends domainError('INVITATION_PENDING', 409,
  () => 'This person has not accepted the invitation yet: revoke the invitation instead.') {}
