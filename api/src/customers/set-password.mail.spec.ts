import { describe, expect, it } from 'vitest';
import { setPasswordMail } from './set-password.mail';

describe('setPasswordMail', () => {
  const mail = setPasswordMail({
    name: 'Ari <Tallowgate> & Co',
    setPasswordUrl: 'http://127.0.0.1:4400/reset-password?token=abc&x="1"',
    validForHours: 72,
  });

  it('carries the link and how long it works in both parts', () => {
    expect(mail.text).toContain('http://127.0.0.1:4400/reset-password?token=abc&x="1"');
    expect(mail.text).toContain('within 72 hours');
    expect(mail.html).toContain('within 72 hours');
  });

  it('escapes the name and the link in the HTML part', () => {
    expect(mail.html).toContain('Ari &lt;Tallowgate&gt; &amp; Co');
    expect(mail.html).toContain('token=abc&amp;x=&quot;1&quot;');
    expect(mail.html).not.toContain('<Tallowgate>');
  });
});
