import { describe, expect, it } from 'vitest';
import { invitationMail } from './invitation-mail';

describe('invitationMail', () => {
  const mail = invitationMail({
    to: 'sam@example.test',
    instructorName: 'Theo <Teacher>',
    className: 'Water & plants',
    link: 'http://localhost:3000/join/abc_DEF-123',
    validDays: 14,
  });

  it('carries the link, the class, the instructor and the validity in plain text', () => {
    expect(mail.to).toBe('sam@example.test');
    expect(mail.subject).toBe('Join "Water & plants" on Tidewright');
    expect(mail.text).toContain('\nhttp://localhost:3000/join/abc_DEF-123\n');
    expect(mail.text).toContain('Theo <Teacher> invites you to the class "Water & plants"');
    expect(mail.text).toContain('within 14 days');
  });

  it('escapes names in the HTML part and links the same address', () => {
    expect(mail.html).toContain('Theo &#60;Teacher&#62;');
    expect(mail.html).toContain('Water &#38; plants');
    expect(mail.html).toContain('<a href="http://localhost:3000/join/abc_DEF-123">');
  });
});
