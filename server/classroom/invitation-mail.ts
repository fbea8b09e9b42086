/** The class invitation e-mail: plain text first, and the same words as simple HTML. */
import type { OutgoingMail } from '../mail/mailer';

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

/** What the invitation names. */
export interface InvitationMailFacts {
  to: string;
  instructorName: string;
  className: string;
  link: string;
  validDays: number;
}

/** The message carrying the link that joins the class (and creates an account when needed). */
export function invitationMail(facts: InvitationMailFacts): OutgoingMail {
  const paragraphs = [
    `${facts.instructorName} invites you to the class "${facts.className}" on Tidewright, where you predict how flood-and-drain grow beds behave and then run the simulation to see who was right.`,
    `Open this link within ${facts.validDays} days to join. If you have no Tidewright account yet, the page lets you make one with this address:`,
  ];
  const closing =
    'If you do not know this class, ignore this e-mail: nothing happens unless you open the link.';
  const text = [...paragraphs, '', facts.link, '', closing].join('\n\n').replace(/\n{3,}/g, '\n\n');
  const html = [
    ...paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`),
    `<p><a href="${escapeHtml(facts.link)}">${escapeHtml(facts.link)}</a></p>`,
    `<p>${escapeHtml(closing)}</p>`,
  ].join('\n');
  return { to: facts.to, subject: `Join "${facts.className}" on Tidewright`, text, html };
}
