/** The password reset e-mail: plain text first, and the same words as simple HTML. */
import type { OutgoingMail } from '../mail/mailer';

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

/** The message carrying the reset link; `ttlMs` is how long the link works. */
export function passwordResetMail(
  to: string,
  name: string,
  link: string,
  ttlMs: number,
): OutgoingMail {
  const minutes = Math.round(ttlMs / 60_000);
  const lines = [
    `Hello ${name},`,
    '',
    'Someone (we hope you) asked to reset the password of your Tidewright account.',
    `Open this link within ${minutes} minutes to choose a new password. It works once:`,
    '',
    link,
    '',
    'If you did not ask for this, ignore this e-mail: your password stays as it is.',
  ];
  const html = [
    `<p>Hello ${escapeHtml(name)},</p>`,
    '<p>Someone (we hope you) asked to reset the password of your Tidewright account.</p>',
    `<p>Open this link within ${minutes} minutes to choose a new password. It works once:</p>`,
    `<p><a href="${escapeHtml(link)}">${escapeHtml(link)}</a></p>`,
    '<p>If you did not ask for this, ignore this e-mail: your password stays as it is.</p>',
  ].join('\n');
  return { to, subject: 'Reset your Tidewright password', text: lines.join('\n'), html };
}
