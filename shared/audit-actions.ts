// Plain words for every audit action code the server writes, read by the audit trail screen and its CSV. A test
// reads server/ for the codes it writes, so a new action fails there until it has words here.

export const AUDIT_ACTION_WORDS: Readonly<Record<string, string>> = {
  // Signing in and one's own account
  'sign-in': 'Signed in',
  'sign-in-failed': 'Failed to sign in',
  'sign-out': 'Signed out',
  'session-ended': 'Ended a signed-in session',
  'sign-out-everywhere': 'Signed out on every device',
  'otp.enrol': 'Started setting up two-step codes',
  'otp.confirm': 'Turned on two-step codes',
  'otp.remove': 'Removed two-step codes',
  'otp.code-failed': 'Entered a wrong two-step code',
  'calendar-feed.create': 'Made a private calendar feed address',
  'calendar-feed.revoke': 'Turned off a private calendar feed address',
  'user.time-zone': 'Changed their time zone',
  'set-up.first-admin': 'Set up the first admin account',
  'sign-in-refused': 'Was refused a password sign-in (staff sign in through single sign-on)',
  'sign-in-refused-deactivated': 'Was refused sign-in: the account is deactivated',
  'password-changed': 'Changed their password',
  'password-change-refused': 'Was refused a password change',
  'password-reset-requested': 'Asked for a password reset link',
  'password-reset': 'Set a new password through a reset link',
  // People and access
  'invitation.create': 'Invited a person',
  'invitation.resend': 'Sent an invitation again',
  'invitation.revoke': 'Withdrew an invitation',
  'invitation.accept': 'Accepted an invitation and set up their account',
  'user.roles': 'Changed a person’s roles',
  'user.deactivate': 'Deactivated a person’s account',
  'user.reactivate': 'Reactivated a person’s account',
  // Single sign-on
  'sso-user-created': 'Joined through single sign-on',
  'sso-identity-linked': 'Linked their account to single sign-on',
  'sso-roles-changed': 'Had their roles set from single sign-on groups',
  'sso-last-admin-kept': 'Kept the admin role as the last active admin, although their single sign-on groups no longer give it',
  'sso-sign-in-refused': 'A single sign-on attempt was refused',
  'sso-settings-changed': 'Changed the single sign-on settings',
  // Windows and their lifecycle
  'window.create': 'Booked a window',
  'window.update': 'Changed a window',
  'window.assess': 'Worked out the impact on slices',
  'window.mop.upload': 'Attached the method of procedure',
  'window.transition': 'Moved a window along its lifecycle',
  // Move plans and slices
  'plan.enqueue': 'Started a run of the re-mapper',
  'plan.cancel': 'Cancelled a run of the re-mapper',
  'plan.fail': 'A run of the re-mapper failed',
  'plan.accept': 'Accepted a move plan',
  'placement.plan-apply': 'Moved a slice as the accepted plan says',
  'placement.plan-return': 'Returned a slice to where it was before the window',
  'placement.plan-rollback': 'Rolled a slice back after the work was rolled back',
  // Campaigns of windows
  'campaign.create': 'Started planning a campaign of windows',
  'campaign.update': 'Moved windows of a draft campaign',
  'campaign.book': 'Booked every window of a campaign',
  'campaign.discard': 'Discarded a draft campaign',
  // Sign-off
  'signoff.submit': 'Submitted a plan for sign-off',
  'signoff.decision': 'Decided on a plan',
  'signoff.send-back': 'Returned the window to planning',
  'signoff.cleared': 'The change board signed the plan off',
  // Tenant notices
  'notices.issue': 'Sent the notices to the affected tenants',
  'notice.issue': 'Issued a tenant notice',
  'notice.cancel': 'Withdrew a tenant notice',
  'notice.override': 'Set a notice’s sending state by hand',
  'notice.resend': 'Sent a notice again',
  'notice.acknowledge': 'Acknowledged a notice',
  // Admin
  'freeze.create': 'Added a freeze',
  'freeze.update': 'Changed a freeze',
  'freeze.delete': 'Removed a freeze',
  'policy.update': 'Changed a policy',
  'import.preview': 'Previewed an import',
  'import.apply': 'Applied an import',
  'import.apply-failed': 'An import could not be applied',
  'demo-data.remove': 'Removed the demo data',
};

/** The words for `code`; a code without words (a newer server) reads as its parts, never blank. */
export function actionWords(code: string): string {
  if (Object.hasOwn(AUDIT_ACTION_WORDS, code)) return AUDIT_ACTION_WORDS[code];
  const plain = code.replace(/[._-]+/g, ' ').trim();
  return plain ? plain[0].toUpperCase() + plain.slice(1) : 'Recorded an action';
}
