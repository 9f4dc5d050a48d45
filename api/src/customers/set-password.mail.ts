import escapeHtml from 'escape-html';
import type { MailContent } from '../mail/templates/mail-content';

export interface SetPasswordMailInput {
  name: string;
  setPasswordUrl: string;
  validForHours: number;
}

/** The e-mail to a customer whose account the workshop desk made: choose a password. */
export function setPasswordMail(input: SetPasswordMailInput): MailContent {
  const subject = 'Choose a password for your Liftwright account';
  const text = [
    `Hello ${input.name},`,
    '',
    'The workshop made a Liftwright account for you, so you can see your quotes and book online.',
    `To choose your password, open this link within ${input.validForHours} hours:`,
    '',
    input.setPasswordUrl,
    '',
    'The link works once. If it has expired, use "Forgot your password?" on the sign-in page.',
    'If you did not visit the workshop, ignore this e-mail.',
    '',
    'Liftwright',
  ].join('\n');
  const name = escapeHtml(input.name);
  const url = escapeHtml(input.setPasswordUrl);
  const html = `<!doctype html>
<html lang="en">
  <body style="font-family: sans-serif; line-height: 1.5; color: #1f2328;">
    <p>Hello ${name},</p>
    <p>The workshop made a Liftwright account for you, so you can see your quotes and book online.
      To choose your password, open this link within ${input.validForHours} hours:</p>
    <p><a href="${url}">Choose my password</a></p>
    <p style="font-size: 0.9em;">If the link does not open, copy this address into your browser:<br>${url}</p>
    <p>The link works once. If it has expired, use "Forgot your password?" on the sign-in page.
      If you did not visit the workshop, ignore this e-mail.</p>
    <p>Liftwright</p>
  </body>
</html>`;
  return { subject, text, html };
}
