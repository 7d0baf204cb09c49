// The invitation e-mail: who invited whom, to do what, the one-time link and how long it works.
import type { RoleName } from '../../../shared/api';
import { INVITATION_VALID_HOURS } from '../../../shared/people';
import type { MailJob } from '../ports';

/** How each role reads in a sentence ("…to Slackwater as a planner and an approver"). */
const ROLE_WORDS: Record<RoleName, string> = {
  admin: 'an admin',
  engineer: 'an engineer',
  planner: 'a planner',
  approver: 'a change-board approver',
  tenant: 'a tenant contact',
};

function roleSentence(roles: readonly RoleName[], tenantName: string | null): string {
  const words = roles.map((role) => (role === 'tenant' && tenantName ? `a contact for ${tenantName}` : ROLE_WORDS[role]));
  return words.length <= 1 ? (words[0] ?? '') : `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
}

export type InvitationMailInput = {
  publicUrl: string; to: string; name: string; inviterName: string; roles: readonly RoleName[]; tenantName: string | null; token: string;
  /** the link's end, already written for a person (e.g. "4 March 2031, 09:00 UTC") */
  expiresText: string;
};

export function invitationLinkUrl(publicUrl: string, token: string): string {
  return `${publicUrl}/invitation?token=${encodeURIComponent(token)}`;
}

export function invitationMail(input: InvitationMailInput): MailJob {
  return {
    to: [input.to],
    subject: `${input.inviterName} invited you to Slackwater`,
    text: [
      `Hello ${input.name},`, '',
      `${input.inviterName} invited you to Slackwater, the maintenance-window planner, as ${roleSentence(input.roles, input.tenantName)}.`, '',
      'Open this link to choose your password and sign in:', invitationLinkUrl(input.publicUrl, input.token), '',
      `The link works once, for ${INVITATION_VALID_HOURS} hours (until ${input.expiresText}).`,
      'If it has stopped working, ask the person who invited you to send it again.',
      'If you did not expect this invitation, ignore this e-mail: nothing happens unless the link is opened.',
    ].join('\n'),
  };
}
