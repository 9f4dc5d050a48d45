import escapeHtml from 'escape-html';
import type { MailContent } from './mail-content';

export interface PasswordResetMailInput {
  name: string;
  resetUrl: string;
  validForMinutes: number;
}

/** The password reset e-mail, as plain text and HTML. */
export function passwordResetMail(input: PasswordResetMailInput): MailContent {
  const subject = 'Reset your Liftwright password';
  const text = [
    `Hello ${input.name},`,
    '',
    'Someone asked to reset the password of your Liftwright account.',
    `To choose a new password, open this link within ${input.validForMinutes} minutes:`,
    '',
    input.resetUrl,
    '',
    'The link works once. If you did not ask for this, ignore this e-mail: your password stays as it is.',
    '',
    'Liftwright',
  ].join('\n');
  const name = escapeHtml(input.name);
  const url = escapeHtml(input.resetUrl);
  const html = `<!doctype html>
<html lang="en">
  <body style="font-family: sans-serif; line-height: 1.5; color: #1f2328;">
    <p>Hello ${name},</p>
    <p>Someone asked to reset the password of your Liftwright account.
      To choose a new password, open this link within ${input.validForMinutes} minutes:</p>
    <p><a href="${url}">Choose a new password</a></p>
    <p style="font-size: 0.9em;">If the button does not work, copy this address into your browser:<br>${url}</p>
    <p>The link works once. If you did not ask for this, ignore this e-mail: your password stays as it is.</p>
    <p>Liftwright</p>
  </body>
</html>`;
  return { subject, text, html };
}
