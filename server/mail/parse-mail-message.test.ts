import MailComposer from 'nodemailer/lib/mail-composer';
import { describe, expect, it } from 'vitest';
import { decodeEncodedWords, parseMailMessage } from './parse-mail-message';

async function compose(options: ConstructorParameters<typeof MailComposer>[0]): Promise<string> {
  const buffer = await new MailComposer(options).compile().build();
  return buffer.toString('utf8');
}

describe('parseMailMessage', () => {
  it('reads what nodemailer writes: encoded subject, quoted-printable text and HTML alternatives', async () => {
    const text = `Grüße — the bell siphon primed at 0.42 m.\nA long line ${'that keeps going '.repeat(10)}end.\nhttps://tidewright.example.org/reset-password?token=abc_DEF-123`;
    const raw = await compose({
      from: 'a@example.test',
      to: 'b@example.test',
      subject: 'Kühlwasser ✓ and a rather long subject line that nodemailer folds across lines',
      text,
      html: '<p>Grüße</p>',
    });
    expect(raw).toMatch(/quoted-printable|base64/i);
    const parsed = parseMailMessage(raw);
    expect(parsed.subject).toBe(
      'Kühlwasser ✓ and a rather long subject line that nodemailer folds across lines',
    );
    expect(parsed.text).toBe(text);
    expect(parsed.html).toBe('<p>Grüße</p>');
  });

  it('reads a single-part base64 body', async () => {
    const raw = await compose({
      from: 'a@example.test',
      to: 'b@example.test',
      subject: 'Plain',
      text: 'ünïcödé '.repeat(40),
      textEncoding: 'base64',
    });
    expect(raw).toMatch(/Content-Transfer-Encoding: base64/);
    const parsed = parseMailMessage(raw);
    expect(parsed.text).toBe('ünïcödé '.repeat(40).trimEnd());
    expect(parsed.html).toBeNull();
  });

  it('decodes RFC 2047 B and Q encoded words and joins adjacent ones (RFC 2047 §6.2 examples)', () => {
    expect(decodeEncodedWords('=?ISO-8859-1?Q?a?= =?ISO-8859-1?Q?b?=')).toBe('ab');
    expect(decodeEncodedWords('=?ISO-8859-1?Q?a_b?=')).toBe('a b');
    expect(decodeEncodedWords('(=?ISO-8859-1?Q?a?= b)')).toBe('(a b)');
    expect(decodeEncodedWords('=?UTF-8?B?8J+MsQ==?= seedling')).toBe('🌱 seedling');
  });
});
