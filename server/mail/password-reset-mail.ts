// The mail with a password reset link: who asked is unknown, so it says what to do when it was not them.
import type { MailJob } from '../services/ports';
import { RESET_LINK_VALID_MINUTES } from '../../shared/passwords';

export function passwordResetMail(publicUrl: string, { to, name, token }: { to: string; name: string; token: string }): MailJob {
  return {
    to: [to],
    subject: 'Choose a new Slackwater password',
    text: [
      `Hello ${name},`, '',
      'Someone asked to reset the password of your Slackwater account. To choose a new password, open this link:', '',
      `${publicUrl}/reset-password?token=${token}`, '',
      `The link works once, for ${RESET_LINK_VALID_MINUTES} minutes. Choosing a new password signs you out everywhere.`, '',
      'If you did not ask for this, you can ignore this mail: your password stays as it is.',
    ].join('\n'),
  };
}
