import { describe, expect, it } from 'vitest';
import { passwordResetMail } from './password-reset.mail';

describe('passwordResetMail', () => {
  const mail = passwordResetMail({
    name: 'Robin <Yarrow> & Co',
    resetUrl: 'https://shop.liftwright.example/reset-password?token=abc_DEF-123',
    validForMinutes: 60,
  });

  it('says what happened and how long the link works, in text and HTML', () => {
    expect(mail.subject).toBe('Reset your Liftwright password');
    expect(mail.text).toContain('https://shop.liftwright.example/reset-password?token=abc_DEF-123');
    expect(mail.text).toContain('within 60 minutes');
    expect(mail.html).toContain(
      'href="https://shop.liftwright.example/reset-password?token=abc_DEF-123"',
    );
    expect(mail.html).toContain('within 60 minutes');
  });

  it('escapes the name in the HTML part', () => {
    expect(mail.html).toContain('Robin &lt;Yarrow&gt; &amp; Co');
    expect(mail.html).not.toContain('<Yarrow>');
    expect(mail.text).toContain('Hello Robin <Yarrow> & Co,');
  });
});
